// The group feed: sharing (a sync mutation of the sketch's groupId, so devices learn of it by
// pull like any other edit, sync/SPEC.md S11, S22), the paged feed, a shared sketch's page with
// photos, comments, fork link and "same invariants as", and forking into my own sketchbook.
import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { FeedDiagram, FeedItem, FeedPage, FeedQuery, ForkResponse, GroupSketch, InvariantSummary, ShareResponse, SketchRef } from '@/shared/api/feed';
import { canModerate, canPost } from '@/shared/api/feed-rules';
import { SlateGeometry } from '@/shared/api/sketches';
import type { Mutation, PushResult } from '@/shared/api/sync';
import { canSee } from '@/sync/scope';
import { toDtos as commentDtos } from '../comments/use-cases';
import { commentsOn } from '../comments/repository';
import type { Sketch, SketchInvariant } from '../db/entities';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { requireMember } from '../groups/access';
import { AppError, forbidden, notFound } from '../http/errors';
import { photosOf } from '../photos/repository';
import { thumbUrl, toDtos as photoDtos } from '../photos/use-cases';
import { findSketch } from '../sketches/repository';
import { attachmentPhotos } from '../uploads/use-cases';
import { viewerOf } from '../sync/repository';
import { push } from '../sync/use-cases';
import { sketchAccess } from './access';
import * as repo from './repository';
import { latestRuns, sameKhovanov } from './runs';
import { summariesOf } from './summaries';

/** A feed picture needs the shape, not every sample: at most about this many points per strand. */
const PICTURE_POINTS = 96;

function thinned<T>(points: T[]): T[] {
  const step = Math.max(1, Math.ceil(points.length / PICTURE_POINTS));
  return points.filter((_, i) => i % step === 0 || i === points.length - 1);
}

/** The Slate's drawing with thinned strands; null when the sketch was not drawn on the Slate. */
function feedDiagram(d: Sketch['diagram']): FeedDiagram {
  const g = SlateGeometry.safeParse(d.geometry);
  const round = (x: number) => Math.round(x * 10) / 10;
  const geometry = g.success
    ? { ...g.data, components: g.data.components.map((c) => ({ ...c, points: thinned(c.points).map((p) => ({ x: round(p.x), y: round(p.y) })) })) }
    : null;
  return { pd: d.pd, unknots: d.unknots, framings: d.framings, geometry };
}

const summaryOf = (inv: SketchInvariant | undefined, s: Sketch): InvariantSummary => ({
  crossings: inv?.crossings ?? s.diagram.pd.length,
  components: inv?.components ?? null,
  jones: inv?.jones ? JSON.parse(inv.jones) : null,
  jonesText: inv?.jonesText ?? null,
  computing: inv === undefined,
});

/** The stored summaries at each sketch's version; those not in yet go to the job pool (summaries.ts), never computed here. */
async function summariesFor(deps: Deps, rows: Pick<Sketch, 'id' | 'version'>[]): Promise<Map<string, SketchInvariant>> {
  const { current, stale } = await repo.currentSummaries(deps.db, rows);
  if (stale.length) void summariesOf(deps).refresh(stale);
  return current;
}

async function feedItems(deps: Deps, groupId: string, rows: Sketch[]): Promise<FeedItem[]> {
  const ids = rows.map((s) => s.id);
  const [users, counts, attached, photos, invariants, runs] = [
    await repo.usersById(deps.db, rows.map((s) => s.ownerId)),
    await repo.commentCounts(deps.db, groupId, ids),
    await attachmentPhotos(deps, rows),
    await repo.firstPhotos(deps.db, ids),
    await summariesFor(deps, rows),
    await latestRuns(deps.db, ids),
  ];
  return rows.map((s) => ({
    id: s.id,
    groupId,
    title: s.title,
    tags: s.tags,
    owner: { id: s.ownerId, displayName: users.get(s.ownerId)?.displayName ?? 'Former member' },
    updatedAt: s.updatedAt,
    diagram: feedDiagram(s.diagram),
    photoThumbUrl: attached.get(s.id)?.[0]?.thumbUrl ?? (photos.has(s.id) ? thumbUrl(deps, photos.get(s.id)!.id) : null),
    invariants: summaryOf(invariants.get(s.id), s),
    latestRun: runs.get(s.id) ?? null,
    commentCount: counts.get(s.id) ?? 0,
    version: s.version,
  }));
}

export async function feed(deps: Deps, caller: User, groupId: string, q: FeedQuery): Promise<FeedPage> {
  await requireMember(deps.db, groupId, caller.id);
  const hasResults = q.hasResults === undefined ? undefined : q.hasResults === 'true';
  const rows = await repo.feedSketches(deps.db, { groupId, before: q.cursor, tag: q.tag, ownerId: q.person, hasResults, take: q.limit + 1 });
  const page = rows.slice(0, q.limit);
  return { items: await feedItems(deps, groupId, page), nextCursor: rows.length > q.limit ? page[page.length - 1].version : null };
}

async function refsOf(deps: Deps, rows: Pick<Sketch, 'id' | 'title' | 'ownerId'>[]): Promise<SketchRef[]> {
  const users = await repo.usersById(deps.db, rows.map((r) => r.ownerId));
  return rows.map((r) => ({ id: r.id, title: r.title, owner: { id: r.ownerId, displayName: users.get(r.ownerId)?.displayName ?? 'Former member' } }));
}

