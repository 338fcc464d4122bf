// Sign-in rate limits count failures only, per client address and per account; behind a
// trusted reverse proxy the client address comes from X-Forwarded-For (TRUST_PROXY).
import request from 'supertest';
import type { RunningServer } from '@/server/server';
import { signUp, testServer } from './helpers';

let server: RunningServer;
beforeAll(async () => {
  server = await testServer({ config: { authRateLimit: { windowMs: 60_000, limit: 3 }, trustProxy: ['loopback'] } });
});
afterAll(() => server.stop());

const login = (from: string, email: string, password: string) =>
  request(server.url).post('/api/auth/login').set('X-Forwarded-For', from).send({ email, password });

describe('sign-in rate limits', () => {
  it('never count successful sign-ins: a seminar behind one address signs in ten times', async () => {
    const { user } = await signUp(server);
    for (let i = 0; i < 10; i++) expect((await login('10.0.0.1', user.email, 'correct horse')).status).toBe(200);
  });

  it('lock an account after failures from many addresses, without locking those addresses', async () => {
    const [{ user: ann }, { user: bob }] = [await signUp(server), await signUp(server)];
    for (let k = 1; k <= 3; k++) expect((await login(`10.0.1.${k}`, ann.email, 'wrong guess')).status).toBe(401);
    const locked = await login('10.0.2.1', ann.email.toUpperCase(), 'correct horse'); // the account, whatever the case
    expect(locked.status).toBe(429);
    expect(locked.body.error.message).toBe('Too many failed sign-ins to this account; wait a few minutes and try again');
    expect((await login('10.0.1.1', bob.email, 'correct horse')).status).toBe(200);
  });

  it('lock an address after failures on many accounts, without locking those accounts elsewhere', async () => {
    const { user } = await signUp(server);
    for (let k = 1; k <= 3; k++) expect((await login('10.0.3.1', `nobody${k}@example.org`, 'wrong guess')).status).toBe(401);
    const locked = await login('10.0.3.1', user.email, 'correct horse');
    expect(locked.status).toBe(429);
    expect(locked.body.error.message).toBe('Too many failed sign-in attempts from your network; wait a few minutes and try again');
    expect((await login('10.0.3.2', user.email, 'correct horse')).status).toBe(200);
  });
});
