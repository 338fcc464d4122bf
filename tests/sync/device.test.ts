// Device side of the protocol: outbox (S5-S8), rebase on pull (S16, S17), cursor pages (S15),
// scope (S22-S24), back-off (S30) and status (S31).
import { coalesce, mutationFor, settle } from '@/sync/outbox';
import { applyPulled, localOnly, outOfScope, rebase, sameViewer } from '@/sync/rebase';
import { pageOf } from '@/sync/cursor';
import { canSee, canWrite, type Viewer } from '@/sync/scope';
import { backoffDelay, backoffMaxMs } from '@/sync/backoff';
import { statusLabel, statusOf, type StatusInput } from '@/sync/status';
import type { Mutation, SyncRecord } from '@/shared/api/sync';

const m = (clock: number, fields: Record<string, unknown>, op: Mutation['op'] = 'update') =>
  mutationFor({ recordId: 'r', type: 'sketch', op, fields, baseVersion: 0 }, 'dev', clock, `id-${clock}`);
const rec = (version: number, fields: Record<string, unknown>): SyncRecord => ({ id: 'r', type: 'sketch', version, ownerId: 'u', fields });

describe('outbox', () => {
  test('S5: add/update assert deleted=false, delete carries deleted=true', () => {
    expect(m(1, { title: 'x' }, 'add').fields).toEqual({ title: 'x', deleted: false });
    expect(m(2, {}, 'delete').fields).toEqual({ deleted: true });
  });

  test('S8: acknowledged leave, rejected move aside, unanswered stay', () => {
    const box = [m(1, {}), m(2, {}), m(3, {})];
    const out = settle(box, [
      { mutationId: 'id-1', status: 'applied', seq: 4 },
      { mutationId: 'id-2', status: 'rejected', reason: 'forbidden' },
    ]);
    expect(out.done).toEqual(['id-1']);
    expect(out.rejected.map((r) => [r.mutation.mutationId, r.reason])).toEqual([['id-2', 'forbidden']]);
  });

  test('S8a: only an unsent write of the same record joins; add stays add, a delete wins the op', () => {
    const add = m(1, { title: 'a' }, 'add');
    expect(coalesce(add, m(2, { notes: 'n' }), 0)).toEqual({ ...add, clock: 2, fields: { title: 'a', notes: 'n', deleted: false } });
    expect(coalesce(add, m(2, {}), 1)).toBeNull(); // already handed out
    expect(coalesce(add, { ...m(2, {}), recordId: 'other' }, 0)).toBeNull();
    expect(coalesce(m(1, { title: 'a' }), m(2, {}, 'delete'), 0)).toMatchObject({ op: 'delete', fields: { deleted: true } });
  });

  test('S12: a duplicate answer also acknowledges', () => {
    expect(settle([m(1, {})], [{ mutationId: 'id-1', status: 'duplicate' }]).done).toEqual(['id-1']);
  });
});

describe('rebase', () => {
  test('S17: pending writes apply over the base in clock order', () => {
    expect(rebase({ title: 'a', notes: 'n' }, [m(3, { title: 'c' }), m(2, { title: 'b', notes: 'm' })])).toMatchObject({ title: 'c', notes: 'm' });
  });

  test('S17: a pulled snapshot never overwrites pending local writes', () => {
    const eff = applyPulled(undefined, { seq: 5, record: rec(5, { title: 'server', notes: 's' }) }, [m(1, { title: 'mine' })]);
    expect(eff.kind === 'put' && eff.record.fields).toMatchObject({ title: 'mine', notes: 's' });
  });

  test('S16: re-applying a page (same or older snapshot) changes nothing', () => {
    const local = { id: 'r', type: 'sketch' as const, base: rec(5, { title: 'x' }), fields: { title: 'x' } };
    expect(applyPulled(local, { seq: 5, record: rec(5, { title: 'x' }) }, []).kind).toBe('keep');
    expect(applyPulled(local, { seq: 3, record: rec(3, { title: 'old' }) }, []).kind).toBe('keep');
  });

  test('S22: a revoked record is dropped from the device', () => {
    const local = { id: 'r', type: 'sketch' as const, base: rec(5, {}), fields: {} };
    expect(applyPulled(local, { seq: 9, revoked: { id: 'r', type: 'sketch' } }, [])).toEqual({ kind: 'drop', id: 'r' });
  });

  test('S13, S17: a record made on the device shows defaults plus its writes', () => {
    const r = localOnly('r', 'sketch', [m(1, { title: 'new' }, 'add')], '2026-12-01T00:00:00Z');
    expect(r.fields).toMatchObject({ title: 'new', notes: '', tags: [], deleted: false, groupId: null });
  });
});