/** The page lists this many; it says how many there are in all. */
export const SAME_INVARIANTS_SHOWN = 10;

/**
 * Other live sketches of the group with the same knot-type invariants (invariants.ts: components,
 * Jones, determinant, signature), or with a finished run giving the same Khovanov Poincare
 * polynomial: the first SAME_INVARIANTS_SHOWN and how many in all.
 */
async function sameInvariants(deps: Deps, groupId: string, s: Sketch, key: string | null): Promise<{ refs: SketchRef[]; total: number }> {
  const others = (await repo.groupSketchVersions(deps.db, groupId)).filter((o) => o.id !== s.id);
  const inv = key ? await summariesFor(deps, others) : new Map<string, SketchInvariant>();
  const kh = await sameKhovanov(deps.db, s.id, others.map((o) => o.id));
  const same = others.filter((o) => (key && inv.get(o.id)?.key === key) || kh.has(o.id));
  return { refs: await refsOf(deps, same.slice(0, SAME_INVARIANTS_SHOWN)), total: same.length };
}

async function forkedFrom(deps: Deps, caller: User, sketchId: string): Promise<SketchRef | null> {
  const link = await repo.findFork(deps.db, sketchId);
  const original = link && (await findSketch(deps.db, link.forkedFrom));
  if (!original || original.deleted || !canSee(await viewerOf(deps.db, caller.id), original)) return null;
  return (await refsOf(deps, [original]))[0];
}

export async function groupSketch(deps: Deps, caller: User, groupId: string, sketchId: string): Promise<GroupSketch> {
  const role = await requireMember(deps.db, groupId, caller.id);
  const s = await findSketch(deps.db, sketchId);
  if (!s || s.deleted || s.groupId !== groupId) throw notFound('No such sketch in this group');
  const [item] = await feedItems(deps, groupId, [s]);
  const key = (await summariesFor(deps, [s])).get(s.id)?.key ?? null;
  const isOwner = s.ownerId === caller.id;
  return {
    ...item,
    seenAt: s.seenAt,
    notes: s.notes,
    // The sketch's own photos (attached on the owner's device) first, then those added in the feed.
    photos: [...((await attachmentPhotos(deps, [s])).get(s.id) ?? []), ...(await photoDtos(deps, await photosOf(deps.db, s.id)))],
    comments: await commentDtos(deps, await commentsOn(deps.db, s.id, groupId)),
    forkedFrom: await forkedFrom(deps, caller, s.id),
    ...(await sameInvariants(deps, groupId, s, key).then(({ refs, total }) => ({ sameInvariants: refs, sameInvariantsTotal: total }))),
    myRole: role,
    can: { comment: canPost(role), moderate: canModerate(role), uploadPhoto: canPost(role), fork: true, unshare: isOwner || canModerate(role) },
  };
}

/** The server writes sketches the way devices do: one sync mutation through push (S11, S23, S24). */
const SERVER_DEVICE = 'server-feed';

async function pushOne(deps: Deps, writer: Pick<User, 'id'>, m: Omit<Mutation, 'mutationId' | 'deviceId' | 'clock' | 'type'>): Promise<PushResult> {
  const mutation: Mutation = { mutationId: randomUUID(), deviceId: SERVER_DEVICE, clock: deps.now().getTime(), type: 'sketch', ...m };
  const [result] = (await push(deps, writer, { deviceId: SERVER_DEVICE, mutations: [mutation] })).results;
  if (result.status === 'rejected') {
    throw result.reason === 'forbidden' ? forbidden(result.message ?? 'Not allowed') : new AppError('invalid_input', 400, result.message ?? 'Rejected');
  }
  return result;
}

export async function share(deps: Deps, caller: User, sketchId: string, groupId: string | null): Promise<ShareResponse> {
  const { sketch, isOwner, role } = await sketchAccess(deps.db, caller.id, sketchId);
  // Owners and admins of the group take any sketch off its feed (say, a removed member's), as a
  // write in the owner's name; only the owner shares.
  const moderates = groupId === null && role !== null && canModerate(role);
  if (!isOwner && !moderates) throw forbidden("Only the sketch's owner can share it; the owner or an admin of the group can stop sharing it");
  if (groupId) {
    const role = await requireMember(deps.db, groupId, caller.id);
    if (!canPost(role)) throw forbidden('Viewers cannot share sketches to this group');
  }
  const result = await pushOne(deps, { id: sketch.ownerId }, {
    recordId: sketchId,
    op: 'update',
    baseVersion: sketch.version,
    fields: { groupId, updatedAt: deps.now().toISOString() },
  });
  return { id: sketchId, groupId, version: result.version ?? sketch.version };
}

export async function fork(deps: Deps, caller: User, sketchId: string): Promise<ForkResponse> {
  const { sketch: s } = await sketchAccess(deps.db, caller.id, sketchId);
  const id = randomUUID();
  const now = deps.now().toISOString();
  const result = await pushOne(deps, caller, {
    recordId: id,
    op: 'add',
    baseVersion: 0,
    fields: { title: s.title, seenAt: s.seenAt, notes: s.notes, tags: s.tags, diagram: s.diagram, attachments: s.attachments, createdAt: now, updatedAt: now, groupId: null, deleted: false },
  });
  await inTransaction(deps.db, (m) => repo.insertFork(m, { sketchId: id, forkedFrom: s.id, createdAt: deps.now() }));
  return { id, forkedFrom: s.id, version: result.version! };
}

