// Comments on a shared sketch (role x action matrix) and the notifications they cause: in-app,
// by e-mail through the SMTP fake, and the per-user setting that turns the e-mail off.
import { randomUUID } from 'node:crypto';
import { Comment, CommentList } from '@/shared/api/comments';
import { NotificationList, UserSettings } from '@/shared/api/notifications';
import type { RunningServer } from '@/server/server';
import { api, auth, castServer, everyone, memberWrite, sketchOf, type Cast, type Who } from './feed-fixtures';

let server: RunningServer;
let c: Cast;
let sketch: string;
beforeAll(async () => {
  ({ server, c } = await castServer());
  sketch = await sketchOf(server, c.as.member, { title: 'Whitehead link?', groupId: c.group });
});
afterAll(() => server.stop());

const post = (who: Who, body: object, id = sketch) => api(server).post(`/api/sketches/${id}/comments`).set(auth(c.as[who])).send(body);
const list = (who: Who, id = sketch) => api(server).get(`/api/sketches/${id}/comments`).set(auth(c.as[who]));
const edit = (who: Who, commentId: string, body: string) => api(server).patch(`/api/comments/${commentId}`).set(auth(c.as[who])).send({ body });
const remove = (who: Who, commentId: string) => api(server).delete(`/api/comments/${commentId}`).set(auth(c.as[who]));
const count = async () => (await server.deps.db.query('SELECT COUNT(*) AS n FROM comments'))[0].n as number;

