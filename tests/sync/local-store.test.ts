// The device store (lib/store) on both of its tables: memory and the SQLite schema of
// lib/store/sqlite.ts (run here on better-sqlite3 behind expo-sqlite's async call shapes).
import Database from 'better-sqlite3';
import { LocalStore } from '@/lib/store/local-store';
import { nodeCrypto } from './node-crypto';
import { memoryTables } from '@/lib/store/memory';
import { migrate, migrations, sqliteTables, type SqlDatabase } from '@/lib/store/sqlite';
import type { Tables } from '@/lib/store/tables';
import type { PullResponse } from '@/shared/api/sync';

function betterSqlite(db: Database.Database): SqlDatabase {
  return {
    execAsync: async (sql) => void db.exec(sql),
    runAsync: async (sql, ...p) => db.prepare(sql).run(...p),
    getAllAsync: async <T>(sql: string, ...p: (string | number)[]) => db.prepare(sql).all(...p) as T[],
    getFirstAsync: async <T>(sql: string, ...p: (string | number)[]) => (db.prepare(sql).get(...p) as T | undefined) ?? null,
    withTransactionAsync: async (task) => {
      db.exec('BEGIN');
      try {
        await task();
        db.exec('COMMIT');
      } catch (e) {
        db.exec('ROLLBACK');
        throw e;
      }
    },
  };
}

const kinds: [string, () => Promise<Tables>][] = [
  ['memory', async () => memoryTables()],
  [
    'sqlite',
    async () => {
      const sql = betterSqlite(new Database(':memory:'));
      await migrate(sql);
      return sqliteTables(sql);
    },
  ],
];

