import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { GroupList, GroupSummary, MemberList, type Role } from '@/shared/api/groups';
import { insertInvitation } from '@/server/invitations/repository';
import type { RunningServer } from '@/server/server';
import { bearer, groupWith, signUp, snapshot, testServer } from './helpers';

let server: RunningServer;
const api = () => request(server.url);

// One account per part a user can play in a group; groups are built fresh per case.
const parts = ['owner', 'coowner', 'admin', 'admin2', 'member', 'member2', 'viewer', 'outsider'] as const;
type Part = (typeof parts)[number];
const people = {} as Record<Part, { token: string; id: string }>;

beforeAll(async () => {
  server = await testServer();
  for (const p of parts) {
    const { token, user } = await signUp(server, `The ${p}`);
    people[p] = { token, id: user.id };
  }
});
afterAll(() => server.stop());

/**
 * owner and coowner own it; admin, admin2, member, member2, viewer as named; outsider is not in
 * it. One invitation is pending.
 */
const fullGroup = async () => {
  const id = await groupWith(server, [
    [people.owner.id, 'owner'],
    [people.coowner.id, 'owner'],
    [people.admin.id, 'admin'],
    [people.admin2.id, 'admin'],
    [people.member.id, 'member'],
    [people.member2.id, 'member'],
    [people.viewer.id, 'viewer'],
  ]);
  await insertInvitation(server.deps.db, {
    id: randomUUID(),
    groupId: id,
    email: 'pending@example.org',
    role: 'member',
    tokenHash: randomUUID(),
    invitedById: people.owner.id,
    expiresAt: new Date(Date.now() + 3600_000),
    createdAt: new Date(),
  });
  return id;
};

describe('creating and listing groups', () => {
  it('POST /api/groups makes the creator owner; GET lists it with the role', async () => {
    const { token } = await signUp(server, 'Founder');
    const res = await api().post('/api/groups').set(bearer(token)).send({ name: '  Braids seminar ' });
    expect(res.status).toBe(201);
    const group = GroupSummary.strict().parse(res.body);
    expect(group).toEqual({ id: expect.any(String), name: 'Braids seminar', role: 'owner' });

    const list = await api().get('/api/groups').set(bearer(token));
    expect(list.status).toBe(200);
    expect(GroupList.parse(list.body)).toEqual([group]);
    expect((await api().get(`/api/groups/${group.id}`).set(bearer(token))).body).toEqual(group);
  });

  it('GET /api/groups shows each of my groups with my role there, and no others', async () => {
    const { token, user } = await signUp(server, 'Juggler');
    const a = await groupWith(server, [[user.id, 'owner']]);
    const b = await groupWith(server, [[people.owner.id, 'owner'], [user.id, 'viewer']]);
    await groupWith(server, [[people.owner.id, 'owner']]);
    const list = GroupList.parse((await api().get('/api/groups').set(bearer(token))).body);
    expect(list.map((g) => [g.id, g.role]).sort()).toEqual([[a, 'owner'], [b, 'viewer']].sort());
  });

  it('GET /api/groups/:id/members lists every member with e-mail and role', async () => {
    const id = await fullGroup();
    const res = await api().get(`/api/groups/${id}/members`).set(bearer(people.viewer.token));
    expect(res.status).toBe(200);
    const members = MemberList.parse(res.body);
    expect(members).toHaveLength(7);
    expect(members.find((m) => m.userId === people.admin.id)).toEqual({
      userId: people.admin.id,
      displayName: 'The admin',
      email: expect.stringMatching(/@example\.org$/),
      role: 'admin',
    });
  });

  it('needs a signed-in user for every group route', async () => {
    const id = await fullGroup();
    for (const res of [
      await api().get('/api/groups'),
      await api().post('/api/groups').send({ name: 'x' }),
      await api().get(`/api/groups/${id}`),
      await api().get(`/api/groups/${id}/members`),
      await api().patch(`/api/groups/${id}/members/${people.member.id}`).send({ role: 'viewer' }),
      await api().delete(`/api/groups/${id}/members/${people.member.id}`),
      await api().post(`/api/groups/${id}/leave`),
    ]) {
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthorized');
    }
  });
});