describe('who may read and write comments', () => {
  it.each(memberWrite(201))('%s comments -> %d', async (who, status) => {
    const before = await count();
    const res = await post(who, { body: `From the ${who}` });
    expect(res.status).toBe(status);
    expect(await count()).toBe(before + (status === 201 ? 1 : 0));
    if (status === 201) expect(Comment.parse(res.body)).toMatchObject({ sketchId: sketch, body: `From the ${who}`, author: { id: c.as[who].id }, editedAt: null });
  });

  it.each(everyone.map((w) => [w, w === 'outsider' ? 404 : 200] as [Who, number]))('%s reads the discussion -> %d', async (who, status) => {
    const res = await list(who);
    expect(res.status).toBe(status);
    if (status === 200) expect(CommentList.parse(res.body).map((x) => x.body).slice(0, 3)).toEqual(['From the owner', 'From the admin', 'From the member']);
  });

  it('authors edit their own comment; nobody edits another\'s, not even an owner', async () => {
    const mine = Comment.parse((await post('member', { body: 'typo heer' })).body);
    for (const who of ['owner', 'admin', 'viewer'] as Who[]) expect((await edit(who, mine.id, 'hijacked')).status).toBe(403);
    expect((await edit('outsider', mine.id, 'hijacked')).status).toBe(404);
    const ok = await edit('member', mine.id, 'typo here');
    expect(ok.status).toBe(200);
    expect(Comment.parse(ok.body)).toMatchObject({ body: 'typo here', editedAt: expect.any(String) });
    expect((await edit('member', mine.id, '   ')).status).toBe(400);
  });

  it.each([
    ['member', 'member', 204], // own
    ['owner', 'member', 204], // owners moderate
    ['admin', 'member', 204], // admins moderate
    ['member', 'admin', 403],
    ['viewer', 'member', 403],
    ['outsider', 'member', 404],
  ] as [Who, Who, number][])('%s removes a comment by %s -> %d', async (who, author, status) => {
    const x = Comment.parse((await post(author, { body: 'to remove' })).body);
    expect((await remove(who, x.id)).status).toBe(status);
    const left = await server.deps.db.query('SELECT id FROM comments WHERE id = ?', [x.id]);
    expect(left).toHaveLength(status === 204 ? 0 : 1);
  });

  it('refuses empty and oversized comments with a clear message, and private sketches (404)', async () => {
    const empty = await post('member', { body: '  ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields.body).toBe('Write something first');
    expect((await post('member', { body: 'x'.repeat(5001) })).body.error.fields.body).toMatch(/at most 5000/);
    const priv = await sketchOf(server, c.as.owner, { title: 'Not shared' });
    expect((await post('owner', { body: 'hello' }, priv)).status).toBe(404);
    expect((await post('member', { body: 'hello' }, priv)).status).toBe(404);
  });

  it('keeps markup as typed: the body is text, never HTML', async () => {
    const body = '**Bold** and <script>alert(1)</script> `X[1,5,2,4]`';
    const x = Comment.parse((await post('admin', { body })).body);
    expect(x.body).toBe(body);
    const feedPage = await api(server).get(`/api/groups/${c.group}/feed/${sketch}`).set(auth(c.as.viewer));
    expect(feedPage.headers['content-type']).toMatch(/application\/json/);
  });

  it('comments stay with the group they were written in: re-shared elsewhere, they do not follow', async () => {
    const s = await sketchOf(server, c.as.admin, { title: 'Travels', groupId: c.group });
    await post('member', { body: 'seen in group one' }, s);
    const moved = await api(server).put(`/api/sketches/${s}/share`).set(auth(c.as.admin)).send({ groupId: c.otherGroup });
    expect(moved.status).toBe(404); // admin is not in the outsider's group
    // Move it to a group the admin owns with the outsider in it.
    const g2 = (await api(server).post('/api/groups').set(auth(c.as.admin)).send({ name: 'Second' })).body.id as string;
    expect((await api(server).put(`/api/sketches/${s}/share`).set(auth(c.as.admin)).send({ groupId: g2 })).status).toBe(200);
    expect((await list('admin', s)).body).toEqual([]);
    expect((await list('member', s)).status).toBe(404); // no longer shared with the member
  });
});

describe('S34: comment ids made on the device', () => {
  const commentNotes = async (id: string) =>
    Number((await server.deps.db.query(`SELECT COUNT(*) AS n FROM notifications WHERE payload LIKE ?`, [`%${id}%`]))[0].n);

  it('a repeat with the same id and author answers the stored comment and changes nothing', async () => {
    const s = await sketchOf(server, c.as.owner, { title: 'Retried', groupId: c.group });
    const id = randomUUID();
    const [rows, mails] = [await count(), server.mailbox!.list().length];
    const first = await post('member', { id, body: 'first try' }, s);
    expect(first.status).toBe(201);
    expect(Comment.parse(first.body)).toMatchObject({ id, sketchId: s, body: 'first try', author: { id: c.as.member.id } });
    const again = await post('member', { id, body: 'first try' }, s);
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    // A later body under the same id is still the same comment: the first body stands (edits are PATCH).
    expect((await post('member', { id, body: 'changed on the way' }, s)).body).toEqual(first.body);
    expect(await count()).toBe(rows + 1);
    expect(CommentList.parse((await list('owner', s)).body).map((x) => x.id)).toEqual([id]);
    expect(await commentNotes(id)).toBe(1); // the owner is told once
    expect(server.mailbox!.list()).toHaveLength(mails + 1);
  });

  it('the same id from another author or on another sketch is 409 and stores nothing', async () => {
    const s = await sketchOf(server, c.as.owner, { title: 'Clash', groupId: c.group });
    const other = await sketchOf(server, c.as.owner, { title: 'Clash two', groupId: c.group });
    const id = randomUUID();
    expect((await post('member', { id, body: 'mine' }, s)).status).toBe(201);
    const rows = await count();
    const byAdmin = await post('admin', { id, body: 'also mine?' }, s);
    expect(byAdmin.status).toBe(409);
    expect(byAdmin.body.error.code).toBe('id_taken');
    expect((await post('member', { id, body: 'mine' }, other)).status).toBe(409);
    expect(await count()).toBe(rows);
    expect((await list('member', other)).body).toEqual([]);
    expect(CommentList.parse((await list('member', s)).body)).toMatchObject([{ id, body: 'mine', author: { id: c.as.member.id } }]);
  });

  it('the permission checks come first: a viewer or outsider reusing an id learns nothing', async () => {
    const s = await sketchOf(server, c.as.owner, { title: 'Gated', groupId: c.group });
    const id = randomUUID();
    await post('member', { id, body: 'here' }, s);
    expect((await post('viewer', { id, body: 'here' }, s)).status).toBe(403);
    expect((await post('outsider', { id, body: 'here' }, s)).status).toBe(404);
    expect((await post('member', { id: 'not-a-uuid', body: 'x' }, s)).status).toBe(400);
  });
});

describe('notifications', () => {
  const notes = (who: Who, q = '') => api(server).get(`/api/notifications${q}`).set(auth(c.as[who]));

  it('a comment on my sketch notifies me in the app and by e-mail, not the commenter', async () => {
    const s = await sketchOf(server, c.as.owner, { title: 'Borromean rings', groupId: c.group });
    const mailBefore = server.mailbox!.list().length;
    await post('member', { body: 'Is this *really* Brunnian?' }, s);
    const mine = NotificationList.parse((await notes('owner')).body);
    expect(mine.items[0]).toMatchObject({
      kind: 'comment',
      readAt: null,
      payload: { sketchId: s, groupId: c.group, sketchTitle: 'Borromean rings', author: c.as.member.name, excerpt: 'Is this *really* Brunnian?' },
    });
    expect(mine.unread).toBeGreaterThan(0);
    const mail = server.mailbox!.list().slice(mailBefore);
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toBe(`${c.as.member.name} commented on "Borromean rings"`);
    expect(mail[0].text).toContain(`${server.deps.config.publicUrl}/feed/${c.group}/${s}`);
    expect(NotificationList.parse((await notes('member')).body).items.filter((n) => n.kind === 'comment' && n.payload.sketchId === s)).toEqual([]);
    // Commenting on my own sketch tells nobody.
    const n = NotificationList.parse((await notes('owner')).body).items.length;
    await post('owner', { body: 'Yes.' }, s);
    expect(NotificationList.parse((await notes('owner')).body).items).toHaveLength(n);
  });

  it('marks one or all read; another user cannot touch mine', async () => {
    const first = NotificationList.parse((await notes('owner')).body).items[0];
    expect((await api(server).post(`/api/notifications/${first.id}/read`).set(auth(c.as.member))).status).toBe(404);
    const read = await api(server).post(`/api/notifications/${first.id}/read`).set(auth(c.as.owner));
    expect(read.status).toBe(200);
    expect(read.body.readAt).toEqual(expect.any(String));
    expect((await api(server).post('/api/notifications/read').set(auth(c.as.owner))).status).toBe(204);
    expect(NotificationList.parse((await notes('owner')).body).unread).toBe(0);
    expect(NotificationList.parse((await notes('owner', '?unread=true')).body).items).toEqual([]);
  });

  it('the e-mail setting per kind stops the e-mail but keeps the in-app notification', async () => {
    const settings = UserSettings.parse((await api(server).get('/api/me/settings').set(auth(c.as.owner))).body);
    expect(settings.email.comment).toBe(true);
    const off = { email: { ...settings.email, comment: false } };
    expect((await api(server).put('/api/me/settings').set(auth(c.as.owner)).send(off)).body).toEqual(off);
    expect((await api(server).put('/api/me/settings').set(auth(c.as.owner)).send({ email: { comment: 'no' } })).status).toBe(400);
    const s = await sketchOf(server, c.as.owner, { title: 'Quiet', groupId: c.group });
    const mailBefore = server.mailbox!.list().length;
    await post('admin', { body: 'hello' }, s);
    expect(server.mailbox!.list()).toHaveLength(mailBefore);
    expect(NotificationList.parse((await notes('owner')).body).items[0]).toMatchObject({ kind: 'comment', payload: { sketchId: s } });
    expect(UserSettings.parse((await api(server).get('/api/me/settings').set(auth(c.as.member))).body).email.comment).toBe(true);
  });

  it('notify() for a finished run (the hook for server/runs) stores and mails it', async () => {
    const { notify } = await import('@/server/notifications/use-cases');
    const mailBefore = server.mailbox!.list().length;
    await notify(server.deps, c.as.viewer.id, 'run_finished', { runId: 'r1', sketchId: sketch, sketchTitle: 'Whitehead link?', status: 'succeeded', summary: 'Kh over Z, thin' });
    expect(NotificationList.parse((await notes('viewer')).body).items[0]).toMatchObject({ kind: 'run_finished', payload: { runId: 'r1', status: 'succeeded' } });
    expect(server.mailbox!.list().slice(mailBefore).map((m) => m.subject)).toEqual(['Run succeeded: "Whitehead link?"']);
    // A malformed payload is a programming error, refused before anything is stored.
    await expect(notify(server.deps, c.as.viewer.id, 'run_finished', { runId: 'r2' } as never)).rejects.toThrow();
  });
});
