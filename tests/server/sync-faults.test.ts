// Fault tests over real HTTP against the real server (sync/SPEC.md S8, S12, S14, S16-S20):
// the device side is the real engine and store over in-memory tables.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { SketchList } from '@/shared/api/sketches';
import { seededRng } from '@/shared/knot/moves/random';
import { TransportError } from '@/lib/sync/transport';
import type { RunningServer } from '@/server/server';
import { bearer, signUp, testServer } from './helpers';
import { Device } from './sync-device';
import { pullAll, push, sketchFields } from './sync-fixtures';

let server: RunningServer;
let dir: string;
let token: string;
const url = () => server.url;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'overstrand-sync-'));
  server = await testServer({ dbPath: join(dir, 'db.sqlite') });
  token = (await signUp(server, 'Field worker')).token;
});
afterAll(async () => {
  await server.stop();
  rmSync(dir, { recursive: true, force: true });
});

const serverSketches = async (tk = token) =>
  new Map(SketchList.parse((await request(server.url).get('/api/sketches?includeDeleted=true').set(bearer(tk))).body).map((s) => [s.id, s]));

/** How many changes the log holds for a record (S10), superseded ones included. */
const changeCount = async (id: string) =>
  Number((await server.deps.db.query('SELECT COUNT(*) AS n FROM sync_changes WHERE "recordId" = ?', [id]))[0].n);

/** The round failed with the network error the injected fault throws (tests/server/sync-device.ts), not any error. */
const expectFault = (failure: unknown, message: 'answer lost (test)' | 'outage (test)' | 'offline (test)') => {
  expect(failure).toBeInstanceOf(TransportError);
  expect(failure).toMatchObject({ kind: 'network', message });
};

test('S12, S8: answers lost after the server applied a push: retry applies nothing twice', async () => {
  const d = new Device(url, token);
  const made = [await d.store.create({ title: 'a' }), await d.store.create({ title: 'b' }), await d.store.create({ title: 'c' })];
  d.faults.dropPushAnswers = 1;
  expectFault(await d.sync(), 'answer lost (test)');
  expect((await d.store.counts()).waiting).toBe(3); // S8: not acknowledged, still waiting
  const onServer = await serverSketches();
  for (const s of made) expect(onServer.get(s.id)?.title).toBe(s.title); // applied before the answer was lost

  expect(await d.sync()).toBeNull();
  expect((await d.store.counts()).waiting).toBe(0);
  for (const s of made) expect(await changeCount(s.id)).toBe(1); // one change each, not two
});

test('S12: every push sent twice: one change per mutation, same data', async () => {
  const d = new Device(url, token);
  d.faults.duplicatePushes = true;
  const s = await d.store.create({ title: 'dup' });
  expect(await d.sync()).toBeNull();
  await d.store.update(s.id, { notes: 'n1' });
  expect(await d.sync()).toBeNull();
  await d.store.update(s.id, { notes: 'n2' });
  expect(await d.sync()).toBeNull();
  expect(await changeCount(s.id)).toBe(3);
  expect((await serverSketches()).get(s.id)).toMatchObject({ title: 'dup', notes: 'n2' });
  expect((await d.store.get(s.id))?.notes).toBe('n2');
});

test('S14: pushes delivered in reverse order end with the device\'s last write, no conflict', async () => {
  const d = new Device(url, token);
  // Each write handed out before the next (as three pushes would be), so none join (S8a).
  const s = await d.store.create({ title: 'v1' });
  await d.store.outbox(10);
  await d.store.update(s.id, { title: 'v2', notes: 'first note' });
  await d.store.outbox(10);
  await d.store.update(s.id, { title: 'v3' });
  const box = await d.store.outbox(10);
  expect(box).toHaveLength(3);
  const deviceId = await d.store.deviceId();
  for (const m of [...box].reverse()) await push(server, token, deviceId, [m]); // the network reordered them
  expect((await serverSketches()).get(s.id)).toMatchObject({ title: 'v3', notes: 'first note' });
  expect(await d.sync()).toBeNull(); // the engine's own push is answered duplicate
  expect((await d.store.counts()).waiting).toBe(0);
  expect(await d.store.conflicts()).toEqual([]);
  expect(await d.store.get(s.id)).toMatchObject({ title: 'v3', notes: 'first note' });
});

