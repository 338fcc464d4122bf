// Tokens can be revoked (sign out everywhere, a new password), and sign-in and sign-up do the
// same hashing work whether or not the e-mail has an account.
import bcrypt from 'bcryptjs';
import request from 'supertest';
import { authPaths } from '@/shared/api/auth';
import type { RunningServer } from '@/server/server';
import { bearer, signUp, testServer } from './helpers';

let server: RunningServer;
beforeAll(async () => {
  server = await testServer({ config: { bcryptRounds: 5 } });
});
afterAll(() => server.stop());
afterEach(() => jest.restoreAllMocks());

const me = (token: string) => request(server.url).get(authPaths.me).set(bearer(token));
const login = (email: string, password: string) => request(server.url).post(authPaths.login).send({ email, password });

describe('revoking tokens', () => {
  it('sign out everywhere ends every session of the account, and only of that account', async () => {
    const { token, user } = await signUp(server);
    const other = (await login(user.email, 'correct horse')).body.token;
    const stranger = await signUp(server);
    expect((await request(server.url).post(authPaths.signOutEverywhere).set(bearer(token))).status).toBe(204);
    for (const t of [token, other]) {
      const res = await me(t);
      expect(res.status).toBe(401);
      expect(res.body.error.message).toBe('This session was signed out; sign in again');
    }
    expect((await me(stranger.token)).status).toBe(200);
    const again = await login(user.email, 'correct horse');
    expect((await me(again.body.token)).status).toBe(200); // a new sign-in works at once
  });

  it('a new password revokes the older tokens and the old password; the answer carries a working token', async () => {
    const { token, user } = await signUp(server);
    const change = (t: string, body: object) => request(server.url).post(authPaths.password).set(bearer(t)).send(body);
    expect((await change(token, { currentPassword: 'not it', newPassword: 'a new long one' })).status).toBe(403);
    expect((await me(token)).status).toBe(200); // a refused change revokes nothing
    expect((await change(token, { currentPassword: 'correct horse', newPassword: 'short' })).body.error.fields).toEqual({ newPassword: 'Password must be at least 8 characters' });

    const res = await change(token, { currentPassword: 'correct horse', newPassword: 'a new long one' });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual(user);
    expect((await me(token)).status).toBe(401);
    expect((await me(res.body.token)).status).toBe(200);
    expect((await login(user.email, 'correct horse')).status).toBe(401);
    expect((await login(user.email, 'a new long one')).status).toBe(200);
  });
});

describe('no account enumeration by cost', () => {
  // bcrypt's cost is its rounds figure (2^rounds iterations, Provos and Mazieres, "A Future-Adaptable
  // Password Scheme", 1999): equal rounds mean equal work, whatever the wall clock of this machine says.
  it('a sign-in with an unknown e-mail compares against a hash of the same cost as a real one', async () => {
    const { user } = await signUp(server);
    const compare = jest.spyOn(bcrypt, 'compare');
    await login(user.email, 'wrong guess').expect(401);
    await login('nobody-here@example.org', 'wrong guess').expect(401);
    const [known, unknown] = compare.mock.calls.map(([, hash]) => bcrypt.getRounds(String(hash)));
    expect(known).toBe(5);
    expect(unknown).toBe(5);
  });

  it('a sign-up with a taken e-mail hashes its password like a new one, and its message suggests signing in', async () => {
    const { user } = await signUp(server);
    const hash = jest.spyOn(bcrypt, 'hash');
    const res = await request(server.url).post(authPaths.register).send({ email: user.email, password: 'another long one', displayName: 'Copy' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe('This e-mail cannot be used for a new account; if it is yours, sign in instead');
    expect(hash).toHaveBeenCalledWith('another long one', 5);
  });
});
