import jwt from 'jsonwebtoken';
import request from 'supertest';
import { ApiErrorBody } from '@/shared/api/errors';
import { AuthResponse, User } from '@/shared/api/auth';
import type { RunningServer } from '@/server/server';
import { bearer, signUp, snapshot, testServer } from './helpers';

let server: RunningServer;
beforeAll(async () => {
  server = await testServer();
});
afterAll(() => server.stop());

const api = () => request(server.url);
const good = { email: 'Ada.Quill@Example.org', password: 'a long password', displayName: 'Ada Quill' };

/** Every error answer has exactly the contract shape: no stack, no extra keys. */
function expectError(res: request.Response, status: number, code: string) {
  expect(res.status).toBe(status);
  expect(ApiErrorBody.strict().parse(res.body).error.code).toBe(code);
  expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
}

describe('GET /api/health', () => {
  it('answers ok', async () => {
    const res = await api().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });
});

describe('POST /api/auth/register', () => {
  it('creates the account, normalises the e-mail and returns a working token', async () => {
    const res = await api().post('/api/auth/register').send(good);
    expect(res.status).toBe(201);
    const body = AuthResponse.strict().parse(res.body);
    expect(body.user).toEqual({ id: expect.any(String), email: 'ada.quill@example.org', displayName: 'Ada Quill' });
    const me = await api().get('/api/me').set(bearer(body.token));
    expect(me.body).toEqual(body.user);
  });

  it('refuses a taken e-mail whatever its case with 409', async () => {
    const before = await snapshot(server);
    const res = await api().post('/api/auth/register').send({ ...good, email: 'ADA.QUILL@example.org' });
    expectError(res, 409, 'email_taken');
    expect(await snapshot(server)).toEqual(before);
  });

  it.each([
    ['missing e-mail', { password: 'a long password', displayName: 'X' }, 'email'],
    ['missing password', { email: 'x@example.org', displayName: 'X' }, 'password'],
    ['missing name', { email: 'x@example.org', password: 'a long password' }, 'displayName'],
    ['bad e-mail', { ...good, email: 'not-an-email' }, 'email'],
    ['e-mail of wrong type', { ...good, email: 42 }, 'email'],
    ['short password', { ...good, email: 'y@example.org', password: 'short' }, 'password'],
    ['password of wrong type', { ...good, email: 'y@example.org', password: ['a long password'] }, 'password'],
    ['blank name', { ...good, email: 'y@example.org', displayName: '   ' }, 'displayName'],
    ['name too long', { ...good, email: 'y@example.org', displayName: 'n'.repeat(81) }, 'displayName'],
  ])('rejects %s with 400 naming the field, and stores nothing', async (_what, body, field) => {
    const before = await snapshot(server);
    const res = await api().post('/api/auth/register').send(body);
    expectError(res, 400, 'invalid_input');
    expect(res.body.error.fields[field]).toEqual(expect.any(String));
    expect(res.body.error.message).toContain(field);
    expect(await snapshot(server)).toEqual(before);
  });

  it('rejects a body that is not an object', async () => {
    const res = await api().post('/api/auth/register').send([1, 2]);
    expectError(res, 400, 'invalid_input');
  });

  it('rejects a missing body (no JSON content type) with a clear message', async () => {
    const res = await api().post('/api/auth/register').type('text/plain').send('email=a');
    expectError(res, 400, 'invalid_input');
    expect(res.body.error.message).toMatch(/JSON object/);
  });

  it('rejects malformed JSON with 400 malformed_json', async () => {
    const before = await snapshot(server);
    const res = await api().post('/api/auth/register').type('application/json').send('{"email": "a@b.c",');
    expectError(res, 400, 'malformed_json');
    expect(await snapshot(server)).toEqual(before);
  });

  it('rejects a huge body with 413 and stores nothing', async () => {
    const before = await snapshot(server);
    const res = await api()
      .post('/api/auth/register')
      .send({ ...good, email: 'huge@example.org', displayName: 'x'.repeat(300_000) });
    expectError(res, 413, 'payload_too_large');
    expect(await snapshot(server)).toEqual(before);
  });
});

