// Comments written offline reach the server once (sync/SPEC.md S34), over real HTTP against the
// real server: the device side is the real engine and store over in-memory tables.
import request from 'supertest';
import { CommentList } from '@/shared/api/comments';
import type { RunningServer } from '@/server/server';
import { bearer, groupWith, signUp, testServer } from './helpers';
import { Device } from './sync-device';

let server: RunningServer;
let ann: { token: string; id: string };
let bob: { token: string; id: string };
let vic: { token: string; id: string };
let group: string;
const url = () => server.url;

beforeAll(async () => {
  server = await testServer();
  [ann, bob, vic] = await Promise.all(['Ann', 'Bob', 'Vic'].map(async (n) => {
    const a = await signUp(server, n);
    return { token: a.token, id: a.user.id };
  }));
  group = await groupWith(server, [[ann.id, 'owner'], [bob.id, 'member'], [vic.id, 'viewer']]);
});
afterAll(() => server.stop());

const serverComments = async (sketchId: string) =>
  CommentList.parse((await request(server.url).get(`/api/sketches/${sketchId}/comments`).set(bearer(ann.token))).body);
const notificationsAbout = async (commentId: string) =>
  Number((await server.deps.db.query('SELECT COUNT(*) AS n FROM notifications WHERE payload LIKE ?', [`%${commentId}%`]))[0].n);

test('S34: a comment on a sketch shared offline goes after its sketch, once across a lost answer and a retry', async () => {
  const d = new Device(url, ann.token);
  d.faults.offline = true;
  const s = await d.store.create({ title: 'Shared in the field', groupId: group });
  const c = await d.store.addComment(s.id, 'drawn from the board, check the crossing signs');
  expect(await d.sync()).toMatchObject({ message: 'offline (test)' }); // offline
  expect((await d.store.counts()).comments).toBe(1);

  d.faults.offline = false;
  d.faults.dropCommentAnswers = 1;
  expect(await d.sync()).toMatchObject({ message: 'answer lost (test)' }); // the server made the comment, the answer was lost
  expect((await serverComments(s.id)).map((x) => x.id)).toEqual([c.id]); // the sketch got there first
  expect((await d.store.comments(s.id))[0].state).toBe('waiting');

  expect(await d.sync()).toBeNull(); // the retry sends the same id
  expect(d.commentPosts).toBe(2);
  expect(await d.store.comments(s.id)).toEqual([{ ...c, state: 'sent' }]);
  expect((await d.store.counts()).comments).toBe(0);
  expect(await d.sync()).toBeNull();
  expect(d.commentPosts).toBe(2); // sent ones are not sent again
  const onServer = await serverComments(s.id);
  expect(onServer).toHaveLength(1);
  expect(onServer[0]).toMatchObject({ id: c.id, body: c.body, author: { id: ann.id } });
});

test('S34: a member\'s offline comment on another\'s sketch notifies its owner once, even after a reload', async () => {
  const a = new Device(url, ann.token);
  const s = await a.store.create({ title: 'Ann\'s trefoil', groupId: group });
  expect(await a.sync()).toBeNull();

  const b = new Device(url, bob.token);
  expect(await b.sync()).toBeNull(); // pulls Ann's shared sketch
  b.faults.offline = true;
  const c = await b.store.addComment(s.id, 'is it the left-handed one?');
  b.faults.offline = false;
  b.faults.dropCommentAnswers = 1;
  expect(await b.sync()).toMatchObject({ message: 'answer lost (test)' });
  b.reload(); // the app restarts before the retry
  expect(await b.sync()).toBeNull();
  expect((await b.store.comments(s.id)).map((x) => x.state)).toEqual(['sent']);
  expect((await serverComments(s.id)).map((x) => x.id)).toEqual([c.id]);
  expect(await notificationsAbout(c.id)).toBe(1);
});

test('S34: a comment the server refuses is kept on the device with the reason and not retried', async () => {
  const a = new Device(url, ann.token);
  const s = await a.store.create({ title: 'For viewers', groupId: group });
  expect(await a.sync()).toBeNull();

  const v = new Device(url, vic.token);
  expect(await v.sync()).toBeNull();
  const c = await v.store.addComment(s.id, 'viewers cannot comment');
  expect(await v.sync()).toBeNull(); // a refusal is not a failed round
  const [kept] = await v.store.comments(s.id);
  expect(kept).toMatchObject({ id: c.id, body: c.body, state: 'rejected', reason: expect.stringContaining('403') });
  expect(await v.sync()).toBeNull();
  expect(v.commentPosts).toBe(1);
  expect(await serverComments(s.id)).toEqual([]);
});
