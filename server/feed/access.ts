// The gate of every route about one sketch in a group (feed page, comments, photos, fork): the
// caller must be able to see the sketch (own, or shared to one of their groups), else 404, the
// same answer for "missing" and "not yours" (sync/SPEC.md S24).
import type { DataSource, EntityManager } from 'typeorm';
import type { Role } from '@/shared/api/groups';
import { canSee } from '@/sync/scope';
import type { Sketch } from '../db/entities';
import { notFound } from '../http/errors';
import { findSketch } from '../sketches/repository';
import { viewerOf } from '../sync/repository';

export interface SketchAccess {
  sketch: Sketch;
  /** The caller's role in the group the sketch is shared to; null when private or not a member. */
  role: Role | null;
  isOwner: boolean;
}

export const noSuchSketch = () => notFound('No such sketch, or it is not shared with you');

export async function sketchAccess(db: DataSource | EntityManager, userId: string, sketchId: string): Promise<SketchAccess> {
  const viewer = await viewerOf(db, userId);
  const sketch = await findSketch(db, sketchId);
  if (!sketch || sketch.deleted || !canSee(viewer, sketch)) throw noSuchSketch();
  const role = sketch.groupId ? (viewer.groups.get(sketch.groupId) ?? null) : null;
  return { sketch, role, isOwner: sketch.ownerId === userId };
}

/** As sketchAccess, but the sketch must be shared to a group the caller is in (comments live there). */
export async function sharedSketchAccess(db: DataSource | EntityManager, userId: string, sketchId: string) {
  const a = await sketchAccess(db, userId, sketchId);
  if (!a.sketch.groupId || !a.role) throw notFound('This sketch is not shared to one of your groups');
  return a as SketchAccess & { role: Role; sketch: Sketch & { groupId: string } };
}