describe('POST /api/auth/login', () => {
  it('signs in with the right password (e-mail in any case)', async () => {
    const res = await api().post('/api/auth/login').send({ email: ' ADA.QUILL@example.org ', password: good.password });
    expect(res.status).toBe(200);
    expect(AuthResponse.parse(res.body).user.email).toBe('ada.quill@example.org');
  });

  it.each([
    ['a wrong password', { email: good.email, password: 'wrong password' }],
    ['an unknown e-mail', { email: 'nobody@example.org', password: good.password }],
  ])('answers 401 to %s with the same message', async (_what, body) => {
    const res = await api().post('/api/auth/login').send(body);
    expectError(res, 401, 'invalid_credentials');
    expect(res.body.error.message).toBe('Wrong e-mail or password');
  });

  it('answers 400 to a missing password', async () => {
    const res = await api().post('/api/auth/login').send({ email: good.email });
    expectError(res, 400, 'invalid_input');
    expect(Object.keys(res.body.error.fields)).toEqual(['password']); // only the missing field is named
  });
});

describe('GET /api/me', () => {
  it('returns the signed-in user', async () => {
    const { token, user } = await signUp(server, 'Me Myself');
    const res = await api().get('/api/me').set(bearer(token));
    expect(res.status).toBe(200);
    expect(User.strict().parse(res.body)).toEqual(user);
  });

  it('answers 401 without a token', async () => {
    expectError(await api().get('/api/me'), 401, 'unauthorized');
  });

  it('answers 401 to a malformed header or a garbage token', async () => {
    expectError(await api().get('/api/me').set('Authorization', 'Token abc'), 401, 'unauthorized');
    expectError(await api().get('/api/me').set(bearer('not.a.jwt')), 401, 'unauthorized');
  });

  it('answers 401 to a token signed with another secret', async () => {
    const { user } = await signUp(server);
    const forged = jwt.sign({}, 'some other secret', { subject: user.id, expiresIn: '1h' });
    expectError(await api().get('/api/me').set(bearer(forged)), 401, 'unauthorized');
  });

  it('answers 401 with a session-expired message to an expired token', async () => {
    const { user } = await signUp(server);
    const expired = jwt.sign({ exp: Math.floor(Date.now() / 1000) - 10 }, server.deps.config.jwtSecret, { subject: user.id });
    const res = await api().get('/api/me').set(bearer(expired));
    expectError(res, 401, 'unauthorized');
    expect(res.body.error.message).toMatch(/expired/);
  });

  it('answers 401 when the account of a valid token is gone', async () => {
    const { token, user } = await signUp(server);
    await server.deps.db.query('DELETE FROM users WHERE id = ?', [user.id]);
    expectError(await api().get('/api/me').set(bearer(token)), 401, 'unauthorized');
  });
});

describe('unknown API routes', () => {
  it('answer 404 in the error shape', async () => {
    expectError(await api().get('/api/no-such-thing'), 404, 'not_found');
    expectError(await api().post('/api/groups/x/y/z').send({}), 404, 'not_found');
  });
});

describe('rate limit on sign-in and sign-up', () => {
  let limited: RunningServer;
  beforeAll(async () => {
    limited = await testServer({ config: { authRateLimit: { windowMs: 60_000, limit: 3 } } });
  });
  afterAll(() => limited.stop());

  it('answers 429 once the budget is spent, for both routes', async () => {
    const body = { email: 'z@example.org', password: 'whatever1' };
    for (let i = 0; i < 3; i++) expect((await request(limited.url).post('/api/auth/login').send(body)).status).toBe(401);
    expectError(await request(limited.url).post('/api/auth/login').send(body), 429, 'rate_limited');
    expectError(await request(limited.url).post('/api/auth/register').send({ ...body, displayName: 'Z' }), 429, 'rate_limited');
    expect((await request(limited.url).get('/api/health')).status).toBe(200);
  });
});
