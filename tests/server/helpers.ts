// Shared set-up for the API tests: a server on port 0 with an in-memory database, fast
// password hashing, rate limits tests never reach, unpaced mail, and the built-in SMTP fake.
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { AuthResponse } from '@/shared/api/auth';
import type { Role } from '@/shared/api/groups';
import { addMembership, insertGroup } from '@/server/groups/repository';
import { startServer, type RunningServer, type StartOptions } from '@/server/server';

export function testServer(options: StartOptions = {}): Promise<RunningServer> {
  return startServer({
    ...options,
    config: {
      bcryptRounds: 4,
      authRateLimit: { windowMs: 60_000, limit: 1_000_000 },
      commentRateLimit: { windowMs: 60_000, limit: 1_000_000 },
      mailPacing: { quietMs: 0, maxWaitMs: 0, cap: 1 }, // every notification mailed at once
      ...options.config,
    },
  });
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

let counter = 0;
/** Registers a fresh account through the API. */
export async function signUp(server: RunningServer, displayName = 'Test User'): Promise<AuthResponse> {
  counter++;
  const res = await request(server.url)
    .post('/api/auth/register')
    .send({ email: `user${counter}-${randomUUID().slice(0, 8)}@example.org`, password: 'correct horse', displayName });
  expect(res.status).toBe(201);
  return res.body;
}

/** A group with the given members, written straight to the database (the API path is tested elsewhere). */
export async function groupWith(server: RunningServer, members: [userId: string, role: Role][]): Promise<string> {
  const id = randomUUID();
  const [[ownerId], ...rest] = members;
  await insertGroup(server.deps.db, id, `Group ${id.slice(0, 6)}`, ownerId);
  for (const [userId, role] of rest) await addMembership(server.deps.db, id, userId, role);
  return id;
}

/** Table contents, to assert a rejected request changed nothing. */
export const snapshot = (server: RunningServer) =>
  Promise.all(
    ['users', 'groups', 'memberships', 'invitations'].map((t) => server.deps.db.query(`SELECT * FROM "${t}" ORDER BY 1, 2`)),
  );