describe.each(kinds)('LocalStore on %s tables', (_name, open) => {
  let store: LocalStore;
  let n = 0;
  beforeEach(async () => {
    n = 0;
    const ids = () => `00000000-0000-4000-8000-${String(++n).padStart(12, '0')}`;
    store = new LocalStore(await open(), { ...nodeCrypto, newId: ids, now: () => new Date('2026-12-01T12:00:00Z') });
  });

  test('S8: a write shows at once and queues a mutation, in clock order', async () => {
    const s = await store.create({ title: 'first' });
    expect((await store.outbox(10)).map((m) => [m.op, m.clock])).toEqual([['add', 1]]); // handed out
    await store.update(s.id, { notes: 'more' });
    expect(await store.get(s.id)).toMatchObject({ title: 'first', notes: 'more', pending: 2, version: 0 });
    const box = await store.outbox(10);
    expect(box.map((m) => [m.op, m.clock])).toEqual([['add', 1], ['update', 2]]);
    expect(new Set(box.map((m) => m.deviceId)).size).toBe(1);
    expect((await store.revisions(s.id)).map((r) => r.fields.notes)).toEqual(['', 'more']);
  });

  test('S8a: writes to a record not yet handed out join one mutation; revisions keep each', async () => {
    const s = await store.create({ title: 'first' });
    await store.update(s.id, { notes: 'a' });
    await store.update(s.id, { notes: 'b', title: 'second' });
    const [only, ...rest] = await store.outbox(10);
    expect(rest).toEqual([]);
    expect(only).toMatchObject({ op: 'add', clock: 3, fields: { title: 'second', notes: 'b', deleted: false } });
    expect((await store.revisions(s.id)).map((r) => r.fields.notes)).toEqual(['', 'a', 'b']);
    // Handed out (maybe sent): the next write must not change it.
    await store.update(s.id, { notes: 'c' });
    expect((await store.outbox(10)).map((m) => [m.mutationId === only.mutationId, m.fields.notes])).toEqual([[true, 'b'], [false, 'c']]);
    // A write to another record never joins.
    const t = await store.create({ title: 'other' });
    await store.update(s.id, { notes: 'd' });
    expect((await store.outbox(10)).map((m) => m.recordId)).toEqual([s.id, s.id, t.id, s.id]);
  });

  test('S4: remove is a tombstone: hidden from the list, kept with its content', async () => {
    const s = await store.create({ title: 'gone' });
    await store.remove(s.id);
    expect(await store.list()).toEqual([]);
    expect((await store.list({ includeDeleted: true }))[0]).toMatchObject({ title: 'gone', deleted: true });
  });

  test('S16, S17: a stored page rebases, moves the cursor, keeps pending writes', async () => {
    const s = await store.create({ title: 'first' });
    const [add] = await store.outbox(1);
    await store.settle([add], [{ mutationId: add.mutationId, status: 'applied', seq: 1 }]);
    await store.update(s.id, { title: 'local title' });
    const page: PullResponse = {
      changes: [{ seq: 4, record: { id: s.id, type: 'sketch', version: 4, ownerId: 'u', fields: { ...(await store.get(s.id))!, title: 'server title', notes: 'from server' } } }],
      cursor: 9,
      hasMore: false,
      viewer: { userId: 'u', groupIds: [] },
    };
    await store.storePage(page);
    expect(await store.cursor()).toBe(9);
    expect(await store.get(s.id)).toMatchObject({ title: 'local title', notes: 'from server', version: 4 });
    expect((await store.counts()).waiting).toBe(1);
  });

  test('offline comments, run cache and the upload queue are kept', async () => {
    const s = await store.create({});
    await store.addComment(s.id, 'is this the figure eight?');
    expect((await store.comments(s.id)).map((c) => c.body)).toEqual(['is this the figure eight?']);
    await store.cacheRun('kh:abc', { ok: 1 });
    expect(await store.cachedRun('kh:abc')).toEqual({ ok: 1 });
    // SHA-256 of the empty string (FIPS 180-4 test vector, common practice).
    expect(await store.queueUpload(new Uint8Array(), 'image/png')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
    expect((await store.pendingUploads()).length).toBe(1);
  });

  test('S34: a comment waits for its sketch\'s outbox writes, then is marked sent or rejected', async () => {
    const s = await store.create({ title: 'shared later' });
    const c = await store.addComment(s.id, 'first');
    expect(c.state).toBe('waiting');
    expect(await store.commentsToSend()).toEqual([]); // its sketch is not on the server yet
    const box = await store.outbox(10);
    await store.settle(box, box.map((m) => ({ mutationId: m.mutationId, status: 'applied' as const, seq: 1 })));
    expect(await store.commentsToSend()).toEqual([c]);
    expect((await store.counts()).comments).toBe(1);
    await store.commentSettled(c);
    const d = await store.addComment(s.id, 'second');
    await store.commentSettled(d, 'answered 403');
    expect(await store.commentsToSend()).toEqual([]);
    expect((await store.counts()).comments).toBe(0);
    const byBody = (await store.comments(s.id)).sort((x, y) => x.body.localeCompare(y.body)); // same millisecond: key order is by id
    expect(byBody).toEqual([
      { ...c, state: 'sent' },
      { ...d, state: 'rejected', reason: 'answered 403' },
    ]);
  });

  test('S34: the author discards a refused comment; only that one leaves the device', async () => {
    const s = await store.create({});
    const kept = await store.addComment(s.id, 'kept');
    const refused = await store.addComment(s.id, 'refused');
    await store.commentSettled(refused, 'answered 403');
    await store.discardComment(refused);
    expect(await store.comments(s.id)).toEqual([kept]);
  });

  test('S24: a refused write is kept per record until dismissed', async () => {
    const s = await store.create({});
    const other = await store.create({});
    await store.update(s.id, { groupId: 'g1' });
    const box = await store.outbox(10);
    const share = box.find((m) => m.recordId === s.id && m.op === 'update')!;
    await store.settle(box, box.map((m) => ({ mutationId: m.mutationId, status: m === share ? 'rejected' as const : 'applied' as const, reason: 'forbidden' as const, seq: 1 })));
    expect(await store.rejected(other.id)).toEqual([]);
    expect(await store.rejected(s.id)).toEqual([{ mutation: share, reason: 'forbidden' }]);
    expect((await store.counts()).rejected).toBe(1);
    await store.dismissRejected(share.mutationId);
    expect(await store.rejected(s.id)).toEqual([]);
    expect((await store.counts()).rejected).toBe(0);
  });

  test('S8: a write that fails halfway leaves neither record nor outbox entry', async () => {
    const tables = await open();
    let failRecords = false;
    const failing = (t: Tables): Tables => ({
      ...t,
      put: (c, k, v) => (failRecords && c === 'records' ? Promise.reject(new Error('disk full (test)')) : t.put(c, k, v)),
    });
    const flaky: Tables = { ...tables, transaction: (work) => tables.transaction((inner) => work(failing(inner))) };
    const s2 = new LocalStore(flaky, nodeCrypto);
    const s = await s2.create({ title: 'x' });
    failRecords = true;
    await expect(s2.update(s.id, { title: 'y' })).rejects.toThrow('disk full');
    failRecords = false;
    expect((await s2.outbox(10)).map((m) => m.op)).toEqual(['add']); // the outbox put was rolled back
    expect((await s2.get(s.id))?.title).toBe('x');
    await expect(s2.update(s.id, { diagram: 'not a diagram' as never })).rejects.toThrow();
    expect((await s2.outbox(10)).length).toBe(1); // invalid fields never reach the outbox
  });
});

test('the SQLite schema migrates once and records its version', async () => {
  const db = new Database(':memory:');
  const sql = betterSqlite(db);
  expect(await migrate(sql)).toBe(migrations.length);
  expect(await migrate(sql)).toBe(0); // already up to date: nothing runs twice
  expect(db.pragma('user_version', { simple: true })).toBe(migrations.length);
  const tables = db.prepare("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name").all() as { name: string }[];
  expect(tables.map((t) => t.name)).toEqual(['comments', 'meta', 'outbox', 'records', 'rejected', 'revisions', 'runs', 'uploads']);
});
