import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import type { AuthResponse, ChangePasswordRequest, LoginRequest, RegisterRequest, User as UserDto } from '@/shared/api/auth';
import type { User } from '../db/entities';
import type { Deps } from '../deps';
import { AppError, forbidden } from '../http/errors';
import { bumpTokenVersion, findUserByEmail, findUserById, insertUser } from './repository';
import { signToken } from './tokens';

export const toUserDto = (u: User): UserDto => ({ id: u.id, email: u.email, displayName: u.displayName });

// Compared against when the e-mail is unknown, made with the configured cost, so a wrong e-mail
// takes as long as a wrong password and sign-in does not tell which e-mails have accounts.
const dummyHashes = new Map<number, Promise<string>>();
export function dummyHash(rounds: number): Promise<string> {
  let hash = dummyHashes.get(rounds);
  if (!hash) dummyHashes.set(rounds, (hash = bcrypt.hash('no such user', rounds)));
  return hash;
}

const isUniqueViolation = (err: unknown) =>
  typeof err === 'object' && err !== null && String((err as { code?: unknown }).code).startsWith('SQLITE_CONSTRAINT');

/**
 * An account is usable at once (no confirmation mail), so a taken e-mail cannot answer like a
 * new account. What it gives away is kept small: the same hashing work either way, a message
 * that only suggests signing in, and failures count against the address's rate limit.
 */
export async function register(deps: Deps, input: RegisterRequest): Promise<AuthResponse> {
  const emailTaken = () => new AppError('email_taken', 409, 'This e-mail cannot be used for a new account; if it is yours, sign in instead');
  const passwordHash = await bcrypt.hash(input.password, deps.config.bcryptRounds);
  if (await findUserByEmail(deps.db, input.email)) throw emailTaken();
  try {
    const user = await insertUser(deps.db, { id: randomUUID(), email: input.email, displayName: input.displayName, passwordHash });
    return { token: signToken(deps.config, user), user: toUserDto(user) };
  } catch (err) {
    // Two sign-ups with one address at the same moment: the unique index decides.
    if (isUniqueViolation(err)) throw emailTaken();
    throw err;
  }
}

export async function login(deps: Deps, input: LoginRequest): Promise<AuthResponse> {
  const user = await findUserByEmail(deps.db, input.email);
  const ok = await bcrypt.compare(input.password, user?.passwordHash ?? (await dummyHash(deps.config.bcryptRounds)));
  if (!user || !ok) throw new AppError('invalid_credentials', 401, 'Wrong e-mail or password');
  return { token: signToken(deps.config, user), user: toUserDto(user) };
}

/** Every token of the caller stops working, this one included. */
export async function signOutEverywhere(deps: Deps, userId: string): Promise<void> {
  await bumpTokenVersion(deps.db, userId);
}

/** A new password revokes every older token; the answer carries the one new token. */
export async function changePassword(deps: Deps, userId: string, input: ChangePasswordRequest): Promise<AuthResponse> {
  const user = (await findUserById(deps.db, userId))!;
  if (!(await bcrypt.compare(input.currentPassword, user.passwordHash))) throw forbidden('The current password is not right');
  await bumpTokenVersion(deps.db, userId, await bcrypt.hash(input.newPassword, deps.config.bcryptRounds));
  const changed = (await findUserById(deps.db, userId))!;
  return { token: signToken(deps.config, changed), user: toUserDto(changed) };
}