describe('bad input changes nothing', () => {
  it.each([
    ['no name', {}],
    ['a number for a name', { name: 5 }],
    ['a blank name', { name: '   ' }],
    ['a name over 100 characters', { name: 'g'.repeat(101) }],
  ])('POST /api/groups with %s -> 400 naming the field', async (_what, body) => {
    const before = await snapshot(server);
    const res = await api().post('/api/groups').set(bearer(people.owner.token)).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error).toEqual({ code: 'invalid_input', message: expect.stringContaining('name'), fields: { name: expect.any(String) } });
    expect(await snapshot(server)).toEqual(before);
  });

  it('PATCH a member with an unknown role or no role -> 400', async () => {
    const id = await fullGroup();
    const before = await snapshot(server);
    for (const body of [{ role: 'superuser' }, {}, { role: 1 }]) {
      const res = await api().patch(`/api/groups/${id}/members/${people.member.id}`).set(bearer(people.owner.token)).send(body);
      expect(res.status).toBe(400);
      expect(res.body.error.fields.role).toEqual(expect.any(String));
    }
    expect(await snapshot(server)).toEqual(before);
  });

  it('a group or user id that is not a UUID -> 400 naming the parameter', async () => {
    const bad = await api().get('/api/groups/42/members').set(bearer(people.owner.token));
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ id: expect.any(String) });
    const id = await fullGroup();
    const badUser = await api().delete(`/api/groups/${id}/members/nobody`).set(bearer(people.owner.token));
    expect(badUser.status).toBe(400);
    expect(badUser.body.error.fields).toEqual({ userId: expect.any(String) });
  });

  it('a user who is not in the group -> 404 for role change and removal', async () => {
    const id = await fullGroup();
    for (const res of [
      await api().patch(`/api/groups/${id}/members/${people.outsider.id}`).set(bearer(people.owner.token)).send({ role: 'viewer' }),
      await api().delete(`/api/groups/${id}/members/${people.outsider.id}`).set(bearer(people.owner.token)),
    ]) {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
  });
});

// The role matrix: every actor role (and a non-member) against every group action.
// Expected status per actor: owner, admin, member, viewer, outsider.
type Row = [action: string, call: (groupId: string, token: string) => PromiseLike<request.Response>, expect: Record<Exclude<Part, 'coowner' | 'admin2' | 'member2'>, number>];
const invite = (role: Role) => (g: string, t: string) =>
  api().post(`/api/groups/${g}/invitations`).set(bearer(t)).send({ email: `someone-${Math.random().toString(36).slice(2)}@example.org`, role });
const patch = (who: Part, role: Role) => (g: string, t: string) =>
  api().patch(`/api/groups/${g}/members/${people[who].id}`).set(bearer(t)).send({ role });
const remove = (who: Part) => (g: string, t: string) => api().delete(`/api/groups/${g}/members/${people[who].id}`).set(bearer(t));

const revoke = async (g: string, t: string) => {
  const [{ id }] = await server.deps.db.query('SELECT id FROM invitations WHERE groupId = ?', [g]);
  return api().delete(`/api/groups/${g}/invitations/${id}`).set(bearer(t));
};

const matrix: Row[] = [
  ['view the group', (g, t) => api().get(`/api/groups/${g}`).set(bearer(t)), { owner: 200, admin: 200, member: 200, viewer: 200, outsider: 404 }],
  ['list members', (g, t) => api().get(`/api/groups/${g}/members`).set(bearer(t)), { owner: 200, admin: 200, member: 200, viewer: 200, outsider: 404 }],
  ['list invitations', (g, t) => api().get(`/api/groups/${g}/invitations`).set(bearer(t)), { owner: 200, admin: 200, member: 403, viewer: 403, outsider: 404 }],
  ['invite a viewer', invite('viewer'), { owner: 201, admin: 201, member: 403, viewer: 403, outsider: 404 }],
  ['invite a member', invite('member'), { owner: 201, admin: 201, member: 403, viewer: 403, outsider: 404 }],
  ['invite an admin', invite('admin'), { owner: 201, admin: 201, member: 403, viewer: 403, outsider: 404 }],
  ['invite an owner', invite('owner'), { owner: 201, admin: 403, member: 403, viewer: 403, outsider: 404 }],
  ['withdraw an invitation', revoke, { owner: 204, admin: 204, member: 403, viewer: 403, outsider: 404 }],
  ['make a member viewer', patch('member2', 'viewer'), { owner: 200, admin: 200, member: 403, viewer: 403, outsider: 404 }],
  ['make a member admin', patch('member2', 'admin'), { owner: 200, admin: 200, member: 403, viewer: 403, outsider: 404 }],
  ['make a member owner', patch('member2', 'owner'), { owner: 200, admin: 403, member: 403, viewer: 403, outsider: 404 }],
  ['demote an admin', patch('admin2', 'member'), { owner: 200, admin: 200, member: 403, viewer: 403, outsider: 404 }],
  ['demote an owner', patch('coowner', 'admin'), { owner: 200, admin: 403, member: 403, viewer: 403, outsider: 404 }],
  ['remove a member', remove('member2'), { owner: 204, admin: 204, member: 403, viewer: 403, outsider: 404 }],
  ['remove an admin', remove('admin2'), { owner: 204, admin: 204, member: 403, viewer: 403, outsider: 404 }],
  ['remove an owner', remove('coowner'), { owner: 204, admin: 403, member: 403, viewer: 403, outsider: 404 }],
  ['leave', (g, t) => api().post(`/api/groups/${g}/leave`).set(bearer(t)), { owner: 204, admin: 204, member: 204, viewer: 204, outsider: 404 }],
];

