// The members page: roster with joined / last active (owners and admins only), role change,
// removal, resend and revoke of invitations (role x action matrix), and the notification the
// inviter gets when an invitation is accepted.
import request from 'supertest';
import { KeptMailList, devMailPaths } from '@/shared/api/dev-mail';
import { Invitation } from '@/shared/api/groups';
import { Roster } from '@/shared/api/members';
import { NotificationList } from '@/shared/api/notifications';
import type { RunningServer } from '@/server/server';
import { bearer, signUp } from './helpers';
import { api, auth, castServer, type Cast, type Who } from './feed-fixtures';

let server: RunningServer;
let c: Cast;
let clock = Date.parse('2026-12-01T09:00:00Z');
beforeAll(async () => ({ server, c } = await castServer({ now: () => new Date(clock) })));
afterAll(() => server.stop());

const manageStatus = (who: Who, ok: number) => (who === 'owner' || who === 'admin' ? ok : who === 'outsider' ? 404 : 403);
const whoAll: Who[] = ['owner', 'admin', 'member', 'viewer', 'outsider'];

async function invite(email: string) {
  const res = await api(server).post(`/api/groups/${c.group}/invitations`).set(auth(c.as.owner)).send({ email, role: 'member' });
  expect(res.status).toBe(201);
  return Invitation.parse(res.body);
}

async function lastTokenTo(email: string): Promise<string> {
  const mail = KeptMailList.parse((await request(server.url).get(devMailPaths.list)).body).filter((m) => m.to.includes(email));
  return new URL(mail[mail.length - 1].links.find((l) => l.includes('/invite/'))!).pathname.replace('/invite/', '');
}

describe('roster', () => {
  it.each(whoAll.map((w) => [w, manageStatus(w, 200)] as [Who, number]))('%s opens the members table -> %d', async (who, status) => {
    const res = await api(server).get(`/api/groups/${c.group}/roster`).set(auth(c.as[who]));
    expect(res.status).toBe(status);
    if (status !== 200) return;
    const rows = Roster.parse(res.body);
    expect(rows.map((r) => r.role).sort()).toEqual(['admin', 'member', 'owner', 'viewer']);
    expect(rows.every((r) => !Number.isNaN(Date.parse(r.joinedAt)))).toBe(true);
    expect(rows.map((r) => r.userId)).not.toContain(c.as.outsider.id);
  });

  it('last active follows signed-in requests, stamped at most once a minute', async () => {
    const lastOf = async (id: string) => Roster.parse((await api(server).get(`/api/groups/${c.group}/roster`).set(auth(c.as.owner))).body).find((r) => r.userId === id)!.lastActiveAt;
    clock += 120_000;
    await api(server).get('/api/groups').set(auth(c.as.viewer));
    const first = await lastOf(c.as.viewer.id);
    expect(first).toBe(new Date(clock).toISOString());
    clock += 30_000; // within the minute: no new stamp
    await api(server).get('/api/groups').set(auth(c.as.viewer));
    expect(await lastOf(c.as.viewer.id)).toBe(first);
    clock += 60_000;
    await api(server).get('/api/me').set(auth(c.as.viewer));
    expect(await lastOf(c.as.viewer.id)).toBe(new Date(clock).toISOString());
    // A bad token stamps nobody and is still answered 401 by the route.
    expect((await api(server).get('/api/me').set(bearer('nonsense'))).status).toBe(401);
  });
});

describe('invitations on the members page', () => {
  it.each(whoAll.map((w) => [w, manageStatus(w, 200)] as [Who, number]))('%s resends an invitation -> %d', async (who, status) => {
    const email = `resend-${who}@example.org`;
    const inv = await invite(email);
    const oldToken = await lastTokenTo(email);
    const mailBefore = server.mailbox!.list().length;
    const res = await api(server).post(`/api/groups/${c.group}/invitations/${inv.id}/resend`).set(auth(c.as[who]));
    expect(res.status).toBe(status);
    if (status !== 200) {
      expect(server.mailbox!.list()).toHaveLength(mailBefore);
      return;
    }
    expect(Invitation.parse(res.body)).toMatchObject({ id: inv.id, email });
    const newToken = await lastTokenTo(email);
    expect(newToken).not.toBe(oldToken);
    expect((await request(server.url).get(`/api/invitations/${oldToken}`)).status).toBe(404); // the old link is dead
    expect((await request(server.url).get(`/api/invitations/${newToken}`)).body.status).toBe('pending');
  });

  it.each(whoAll.map((w) => [w, manageStatus(w, 204)] as [Who, number]))('%s revokes an invitation -> %d', async (who, status) => {
    const inv = await invite(`revoke-${who}@example.org`);
    expect((await api(server).delete(`/api/groups/${c.group}/invitations/${inv.id}`).set(auth(c.as[who]))).status).toBe(status);
  });

  it('an accepted invitation notifies the inviter in the app and by e-mail; it cannot be resent', async () => {
    const inv = await invite('joiner@example.org');
    const token = await lastTokenTo('joiner@example.org');
    const joiner = await signUp(server, 'Jo Iner');
    const mailBefore = server.mailbox!.list().length;
    expect((await api(server).post(`/api/invitations/${token}/accept`).set(bearer(joiner.token))).status).toBe(200);
    const n = NotificationList.parse((await api(server).get('/api/notifications').set(auth(c.as.owner))).body).items[0];
    expect(n).toMatchObject({ kind: 'invitation_accepted', payload: { groupId: c.group, who: 'Jo Iner', role: 'member' } });
    const mail = server.mailbox!.list().slice(mailBefore);
    const [{ email }] = await server.deps.db.query('SELECT email FROM users WHERE id = ?', [c.as.owner.id]);
    expect(mail.map((m) => m.to)).toEqual([[email]]);
    expect(mail[0].subject).toMatch(/^Jo Iner joined /);
    expect((await api(server).post(`/api/groups/${c.group}/invitations/${inv.id}/resend`).set(auth(c.as.owner))).status).toBe(409);
  });
});

describe('role changes and removal from the members table', () => {
  it.each([
    ['owner', 200],
    ['admin', 200],
    ['member', 403],
    ['viewer', 403],
    ['outsider', 404],
  ] as [Who, number][])('%s makes the viewer a member -> %d', async (who, status) => {
    const v = await signUp(server, 'Temp Viewer');
    await server.deps.db.query(`INSERT INTO memberships ("groupId", "userId", "role", "createdAt") VALUES (?, ?, 'viewer', datetime('now'))`, [c.group, v.user.id]);
    const res = await api(server).patch(`/api/groups/${c.group}/members/${v.user.id}`).set(auth(c.as[who])).send({ role: 'member' });
    expect(res.status).toBe(status);
    const del = await api(server).delete(`/api/groups/${c.group}/members/${v.user.id}`).set(auth(c.as[who]));
    expect(del.status).toBe(status === 200 ? 204 : status);
  });
});