describe('S22a: viewer changes', () => {
  const v = { userId: 'me', groupIds: ['g1'] };
  const shared = (ownerId: string, groupId: string | null) => ({ id: 'r', type: 'sketch' as const, base: { ...rec(3, { groupId }), ownerId }, fields: {} });
  test('a changed group list is a different viewer', () => {
    expect(sameViewer(v, { userId: 'me', groupIds: ['g1'] })).toBe(true);
    expect(sameViewer(v, { userId: 'me', groupIds: ['g1', 'g2'] })).toBe(false);
    expect(sameViewer(v, { userId: 'you', groupIds: ['g1'] })).toBe(false);
  });
  test('only others\' records outside my groups and without my pending writes go', () => {
    expect(outOfScope(shared('other', 'g9'), v, [])).toBe(true);
    expect(outOfScope(shared('other', null), v, [])).toBe(true);
    expect(outOfScope(shared('other', 'g1'), v, [])).toBe(false);
    expect(outOfScope(shared('me', 'g9'), v, [])).toBe(false);
    expect(outOfScope(shared('other', 'g9'), v, [m(1, {})])).toBe(false);
  });
});

describe('pageOf', () => {
  const rows = (...seqs: number[]) => seqs.map((seq) => ({ seq }));
  test('S15: a full page says hasMore and its cursor is its last seq', () => {
    expect(pageOf(rows(3, 4, 7), { limit: 2 }, 0, 20)).toEqual({ rows: rows(3, 4), cursor: 4, hasMore: true });
  });
  test('S15: the last page moves the cursor to the head even past invisible changes', () => {
    expect(pageOf(rows(3), { limit: 2 }, 0, 20)).toEqual({ rows: rows(3), cursor: 20, hasMore: false });
    expect(pageOf([], { limit: 2 }, 7, 20)).toEqual({ rows: [], cursor: 20, hasMore: false });
  });
  test('S15: a page stops at its byte budget, but always holds one row', () => {
    const sized = { limit: 10, maxBytes: 25, sizeOf: () => 10 };
    expect(pageOf(rows(1, 2, 3, 4), sized, 0, 9)).toEqual({ rows: rows(1, 2), cursor: 2, hasMore: true });
    expect(pageOf(rows(1, 2), { ...sized, maxBytes: 5 }, 0, 9)).toEqual({ rows: rows(1), cursor: 1, hasMore: true });
  });
  test('S15: the cursor never moves back', () => {
    expect(pageOf([], { limit: 5 }, 30, 20).cursor).toBe(30);
  });
});

describe('scope', () => {
  const v: Viewer = { userId: 'u', groups: new Map([['g', 'member'], ['ro', 'viewer']]) };
  test('S22: own sketches and those shared to my groups, nothing else', () => {
    expect(canSee(v, { ownerId: 'u', groupId: null })).toBe(true);
    expect(canSee(v, { ownerId: 'x', groupId: 'g' })).toBe(true);
    expect(canSee(v, { ownerId: 'x', groupId: 'ro' })).toBe(true);
    expect(canSee(v, { ownerId: 'x', groupId: 'other' })).toBe(false);
    expect(canSee(v, { ownerId: 'x', groupId: null })).toBe(false);
  });
  test('S23: only the owner writes, and only into groups where they are not a viewer', () => {
    expect(canWrite(v, null, 'g')).toBe(true);
    expect(canWrite(v, { ownerId: 'u', groupId: null }, undefined)).toBe(true);
    expect(canWrite(v, { ownerId: 'x', groupId: 'g' }, undefined)).toBe(false);
    expect(canWrite(v, null, 'ro')).toBe(false);
    expect(canWrite(v, null, 'other')).toBe(false);
  });
});

describe('backoff and status', () => {
  test('S30: delays double from about 1 s and stop at 5 min', () => {
    expect(backoffDelay(1, 0)).toBe(500);
    expect(backoffDelay(1, 0.999)).toBeLessThanOrEqual(1000);
    expect(backoffDelay(4, 0)).toBe(4000);
    expect(backoffDelay(40, 0.999)).toBeLessThanOrEqual(backoffMaxMs);
  });
  test('S8, S31: offline first, then syncing, a failure, conflict, refused, waiting, not yet synced, up to date', () => {
    const calm: StatusInput = { online: true, syncing: false, waiting: 0, conflicts: 0, rejected: 0, lastError: null, lastSyncedAt: '2026-01-01T00:00:00Z' };
    const label = (s: Partial<StatusInput>) => statusLabel(statusOf({ ...calm, ...s }));
    expect(label({ online: false, waiting: 2, conflicts: 1, lastError: 'down' })).toBe('Offline, 2 changes waiting');
    expect(statusOf({ ...calm, syncing: true, conflicts: 1, lastError: 'down' }).kind).toBe('syncing');
    expect(label({ waiting: 3, conflicts: 1, lastError: 'HTTP 500' })).toBe('Sync failed, 3 changes waiting');
    expect(label({ waiting: 1, conflicts: 1, rejected: 1 })).toBe('1 conflict to resolve');
    expect(label({ rejected: 2 })).toBe('2 changes refused by the server');
    expect(label({ waiting: 1, lastSyncedAt: null })).toBe('1 change waiting');
    expect(label({ lastSyncedAt: null })).toBe('Not synced yet');
    expect(label({})).toBe('Up to date');
  });
});
