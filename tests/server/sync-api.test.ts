// The sync API over real HTTP, message by message (sync/SPEC.md rules cited per test).
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { SketchList, Sketch } from '@/shared/api/sketches';
import { PullResponse } from '@/shared/api/sync';
import type { RunningServer } from '@/server/server';
import { bearer, groupWith, signUp, testServer } from './helpers';
import { mutation, pullAll, push, sketchFields } from './sync-fixtures';

let server: RunningServer;
let ann: { token: string; id: string };
let bob: { token: string; id: string };
let eve: { token: string; id: string };

beforeAll(async () => {
  server = await testServer();
  for (const [name, set] of [
    ['Ann', (u: typeof ann) => (ann = u)],
    ['Bob', (u: typeof ann) => (bob = u)],
    ['Eve', (u: typeof ann) => (eve = u)],
  ] as const) {
    const r = await signUp(server, name);
    set({ token: r.token, id: r.user.id });
  }
});
afterAll(() => server.stop());

describe('push and pull', () => {
  test('S11, S9, S3: an add is applied with a seq; pull returns it with that version', async () => {
    const id = randomUUID();
    const [r] = await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 1, id, 'add', sketchFields())]);
    expect(r).toMatchObject({ status: 'applied', seq: expect.any(Number) });
    const { changes } = await pullAll(server, ann.token);
    const mine = changes.filter((c) => 'record' in c && c.record.id === id);
    expect(mine).toHaveLength(1);
    expect(mine[0]).toMatchObject({ seq: r.seq, record: { version: r.seq, ownerId: ann.id, fields: { title: 'Trefoil on the board' } } });
  });

  test('S12: the same mutation pushed twice is applied once, answered duplicate', async () => {
    const m = mutation('ann-phone', 2, randomUUID(), 'add', sketchFields({ title: 'twice' }));
    const [first] = await push(server, ann.token, 'ann-phone', [m]);
    const [second] = await push(server, ann.token, 'ann-phone', [m]);
    expect(second).toEqual({ ...first, status: 'duplicate' });
    const { changes } = await pullAll(server, ann.token);
    expect(changes.filter((c) => 'record' in c && c.record.id === m.recordId)).toHaveLength(1);
  });

  test('S9, S15: seqs strictly increase; pages of 2 cover every change once, in order', async () => {
    for (let i = 0; i < 5; i++) await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 10 + i, randomUUID(), 'add', sketchFields({ title: `p${i}` }))]);
    const big = await pullAll(server, ann.token, 500);
    const small = await pullAll(server, ann.token, 2);
    expect(small.changes).toEqual(big.changes);
    const seqs = big.changes.map((c) => c.seq);
    expect(seqs).toEqual([...seqs].sort((a, b) => a - b));
    expect(new Set(seqs).size).toBe(seqs.length);
  });

  test('S15a: a record edited many times is pulled once, in its last state', async () => {
    const id = randomUUID();
    await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 20, id, 'add', sketchFields({ notes: 'v0' }))]);
    for (let i = 1; i <= 4; i++) await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 20 + i, id, 'update', { notes: `v${i}` })]);
    const mine = (await pullAll(server, ann.token)).changes.filter((c) => 'record' in c && c.record.id === id);
    expect(mine).toHaveLength(1);
    expect(mine[0]).toMatchObject({ record: { fields: { notes: 'v4' } } });
  });

  test('S15: an up-to-date pull is empty, hasMore false, cursor unchanged', async () => {
    const { cursor } = await pullAll(server, bob.token);
    const res = await request(server.url).get(`/api/sync/pull?cursor=${cursor}`).set(bearer(bob.token));
    expect(PullResponse.parse(res.body)).toEqual({ changes: [], cursor, hasMore: false, viewer: { userId: bob.id, groupIds: expect.any(Array) } });
  });

  test('S24: a mutation with bad fields is rejected as invalid and changes nothing', async () => {
    const id = randomUUID();
    const [r] = await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 30, id, 'add', { title: 42 })]);
    expect(r).toMatchObject({ status: 'rejected', reason: 'invalid' });
    expect((await request(server.url).get(`/api/sketches/${id}`).set(bearer(ann.token))).status).toBe(404);
  });

  test('S5, S11: a malformed push body is a 400, not a partial apply', async () => {
    const res = await request(server.url).post('/api/sync/push').set(bearer(ann.token)).send({ deviceId: 'x', mutations: [{ nope: 1 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
  });

  test('sign-in is required for push and pull', async () => {
    expect((await request(server.url).get('/api/sync/pull')).status).toBe(401);
    expect((await request(server.url).post('/api/sync/push').send({ deviceId: 'x', mutations: [] })).status).toBe(401);
  });
});

describe('authorisation (S22-S24)', () => {
  test('S23: nobody overwrites or deletes another user\'s sketch; the record stays as it was', async () => {
    const id = randomUUID();
    await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 40, id, 'add', sketchFields({ title: 'Ann only' }))]);
    const results = await push(server, eve.token, 'eve-phone', [
      mutation('eve-phone', 1, id, 'update', { title: 'Eve was here' }),
      mutation('eve-phone', 2, id, 'delete', {}),
      mutation('eve-phone', 3, id, 'add', sketchFields({ title: 'Eve add' })),
    ]);
    expect(results.map((r) => [r.status, r.reason])).toEqual([
      ['rejected', 'forbidden'],
      ['rejected', 'forbidden'],
      ['rejected', 'forbidden'],
    ]);
    const s = Sketch.parse((await request(server.url).get(`/api/sketches/${id}`).set(bearer(ann.token))).body);
    expect(s).toMatchObject({ title: 'Ann only', deleted: false, ownerId: ann.id });
  });

  test('S23: cannot push a sketch into a group one is not in, nor as a viewer', async () => {
    const group = await groupWith(server, [[bob.id, 'owner'], [eve.id, 'viewer']]);
    const [outsider] = await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 41, randomUUID(), 'add', sketchFields({ groupId: group }))]);
    const [viewer] = await push(server, eve.token, 'eve-phone', [mutation('eve-phone', 4, randomUUID(), 'add', sketchFields({ groupId: group }))]);
    expect(outsider).toMatchObject({ status: 'rejected', reason: 'forbidden' });
    expect(viewer).toMatchObject({ status: 'rejected', reason: 'forbidden' });
    // Moving an own private sketch into that group is refused the same way.
    const id = randomUUID();
    await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 42, id, 'add', sketchFields())]);
    const [move] = await push(server, ann.token, 'ann-phone', [mutation('ann-phone', 43, id, 'update', { groupId: group })]);
    expect(move).toMatchObject({ status: 'rejected', reason: 'forbidden' });
  });

  test('S22: group members pull the group\'s sketches; outsiders pull nothing of them', async () => {
    const group = await groupWith(server, [[bob.id, 'owner'], [eve.id, 'viewer']]);
    const id = randomUUID();
    await push(server, bob.token, 'bob-laptop', [mutation('bob-laptop', 1, id, 'add', sketchFields({ groupId: group, title: 'shared' }))]);
    const seen = async (token: string) => (await pullAll(server, token)).changes.some((c) => 'record' in c && c.record.id === id);
    expect(await seen(bob.token)).toBe(true);
    expect(await seen(eve.token)).toBe(true); // a viewer reads
    expect(await seen(ann.token)).toBe(false);
    const list = SketchList.parse((await request(server.url).get(`/api/sketches?groupId=${group}`).set(bearer(eve.token))).body);
    expect(list.map((s) => s.id)).toEqual([id]);
    expect((await request(server.url).get(`/api/sketches/${id}`).set(bearer(ann.token))).status).toBe(404);
  });

  test('S22: unsharing reaches former viewers as revoked, with no content', async () => {
    const group = await groupWith(server, [[bob.id, 'owner'], [eve.id, 'member']]);
    const id = randomUUID();
    await push(server, bob.token, 'bob-laptop', [mutation('bob-laptop', 2, id, 'add', sketchFields({ groupId: group, title: 'secret later' }))]);
    const { cursor } = await pullAll(server, eve.token);
    await push(server, bob.token, 'bob-laptop', [mutation('bob-laptop', 3, id, 'update', { groupId: null, notes: 'private now' })]);
    await push(server, bob.token, 'bob-laptop', [mutation('bob-laptop', 4, id, 'update', { notes: 'and edited after' })]); // S15a keeps the revoke
    const res = await request(server.url).get(`/api/sync/pull?cursor=${cursor}`).set(bearer(eve.token));
    const page = PullResponse.parse(res.body);
    expect(page.changes).toEqual([{ seq: expect.any(Number), revoked: { id, type: 'sketch' } }]);
    expect(JSON.stringify(page)).not.toContain('private now');
    expect(JSON.stringify(page)).not.toContain('and edited after');
  });

  test('S12: a mutation id of another user is rejected, not answered with their result', async () => {
    const m = mutation('bob-laptop', 5, randomUUID(), 'add', sketchFields());
    await push(server, bob.token, 'bob-laptop', [m]);
    const [r] = await push(server, eve.token, 'bob-laptop', [{ ...m }]);
    expect(r).toMatchObject({ status: 'rejected', reason: 'forbidden' });
  });

  test('S20, S23: conflict copies cannot be made or touched by devices of others', async () => {
    const [r] = await push(server, eve.token, 'eve-phone', [
      { ...mutation('eve-phone', 9, `conflict-${randomUUID()}`, 'update', { resolved: true }), type: 'conflict' },
    ]);
    expect(r).toMatchObject({ status: 'rejected', reason: 'forbidden' });
  });
});
