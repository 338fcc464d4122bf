import request from 'supertest';
import { KeptMailList } from '@/shared/api/dev-mail';
import { Invitation, InvitationList, InvitationPreview, MemberList } from '@/shared/api/groups';
import type { RunningServer } from '@/server/server';
import { bearer, signUp, snapshot, testServer } from './helpers';

let server: RunningServer;
let clock = Date.now();
const api = () => request(server.url);
const DAY = 24 * 3600 * 1000;

beforeAll(async () => {
  server = await testServer({ now: () => new Date(clock) });
});
afterAll(() => server.stop());

/** A fresh group owned by a fresh owner, created through the API. */
async function ownedGroup() {
  const owner = await signUp(server, 'Gwen Owner');
  const res = await api().post('/api/groups').set(bearer(owner.token)).send({ name: 'Skein relations circle' });
  return { owner, groupId: res.body.id as string };
}

/** The token of the link in the last kept mail to `email`, read from the SMTP fake over HTTP. */
async function tokenMailedTo(email: string): Promise<string> {
  const mail = KeptMailList.parse((await api().get('/api/dev/mail')).body).filter((m) => m.to.includes(email));
  expect(mail.length).toBeGreaterThan(0);
  const link = mail[mail.length - 1].links.find((l) => l.includes('/invite/'));
  expect(link).toBeDefined();
  const url = new URL(link!);
  expect(url.origin).toBe(server.deps.config.publicUrl);
  return url.pathname.replace('/invite/', '');
}

