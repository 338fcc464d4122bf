// Push and pull (sync/SPEC.md S9-S24). A push runs in one transaction (writes are serialised,
// so seq order is commit order, S9); each mutation is checked on its own (S24) and a rejected
// one writes nothing. A pull reads in the same queue so it never sees a write half done.
import type { EntityManager } from 'typeorm';
import type { User } from '@/shared/api/auth';
import {
  fieldPatchSchemas,
  type ConflictFields,
  type Mutation,
  type PullQuery,
  type PullResponse,
  type PushRequest,
  type PushResult,
  maxPullPageBytes,
} from '@/shared/api/sync';
import { pageOf } from '@/sync/cursor';
import { mergeMutation, type ConflictCopy } from '@/sync/merge';
import { policies } from '@/sync/policy';
import { canSee, canWrite, type Viewer } from '@/sync/scope';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { summariesOf } from '../feed/summaries';
import * as repo from './repository';

const reject = (m: Mutation, reason: PushResult['reason'], message: string): PushResult => ({
  mutationId: m.mutationId,
  status: 'rejected',
  reason,
  message,
});

/** S23: whether this viewer may apply this (already validated) mutation to what is stored. */
function allowed(v: Viewer, m: Mutation, stored: repo.StoredRecord | null): boolean {
  if (m.type === 'conflict') return stored !== null && stored.scope.ownerId === v.userId; // devices never create them (S20)
  const groupId = m.fields.groupId as string | null | undefined;
  return canWrite(v, stored?.scope ?? null, groupId);
}

async function storeConflict(em: EntityManager, seq: number, m: Mutation, ownerId: string, c: ConflictCopy): Promise<string> {
  const id = `conflict-${m.mutationId}`;
  const fields: ConflictFields = { recordId: m.recordId, recordType: m.type, ...c, resolved: false, deleted: false };
  const state = { fields, writers: {}, version: seq };
  await repo.saveRecord(em, 'conflict', id, ownerId, state);
  await repo.appendChange(em, seq, repo.snapshotOf('conflict', id, ownerId, state), null, null);
  return id;
}

async function applyOne(em: EntityManager, v: Viewer, m: Mutation, head: { seq: number }, now: string): Promise<PushResult> {
  const seen = await repo.findApplied(em, m.mutationId);
  if (seen) {
    return seen.userId === v.userId
      ? { ...seen.result, status: 'duplicate' } // S12
      : reject(m, 'forbidden', 'This mutation id belongs to another account');
  }
  const check = fieldPatchSchemas[m.type].safeParse(m.fields);
  if (!check.success) return reject(m, 'invalid', check.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; '));
  const stored = await repo.loadRecord(em, m.type, m.recordId);
  if (!allowed(v, m, stored)) return reject(m, 'forbidden', 'No such record, or you may not write it'); // S24

  const ownerId = stored?.scope.ownerId ?? v.userId; // S23: the server sets the owner
  const out = mergeMutation(stored?.state ?? null, { ...m, fields: check.data }, head.seq + 1, policies[m.type], now);
  const result: PushResult = { mutationId: m.mutationId, status: 'applied', version: out.state.version };
  if (out.changed) {
    result.seq = ++head.seq;
    await repo.saveRecord(em, m.type, m.recordId, ownerId, out.state);
    const groupId = m.type === 'sketch' ? (out.state.fields.groupId as string | null) : null;
    const snapshot = repo.snapshotOf(m.type, m.recordId, ownerId, out.state);
    await repo.appendChange(em, result.seq, snapshot, groupId, stored?.scope.groupId ?? null);
    if (out.conflict) result.conflictId = await storeConflict(em, ++head.seq, m, ownerId, out.conflict);
  }
  await repo.recordApplied(em, v.userId, m.deviceId, result);
  return result;
}

/** After the push commits, the written sketches' feed summaries are brought up to date (off the request thread). */
export async function push(deps: Deps, user: Pick<User, 'id'>, req: PushRequest): Promise<{ results: PushResult[] }> {
  const out = await pushInTransaction(deps, user, req);
  await summariesOf(deps).refresh(req.mutations.filter((m, k) => m.type === 'sketch' && out.results[k].status === 'applied').map((m) => m.recordId));
  return out;
}

function pushInTransaction(deps: Deps, user: Pick<User, 'id'>, req: PushRequest): Promise<{ results: PushResult[] }> {
  return inTransaction(deps.db, async (em) => {
    const viewer = await repo.viewerOf(em, user.id);
    const head = { seq: await repo.headSeq(em) };
    const now = deps.now().toISOString();
    const results: PushResult[] = [];
    for (const m of req.mutations) {
      results.push(
        m.deviceId === req.deviceId
          ? await applyOne(em, viewer, m, head, now)
          : reject(m, 'invalid', 'The mutation names another device than the push'),
      );
    }
    return { results };
  });
}

export function pull(deps: Deps, user: User, q: PullQuery): Promise<PullResponse> {
  return inTransaction(deps.db, async (em) => {
    const viewer = await repo.viewerOf(em, user.id);
    const head = await repo.headSeq(em); // read before the rows (S15)
    // Sizes first, so only the rows that fit the page are read and parsed.
    const sizes = await repo.changeSizes(em, viewer, q.cursor, head, q.limit + 1);
    const page = pageOf(sizes, { limit: q.limit, maxBytes: maxPullPageBytes, sizeOf: (c) => c.bytes }, q.cursor, head);
    const rows = page.rows.length ? await repo.changesBetween(em, viewer, q.cursor, page.rows[page.rows.length - 1].seq) : [];
    return {
      changes: rows.map((c) =>
        canSee(viewer, { ownerId: c.ownerId, groupId: c.groupId })
          ? { seq: c.seq, record: c.snapshot }
          : { seq: c.seq, revoked: { id: c.recordId, type: c.recordType } }, // S22
      ),
      cursor: page.cursor,
      hasMore: page.hasMore,
      viewer: { userId: viewer.userId, groupIds: [...viewer.groups.keys()].sort() },
    };
  });
}