const cases = matrix.flatMap(([action, call, expected]) =>
  Object.entries(expected).map(([actor, status]) => [action, actor as Part, status, call] as const),
);

describe('role matrix', () => {
  it.each(cases)('%s as %s -> %i, and a refusal changes nothing', async (action, actor, status, call) => {
    const id = await fullGroup();
    const before = await snapshot(server);
    const res = await call(id, people[actor].token);
    expect(res.status).toBe(status);
    const after = await snapshot(server);
    if (status >= 400) {
      expect(res.body.error.code).toBe({ 403: 'forbidden', 404: 'not_found' }[status]);
      expect(after).toEqual(before);
    } else if (!action.startsWith('view') && !action.startsWith('list')) {
      expect(after).not.toEqual(before);
    }
  });
});

describe('what a role change and a removal do', () => {
  it('PATCH returns the member with the new role; DELETE takes them out of the list', async () => {
    const id = await fullGroup();
    const patched = await patch('member', 'viewer')(id, people.admin.token);
    expect(patched.body).toEqual({ userId: people.member.id, displayName: 'The member', email: expect.any(String), role: 'viewer' });
    await remove('viewer')(id, people.admin.token).expect(204);
    const members = MemberList.parse((await api().get(`/api/groups/${id}/members`).set(bearer(people.owner.token))).body);
    expect(members.find((m) => m.userId === people.member.id)?.role).toBe('viewer');
    expect(members.some((m) => m.userId === people.viewer.id)).toBe(false);
    expect((await api().get(`/api/groups/${id}`).set(bearer(people.viewer.token))).status).toBe(404);
  });
});

describe('the last owner', () => {
  const soloGroup = () =>
    groupWith(server, [
      [people.owner.id, 'owner'],
      [people.admin.id, 'admin'],
    ]);

  it('cannot leave, remove themselves or demote themselves (409 last_owner)', async () => {
    const id = await soloGroup();
    const before = await snapshot(server);
    for (const res of [
      await api().post(`/api/groups/${id}/leave`).set(bearer(people.owner.token)),
      await remove('owner')(id, people.owner.token),
      await patch('owner', 'admin')(id, people.owner.token),
    ]) {
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('last_owner');
    }
    expect(await snapshot(server)).toEqual(before);
  });

  it('cannot be demoted or removed by an admin (403)', async () => {
    const id = await soloGroup();
    expect((await patch('owner', 'member')(id, people.admin.token)).status).toBe(403);
    expect((await remove('owner')(id, people.admin.token)).status).toBe(403);
  });

  it('can step down once someone else is owner', async () => {
    const id = await soloGroup();
    await patch('admin', 'owner')(id, people.owner.token).expect(200);
    await patch('owner', 'member')(id, people.owner.token).expect(200);
    await api().post(`/api/groups/${id}/leave`).set(bearer(people.owner.token)).expect(204);
    const members = MemberList.parse((await api().get(`/api/groups/${id}/members`).set(bearer(people.admin.token))).body);
    expect(members).toEqual([expect.objectContaining({ userId: people.admin.id, role: 'owner' })]);
  });
});

describe('one group never shows another', () => {
  it('a member of group B reads and changes nothing of group A, even for people in both', async () => {
    const a = await groupWith(server, [[people.owner.id, 'owner'], [people.member.id, 'member']]);
    // The admin of B shares a member with A but has no standing in A.
    await groupWith(server, [[people.admin.id, 'owner'], [people.member.id, 'member']]);
    const t = people.admin.token;
    const before = await snapshot(server);
    for (const res of [
      await api().get(`/api/groups/${a}`).set(bearer(t)),
      await api().get(`/api/groups/${a}/members`).set(bearer(t)),
      await api().get(`/api/groups/${a}/invitations`).set(bearer(t)),
      await patch('member', 'viewer')(a, t),
      await remove('member')(a, t),
      await invite('member')(a, t),
    ]) {
      expect(res.status).toBe(404);
      expect(JSON.stringify(res.body)).not.toContain(people.owner.id);
    }
    expect(await snapshot(server)).toEqual(before);
    const mine = GroupList.parse((await api().get('/api/groups').set(bearer(t))).body);
    expect(mine.map((g) => g.id)).not.toContain(a);
  });

  it('an unknown group id looks exactly like a group you are not in', async () => {
    const a = await groupWith(server, [[people.owner.id, 'owner']]);
    const notMine = await api().get(`/api/groups/${a}/members`).set(bearer(people.outsider.token));
    const unknown = await api().get(`/api/groups/00000000-0000-4000-8000-000000000000/members`).set(bearer(people.outsider.token));
    expect(notMine.status).toBe(404);
    expect(unknown.body).toEqual(notMine.body);
  });
});