describe('the invitation flow through the SMTP fake', () => {
  it('invite -> mail -> preview (signed out) -> sign up -> accept -> member with that role', async () => {
    const { owner, groupId } = await ownedGroup();
    const res = await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'New.Person@Example.org', role: 'admin' });
    expect(res.status).toBe(201);
    expect(Invitation.strict().parse(res.body)).toMatchObject({ groupId, email: 'new.person@example.org', role: 'admin' });
    expect(JSON.stringify(res.body)).not.toMatch(/token/i);

    const [mail] = server.mailbox!.list().filter((m) => m.to.includes('new.person@example.org'));
    expect(mail.subject).toBe('Gwen Owner invited you to Skein relations circle on Overstrand');
    expect(mail.text).toContain('as admin');
    const token = await tokenMailedTo('new.person@example.org');

    const preview = await api().get(`/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(InvitationPreview.strict().parse(preview.body)).toMatchObject({
      groupName: 'Skein relations circle',
      role: 'admin',
      email: 'new.person@example.org',
      invitedBy: 'Gwen Owner',
      status: 'pending',
    });

    const newcomer = await signUp(server, 'New Person');
    const accepted = await api().post(`/api/invitations/${token}/accept`).set(bearer(newcomer.token));
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ id: groupId, name: 'Skein relations circle', role: 'admin' });

    const members = MemberList.parse((await api().get(`/api/groups/${groupId}/members`).set(bearer(newcomer.token))).body);
    expect(members.map((m) => [m.displayName, m.role]).sort()).toEqual([['Gwen Owner', 'owner'], ['New Person', 'admin']]);
    expect((await api().get(`/api/invitations/${token}`)).body.status).toBe('accepted');
  });

  it('a used link gives 409 invitation_used, also to someone else', async () => {
    const { owner, groupId } = await ownedGroup();
    await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'once@example.org', role: 'member' }).expect(201);
    const token = await tokenMailedTo('once@example.org');
    const first = await signUp(server);
    await api().post(`/api/invitations/${token}/accept`).set(bearer(first.token)).expect(200);
    const second = await signUp(server);
    const before = await snapshot(server);
    for (const who of [first, second]) {
      const again = await api().post(`/api/invitations/${token}/accept`).set(bearer(who.token));
      expect(again.status).toBe(409);
      expect(again.body.error).toEqual({ code: 'invitation_used', message: 'This invitation link has already been used' });
    }
    expect(await snapshot(server)).toEqual(before);
  });

  it('an expired link gives 410 invitation_expired and the preview says expired', async () => {
    const { owner, groupId } = await ownedGroup();
    await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'late@example.org', role: 'viewer' }).expect(201);
    const token = await tokenMailedTo('late@example.org');
    const late = await signUp(server);
    clock += 7 * DAY + 1000;
    try {
      expect((await api().get(`/api/invitations/${token}`)).body.status).toBe('expired');
      const res = await api().post(`/api/invitations/${token}/accept`).set(bearer(late.token));
      expect(res.status).toBe(410);
      expect(res.body.error.code).toBe('invitation_expired');
      expect((await api().get(`/api/groups/${groupId}`).set(bearer(late.token))).status).toBe(404);
      expect((await api().get(`/api/groups/${groupId}/invitations`).set(bearer(owner.token))).body).toEqual([]);
    } finally {
      clock = Date.now();
    }
  });

  it('a link still works just before it expires', async () => {
    const { owner, groupId } = await ownedGroup();
    await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'just@example.org', role: 'viewer' }).expect(201);
    const token = await tokenMailedTo('just@example.org');
    clock += 7 * DAY - 60_000;
    try {
      const res = await api().post(`/api/invitations/${token}/accept`).set(bearer((await signUp(server)).token));
      expect(res.body).toMatchObject({ id: groupId, role: 'viewer' });
    } finally {
      clock = Date.now();
    }
  });

  it('an unknown token gives 404 on preview and accept', async () => {
    const someone = await signUp(server);
    expect((await api().get('/api/invitations/nope')).body.error.code).toBe('not_found');
    const res = await api().post('/api/invitations/nope/accept').set(bearer(someone.token));
    expect(res.status).toBe(404);
  });

  it('accepting needs a signed-in user', async () => {
    const res = await api().post('/api/invitations/whatever/accept');
    expect(res.status).toBe(401);
  });

  it('a member accepting an invitation to their own group gets 409 already_member', async () => {
    const { owner, groupId } = await ownedGroup();
    await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'x1@example.org', role: 'viewer' }).expect(201);
    const token = await tokenMailedTo('x1@example.org');
    const res = await api().post(`/api/invitations/${token}/accept`).set(bearer(owner.token));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('already_member');
    expect((await api().get(`/api/invitations/${token}`)).body.status).toBe('pending');
  });
});

describe('POST /api/groups/:id/invitations', () => {
  it('refuses to invite an address that is already a member (409), sending no mail', async () => {
    const { owner, groupId } = await ownedGroup();
    const mailBefore = server.mailbox!.list().length;
    const res = await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: owner.user.email, role: 'member' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('already_member');
    expect(server.mailbox!.list()).toHaveLength(mailBefore);
  });

  it.each([
    ['no e-mail', { role: 'member' }, 'email'],
    ['a bad e-mail', { email: 'nope', role: 'member' }, 'email'],
    ['no role', { email: 'a@example.org' }, 'role'],
    ['an unknown role', { email: 'a@example.org', role: 'boss' }, 'role'],
    ['a role of the wrong type', { email: 'a@example.org', role: ['member'] }, 'role'],
  ])('with %s -> 400, nothing stored, no mail', async (_what, body, field) => {
    const { owner, groupId } = await ownedGroup();
    const before = await snapshot(server);
    const mailBefore = server.mailbox!.list().length;
    const res = await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toEqual(expect.any(String));
    expect(await snapshot(server)).toEqual(before);
    expect(server.mailbox!.list()).toHaveLength(mailBefore);
  });

  it('GET lists pending invitations, newest first, without accepted ones', async () => {
    const { owner, groupId } = await ownedGroup();
    for (const email of ['p1@example.org', 'p2@example.org', 'p3@example.org']) {
      clock += 1000;
      await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email, role: 'member' }).expect(201);
    }
    clock = Date.now();
    await api().post(`/api/invitations/${await tokenMailedTo('p2@example.org')}/accept`).set(bearer((await signUp(server)).token)).expect(200);
    const list = InvitationList.parse((await api().get(`/api/groups/${groupId}/invitations`).set(bearer(owner.token))).body);
    expect(list.map((i) => i.email)).toEqual(['p3@example.org', 'p1@example.org']);
  });
});

describe('DELETE /api/groups/:id/invitations/:invitationId', () => {
  it('withdraws a pending invitation: its link then answers 404', async () => {
    const { owner, groupId } = await ownedGroup();
    const created = await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'gone@example.org', role: 'member' });
    const token = await tokenMailedTo('gone@example.org');
    await api().delete(`/api/groups/${groupId}/invitations/${created.body.id}`).set(bearer(owner.token)).expect(204);
    expect((await api().get(`/api/invitations/${token}`)).status).toBe(404);
    expect((await api().get(`/api/groups/${groupId}/invitations`).set(bearer(owner.token))).body).toEqual([]);
    expect((await api().delete(`/api/groups/${groupId}/invitations/${created.body.id}`).set(bearer(owner.token))).status).toBe(404);
  });

  it('refuses to withdraw an accepted invitation (409)', async () => {
    const { owner, groupId } = await ownedGroup();
    const created = await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'kept@example.org', role: 'member' });
    await api().post(`/api/invitations/${await tokenMailedTo('kept@example.org')}/accept`).set(bearer((await signUp(server)).token)).expect(200);
    const res = await api().delete(`/api/groups/${groupId}/invitations/${created.body.id}`).set(bearer(owner.token));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('invitation_used');
  });

  it('cannot reach an invitation of another group through a group you manage', async () => {
    const a = await ownedGroup();
    const b = await ownedGroup();
    const created = await api().post(`/api/groups/${a.groupId}/invitations`).set(bearer(a.owner.token)).send({ email: 'cross@example.org', role: 'member' });
    const res = await api().delete(`/api/groups/${b.groupId}/invitations/${created.body.id}`).set(bearer(b.owner.token));
    expect(res.status).toBe(404);
    expect((await api().get(`/api/groups/${a.groupId}/invitations`).set(bearer(a.owner.token))).body).toHaveLength(1);
  });
});

describe('when the mail cannot be sent', () => {
  it('answers 502 mail_failed and keeps no invitation', async () => {
    const broken = await testServer({ mailer: { send: () => Promise.reject(new Error('relay down')) } });
    try {
      const owner = await signUp(broken);
      const group = await request(broken.url).post('/api/groups').set(bearer(owner.token)).send({ name: 'G' });
      const res = await request(broken.url).post(`/api/groups/${group.body.id}/invitations`).set(bearer(owner.token)).send({ email: 'a@example.org', role: 'member' });
      expect(res.status).toBe(502);
      expect(res.body.error.code).toBe('mail_failed');
      expect(await broken.deps.db.query('SELECT * FROM invitations')).toEqual([]);
    } finally {
      await broken.stop();
    }
  });
});

describe('development mail pages', () => {
  it('GET /dev/mail lists kept mail as HTML with clickable links, escaped', async () => {
    const { owner, groupId } = await ownedGroup();
    await api().post(`/api/groups/${groupId}/invitations`).set(bearer(owner.token)).send({ email: 'html@example.org', role: 'member' }).expect(201);
    const token = await tokenMailedTo('html@example.org');
    const res = await api().get('/dev/mail');
    expect(res.status).toBe(200);
    expect(res.type).toBe('text/html');
    expect(res.text).toContain(`<a href="${server.deps.config.publicUrl}/invite/${token}">`);
    expect(res.text).toContain('&quot;Skein relations circle&quot;');
  });

  it('are not served when devPages is off (production)', async () => {
    const prod = await testServer({ config: { devPages: false } });
    try {
      expect((await request(prod.url).get('/api/dev/mail')).status).toBe(404);
      expect((await request(prod.url).get('/dev/mail')).status).toBe(404);
    } finally {
      await prod.stop();
    }
  });
});