test('S16: server restarted mid-pull (same db file): the device resumes from its stored cursor', async () => {
  const writer = new Device(url, token);
  const ids: string[] = [];
  for (let i = 0; i < 30; i++) ids.push((await writer.store.create({ title: `restart ${i}` })).id);
  expect(await writer.sync()).toBeNull();

  const reader = new Device(url, token, 7);
  reader.faults.pullsBeforeOutage = 2;
  expectFault(await reader.sync(), 'outage (test)');
  const cursorMid = await reader.store.cursor();
  expect(cursorMid).toBeGreaterThan(0);

  const dbPath = join(dir, 'db.sqlite');
  await server.stop();
  server = await testServer({ dbPath }); // another port, same file
  reader.faults.pullsBeforeOutage = Infinity;
  const pullsBefore = reader.pulls;
  expect(await reader.sync()).toBeNull();
  expect(await reader.store.cursor()).toBeGreaterThan(cursorMid);
  const have = await reader.sketchesById();
  for (const id of ids) expect(have.get(id)?.title).toBe((await writer.store.get(id))?.title);
  // It went on from the cursor: fewer pulls than reading everything from 0 again would take.
  const all = (await pullAll(server, token, 7)).changes.length;
  expect(reader.pulls - pullsBefore).toBeLessThan(Math.ceil(all / 7) + 1);
});

test('S8, S16: device reloaded mid-sync keeps its outbox and cursor, and finishes', async () => {
  const d = new Device(url, token, 5);
  const s = await d.store.create({ title: 'before reload' });
  d.faults.dropPushAnswers = 1;
  expectFault(await d.sync(), 'answer lost (test)');
  d.reload(); // the answer was lost and the page reloaded
  expect((await d.store.counts()).waiting).toBe(1);
  d.faults.pullsBeforeOutage = 1;
  expectFault(await d.sync(), 'outage (test)'); // push ok (duplicate), then the network goes mid-pull
  const cursor = await d.store.cursor();
  d.reload();
  expect(await d.store.cursor()).toBe(cursor);
  d.faults.pullsBeforeOutage = Infinity;
  expect(await d.sync()).toBeNull();
  expect((await d.store.counts()).waiting).toBe(0);
  expect(await changeCount(s.id)).toBe(1);
  const mine = await d.sketchesById();
  const onServer = await serverSketches();
  expect([...mine.keys()].sort()).toEqual([...onServer.keys()].sort());
});

test('S18-S20: two devices edit the same sketch offline: both converge with the server, no edit lost', async () => {
  const phone = new Device(url, token);
  const laptop = new Device(url, token);
  const s = await phone.store.create({ title: 'Whitehead link?', tags: ['board'] });
  expect(await phone.sync()).toBeNull();
  expect(await laptop.sync()).toBeNull();
  expect((await laptop.store.get(s.id))?.title).toBe('Whitehead link?');

  phone.faults.offline = laptop.faults.offline = true;
  await phone.store.update(s.id, { title: 'Whitehead link', notes: 'seen in the second talk' }); // edits 1, 2
  await laptop.store.update(s.id, { title: 'Borromean rings', tags: ['board', 'three components'] }); // 3, 4
  await laptop.store.update(s.id, { seenAt: 'Lecture hall B' }); // 5
  expectFault(await phone.sync(), 'offline (test)'); // offline: nothing sent
  phone.faults.offline = laptop.faults.offline = false;

  expect(await phone.sync()).toBeNull();
  expect(await laptop.sync()).toBeNull(); // later in server order: laptop's title wins
  expect(await phone.sync()).toBeNull();

  const server1 = (await serverSketches()).get(s.id)!;
  const onPhone = (await phone.store.get(s.id))!;
  const onLaptop = (await laptop.store.get(s.id))!;
  const strip = ({ pending: _p, version: _v, ...rest }: typeof onPhone) => rest;
  const { version: _v, id: _i, ...serverFields } = server1; // ownerId too: the device keeps the server's
  expect(strip(onPhone)).toEqual({ id: s.id, ...serverFields });
  expect(strip(onLaptop)).toEqual({ id: s.id, ...serverFields });

  // Count the five edits: four stand in the sketch, the fifth is in the conflict copy.
  expect(server1).toMatchObject({ title: 'Borromean rings', notes: 'seen in the second talk', tags: ['board', 'three components'], seenAt: 'Lecture hall B' });
  const phoneConflicts = await phone.store.conflicts();
  expect(phoneConflicts).toEqual(await laptop.store.conflicts());
  expect(phoneConflicts).toHaveLength(1);
  expect(phoneConflicts[0]).toMatchObject({ recordId: s.id, losing: { title: 'Whitehead link' }, winning: { title: 'Borromean rings' } });
  expect(phone.status.getState().conflicts).toBe(1);

  // S21: resolving on one device clears it everywhere and keeps the chosen value.
  await phone.store.resolveConflict(phoneConflicts[0].id, { title: 'Whitehead link' });
  expect(await phone.sync()).toBeNull();
  expect(await laptop.sync()).toBeNull();
  expect(await laptop.store.conflicts()).toEqual([]);
  expect((await laptop.store.get(s.id))?.title).toBe('Whitehead link');
  expect(laptop.status.getState()).toMatchObject({ conflicts: 0, waiting: 0 });
});

