// The sync engine's schedule (sync/SPEC.md S29, S30, S31) against a scripted transport.
import { LocalStore } from '@/lib/store/local-store';
import { nodeCrypto } from './node-crypto';
import { memoryTables } from '@/lib/store/memory';
import { SyncEngine } from '@/lib/sync/engine';
import { createSyncStatusStore } from '@/lib/sync/status-store';
import { TransportError, type SyncTransport } from '@/lib/sync/transport';
import type { PushRequest } from '@/shared/api/sync';

function setup(failures: TransportError[]) {
  const store = new LocalStore(memoryTables(), nodeCrypto);
  const status = createSyncStatusStore();
  const calls: string[] = [];
  const delays: number[] = [];
  const pending: (() => void)[] = [];
  const transport: SyncTransport = {
    push: async (req: PushRequest) => {
      calls.push('push');
      const f = failures.shift();
      if (f) throw f;
      return { results: req.mutations.map((m) => ({ mutationId: m.mutationId, status: 'applied' as const, seq: 1 })) };
    },
    pull: async (cursor) => (calls.push('pull'), { changes: [], cursor, hasMore: false, viewer: { userId: 'u', groupIds: [] } }),
    hasUpload: async () => true,
    upload: async () => undefined,
    postComment: async () => {
      throw new Error('no comments in these tests');
    },
  };
  const timers = {
    setTimeout: (fn: () => void, ms: number) => (delays.push(ms), pending.push(fn), pending.length),
    clearTimeout: () => undefined,
  };
  const engine = new SyncEngine({ store, transport, status, timers, random: () => 0, periodMs: 60_000 });
  return { store, status, engine, calls, delays, fire: () => pending.shift()?.() };
}

const net = () => new TransportError('network', 'down');

test('S30: failures back off 1 s, 2 s, 4 s (jitter 0 gives half), success resets to the period', async () => {
  const failures = [net(), net(), net()];
  const t = setup([...failures]);
  await t.store.create({ title: 'x' });
  t.engine.start();
  // Each round fails with the transport's own error (the first is the round start() began).
  for (const f of failures) await expect(t.engine.syncNow()).rejects.toBe(f);
  await t.engine.syncNow();
  expect(t.delays.slice(0, 3)).toEqual([500, 1000, 2000]);
  expect(t.delays.at(-1)).toBe(60_000); // S29: periodic once up to date
  expect(t.status.getState()).toMatchObject({ waiting: 0, syncing: false, lastError: null });
  t.engine.stop();
});

test('S30: a 401 stops retrying until signed in again', async () => {
  const denied = new TransportError('unauthorized', 'sign in', 401);
  const t = setup([denied]);
  await t.store.create({});
  t.engine.start();
  await expect(t.engine.syncNow()).rejects.toBe(denied);
  expect(t.delays).toEqual([]);
  t.engine.stop();
});

test('S29: one round at a time; a request during a round makes exactly one more', async () => {
  const t = setup([]);
  await t.store.create({});
  const a = t.engine.syncNow();
  const b = t.engine.syncNow();
  const c = t.engine.syncNow();
  await Promise.all([a, b, c]);
  expect(t.calls).toEqual(['push', 'pull', 'pull']); // second round: outbox empty, pull only
});

test('S29, S31: offline shows in the status; reconnect syncs at once', async () => {
  const t = setup([]);
  await t.store.create({});
  t.engine.setOnline(false);
  expect(t.status.getState().online).toBe(false);
  t.engine.setOnline(true);
  await t.engine.syncNow();
  expect(t.calls[0]).toBe('push');
  expect(t.status.getState()).toMatchObject({ online: true, waiting: 0 });
});
