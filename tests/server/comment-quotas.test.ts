// Bursts of comments neither flood the sketch owner's mailbox nor the server: notification mail
// to one person is paced into digests, and one author's comments are rate-limited (429).
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { commentPaths } from '@/shared/api/comments';
import type { RunningServer } from '@/server/server';
import { api, auth, cast, sketchOf, type Cast } from './feed-fixtures';
import { testServer } from './helpers';

const post = (server: RunningServer, token: string, sketchId: string, body: string, id = randomUUID()) =>
  request(server.url).post(commentPaths.comments(sketchId)).set({ Authorization: `Bearer ${token}` }).send({ id, body });
const mailTo = (server: RunningServer, email: string) => server.mailbox!.list().filter((m) => m.to.includes(email));
const ownerEmail = async (server: RunningServer, c: Cast) => (await api(server).get('/api/me').set(auth(c.as.owner))).body.email as string;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
async function until(check: () => boolean, ms = 10_000) {
  for (const end = Date.now() + ms; !check(); await sleep(25)) if (Date.now() > end) throw new Error('timed out waiting');
}

describe('notification mail in a burst of comments', () => {
  it('50 comments in a row: the first is mailed at once, the other 49 in one digest after a quiet spell; all 50 are in the app', async () => {
    const server = await testServer({ config: { mailPacing: { quietMs: 1000, maxWaitMs: 60_000, cap: 100 } } });
    try {
      const c = await cast(server);
      const email = await ownerEmail(server, c);
      const id = await sketchOf(server, c.as.owner, { groupId: c.group, title: 'Busy board' });
      for (let k = 1; k <= 50; k++) expect((await post(server, c.as.member.token, id, `Remark ${k}`)).status).toBe(201);
      await until(() => mailTo(server, email).length >= 1);
      expect(mailTo(server, email).map((m) => m.subject)).toEqual([`${c.as.member.name} commented on "Busy board"`]);
      await until(() => mailTo(server, email).length >= 2);
      await sleep(1500); // a quiet spell longer than quietMs: nothing else leaves
      const [, digest, ...more] = mailTo(server, email);
      expect(more).toEqual([]);
      expect(digest.subject).toBe('49 new notifications on Overstrand');
      expect(digest.text.match(/^- .* commented on "Busy board"$/gm)).toHaveLength(49);
      const inApp = (await api(server).get('/api/notifications').set(auth(c.as.owner))).body;
      expect(inApp.unread).toBe(50);
    } finally {
      await server.stop();
    }
  }, 30_000);

  it('a digest leaves when the cap is reached, and what still waits is sent on stop', async () => {
    const server = await testServer({ config: { mailPacing: { quietMs: 60_000, maxWaitMs: 60_000, cap: 10 } } });
    const c = await cast(server);
    const email = await ownerEmail(server, c);
    const id = await sketchOf(server, c.as.owner, { groupId: c.group });
    for (let k = 1; k <= 25; k++) await post(server, c.as.member.token, id, `Remark ${k}`).expect(201);
    await until(() => mailTo(server, email).length >= 3);
    expect(mailTo(server, email).map((m) => m.subject.split(' ')[0])).toEqual([c.as.member.name.split(' ')[0], '10', '10']);
    await server.stop();
    expect(mailTo(server, email).map((m) => m.subject).at(-1)).toBe('4 new notifications on Overstrand');
  });
});

describe('comment rate per author', () => {
  let server: RunningServer;
  let c: Cast;
  beforeAll(async () => {
    server = await testServer({ config: { commentRateLimit: { windowMs: 60_000, limit: 5 } } });
    c = await cast(server);
  });
  afterAll(() => server.stop());

  it('answers 429 with a clear message past the limit; a resent comment id does not count; others still post', async () => {
    const id = await sketchOf(server, c.as.owner, { groupId: c.group });
    const first = randomUUID();
    await post(server, c.as.member.token, id, 'One', first).expect(201);
    for (let k = 0; k < 3; k++) await post(server, c.as.member.token, id, 'One', first).expect(200); // S34 resends
    for (let k = 2; k <= 5; k++) await post(server, c.as.member.token, id, `Number ${k}`).expect(201);
    const res = await post(server, c.as.member.token, id, 'Number 6');
    expect(res.status).toBe(429);
    expect(res.body.error).toEqual({ code: 'rate_limited', message: 'You are commenting very fast: at most 5 comments in 60 seconds; wait a moment and post again' });
    await post(server, c.as.admin.token, id, 'From someone else').expect(201);
  });
});