// Many rounds of offline edits by three devices with unique values. Afterwards every device
// equals the server, and every edit is either a current value, a conflict copy's losing
// value, or was replaced by an edit made on a device that showed it (knowingly replaced).
test('S17-S20: three devices, random offline edits and sync orders: converge, nothing lost', async () => {
  const rng = seededRng(7);
  const rand = (n: number) => Math.floor(rng() * n);
  const devices = [new Device(url, token), new Device(url, token), new Device(url, token)];
  const ids: string[] = [];
  for (let i = 0; i < 3; i++) ids.push((await devices[0].store.create({ title: `t${i}` })).id);
  for (const d of devices) expect(await d.sync()).toBeNull();
  const fields = ['title', 'notes', 'seenAt'] as const;
  const edits: { value: string; replaced: string }[] = [];
  let n = 0;
  for (let round = 0; round < 6; round++) {
    for (const d of devices) {
      for (let k = 0; k < 3; k++) {
        const id = ids[rand(ids.length)];
        const f = fields[rand(fields.length)];
        const value = `e${++n}`;
        const before = (await d.store.get(id))![f];
        await d.store.update(id, { [f]: value });
        edits.push({ value, replaced: before });
      }
    }
    for (const i of [0, 1, 2].sort(() => rand(3) - 1)) expect(await devices[i].sync()).toBeNull();
  }
  for (let pass = 0; pass < 2; pass++) for (const d of devices) expect(await d.sync()).toBeNull();

  const onServer = await serverSketches();
  for (const d of devices) {
    for (const id of ids) {
      const local = (await d.store.get(id))!;
      for (const f of fields) expect(local[f]).toBe(onServer.get(id)![f]);
    }
    expect((await d.store.conflicts()).map((c) => c.id).sort()).toEqual((await devices[0].store.conflicts()).map((c) => c.id).sort());
  }
  const current = new Set(ids.flatMap((id) => fields.map((f) => onServer.get(id)![f])));
  const losing = new Set((await devices[0].store.conflicts()).flatMap((c) => Object.values(c.losing) as string[]));
  const replaced = new Set(edits.map((e) => e.replaced));
  const lost = edits.filter((e) => !current.has(e.value) && !losing.has(e.value) && !replaced.has(e.value));
  expect(edits).toHaveLength(54);
  expect(lost).toEqual([]);
});

test('S8, S24: a rejected mutation leaves the outbox for the rejected list, counted in the status', async () => {
  const other = await signUp(server, 'Someone else');
  const theirs = sketchFields({ title: 'not yours' });
  const id = 'f00dbabe-0000-4000-8000-000000000001';
  await push(server, other.token, 'their-device', [
    { mutationId: crypto.randomUUID(), deviceId: 'their-device', clock: 1, recordId: id, type: 'sketch', op: 'add', baseVersion: 0, fields: theirs },
  ]);
  const d = new Device(url, token);
  await d.store.update(id, { title: 'mine now?' });
  expect(await d.sync()).toBeNull();
  expect(d.status.getState()).toMatchObject({ waiting: 0, rejected: 1 });
  expect((await serverSketches(other.token)).get(id)?.title).toBe('not yours');
});

test('S22a: joining a group brings its earlier sketches; leaving drops them from the device', async () => {
  const owner = await signUp(server, 'Group owner');
  const joiner = await signUp(server, 'Late joiner');
  const { addMembership, deleteMembership, insertGroup } = await import('@/server/groups/repository');
  const group = crypto.randomUUID();
  await insertGroup(server.deps.db, group, 'Knot seminar', owner.user.id);
  const writer = new Device(url, owner.token);
  const shared = await writer.store.create({ title: 'shared before you came', groupId: group });
  expect(await writer.sync()).toBeNull();

  const d = new Device(url, joiner.token);
  const own = await d.store.create({ title: 'my own' });
  expect(await d.sync()).toBeNull();
  expect(await d.store.get(shared.id)).toBeNull();

  await addMembership(server.deps.db, group, joiner.user.id, 'member');
  expect(await d.sync()).toBeNull();
  expect((await d.store.get(shared.id))?.title).toBe('shared before you came');

  await deleteMembership(server.deps.db, group, joiner.user.id);
  expect(await d.sync()).toBeNull();
  expect(await d.store.get(shared.id)).toBeNull();
  expect((await d.store.get(own.id))?.title).toBe('my own');
});
