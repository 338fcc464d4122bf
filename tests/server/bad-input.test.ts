// Bad input answers a 4xx JSON error with a clear message, never a 500: bodies that lie about
// their encoding, paths with broken %-escapes, drawings nested too deep to store, and a big push
// from someone who has not signed in (refused before its body is read).
import { randomUUID } from 'node:crypto';
import { request as httpRequest } from 'node:http';
import request from 'supertest';
import { ApiErrorBody } from '@/shared/api/errors';
import type { RunningServer } from '@/server/server';
import { bearer, signUp, testServer } from './helpers';
import { Device } from './sync-device';
import { mutation, sketchFields } from './sync-fixtures';

let server: RunningServer;
let token: string;
beforeAll(async () => {
  server = await testServer();
  ({ token } = await signUp(server));
});
afterAll(() => server.stop());

function expectClientError(res: { status: number; body: unknown }, status: number, message: RegExp) {
  expect(res.status).toBe(status);
  const body = ApiErrorBody.parse(res.body);
  expect(body.error.message).toMatch(message);
}

/** A value nested `depth` arrays deep, as JSON text (JSON.stringify would recurse that deep too). */
const nested = (depth: number) => '['.repeat(depth) + ']'.repeat(depth);

describe('bad input is a 4xx with a message', () => {
  it('a body labelled gzip that is not gzip', async () => {
    const res = await request(server.url)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .send('{"email":"a@example.org","password":"x"}');
    expectClientError(res, 400, /gzip|encod/i);
  });

  it('a path with a malformed %-escape', async () => {
    const res = await request(server.url).get('/api/runs/%E0%A4%A').set(bearer(token));
    expectClientError(res, 400, /path|escape|encod/i);
  });

  it('a push whose drawing geometry nests thousands of levels deep is rejected as invalid, and nothing is stored', async () => {
    const id = randomUUID();
    const fields = sketchFields();
    const m = mutation('phone-deep', 1, id, 'add', { ...fields, diagram: { ...fields.diagram, geometry: '__DEEP__' } });
    const body = JSON.stringify({ deviceId: 'phone-deep', mutations: [m] }).replace('"__DEEP__"', nested(4200));
    const res = await request(server.url).post('/api/sync/push').set(bearer(token)).set('Content-Type', 'application/json').send(body);
    expect(res.status).toBe(200);
    expect(res.body.results[0]).toMatchObject({ status: 'rejected', reason: 'invalid' });
    expect(res.body.results[0].message).toMatch(/geometry.*deep/i);
    expect((await request(server.url).get(`/api/sketches/${id}`).set(bearer(token))).status).toBe(404);
  });

  it('an 8 MB push without a token is refused (401) before its body is read', async () => {
    const size = 8 * 1024 * 1024 - 1024;
    const status = await new Promise<number>((resolve, reject) => {
      const req = httpRequest(`${server.url}/api/sync/push`, { method: 'POST', headers: { 'Content-Type': 'application/json', 'Content-Length': size } }, (res) => {
        res.resume();
        resolve(res.statusCode ?? 0);
        req.destroy();
      });
      req.on('error', reject);
      // Send only the first bytes: a server that waits for the whole body before answering never answers.
      req.write('{"deviceId":"x","mutations":[');
    });
    expect(status).toBe(401);
  });
});

describe('a device meeting a permanent refusal', () => {
  it('sets aside a mutation the server refuses with a 4xx and pushes the rest, instead of retrying forever', async () => {
    const d = new Device(() => server.url, token);
    const fields = sketchFields();
    // Over the 8 MB push limit on its own: every retry of it is answered 413.
    const huge = await d.store.create({ title: 'huge', diagram: { ...fields.diagram, geometry: 'x'.repeat(9 * 1024 * 1024) } });
    const fine = await d.store.create({ title: 'fine' });
    expect(await d.sync()).toBeNull();
    expect(await d.store.counts()).toMatchObject({ waiting: 0, rejected: 1 });
    expect((await d.store.rejected(huge.id))[0].reason).toBe('invalid');
    expect((await request(server.url).get(`/api/sketches/${fine.id}`).set(bearer(token))).body.title).toBe('fine');
    const pushes = d.pushes;
    expect(await d.sync()).toBeNull();
    expect(d.pushes).toBe(pushes); // nothing left to push: the refused one is not sent again
  });
});
