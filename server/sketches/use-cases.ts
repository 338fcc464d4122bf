// Plain REST reads of sketches; all writes go through sync push (sync/SPEC.md S11).
import type { User } from '@/shared/api/auth';
import type { Sketch as SketchDto } from '@/shared/api/sketches';
import { canSee } from '@/sync/scope';
import type { Sketch } from '../db/entities';
import type { Deps } from '../deps';
import { notFound } from '../http/errors';
import { sketchFieldsOf, viewerOf } from '../sync/repository';
import { findSketch, visibleSketches } from './repository';

const toDto = (s: Sketch): SketchDto => ({ id: s.id, ownerId: s.ownerId, version: s.version, ...sketchFieldsOf(s) });

export async function listSketches(deps: Deps, user: User, q: { groupId?: string; includeDeleted?: 'true' | 'false' }) {
  const viewer = await viewerOf(deps.db, user.id);
  const rows = await visibleSketches(deps.db, viewer, { groupId: q.groupId, includeDeleted: q.includeDeleted === 'true' });
  return rows.map(toDto);
}

export async function getSketch(deps: Deps, user: User, id: string): Promise<SketchDto> {
  const viewer = await viewerOf(deps.db, user.id);
  const s = await findSketch(deps.db, id);
  if (!s || !canSee(viewer, s)) throw notFound('No such sketch, or it is not shared with you');
  return toDto(s);
}
