import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import type { AuthResponse, LoginRequest, RegisterRequest, User as UserDto } from '@/shared/api/auth';
import type { User } from '../db/entities';
import type { Deps } from '../deps';
import { AppError } from '../http/errors';
import { findUserByEmail, insertUser } from './repository';
import { signToken } from './tokens';

export const toUserDto = (u: User): UserDto => ({ id: u.id, email: u.email, displayName: u.displayName });

// Compared against when the e-mail is unknown, so a wrong e-mail costs as long as a wrong password.
const NO_SUCH_USER_HASH = bcrypt.hashSync('no such user', 4);

const isUniqueViolation = (err: unknown) =>
  typeof err === 'object' && err !== null && String((err as { code?: unknown }).code).startsWith('SQLITE_CONSTRAINT');

export async function register(deps: Deps, input: RegisterRequest): Promise<AuthResponse> {
  const emailTaken = () => new AppError('email_taken', 409, 'An account with this e-mail already exists');
  if (await findUserByEmail(deps.db, input.email)) throw emailTaken();
  const passwordHash = await bcrypt.hash(input.password, deps.config.bcryptRounds);
  try {
    const user = await insertUser(deps.db, { id: randomUUID(), email: input.email, displayName: input.displayName, passwordHash });
    return { token: signToken(deps.config, user.id), user: toUserDto(user) };
  } catch (err) {
    // Two sign-ups with one address at the same moment: the unique index decides.
    if (isUniqueViolation(err)) throw emailTaken();
    throw err;
  }
}

export async function login(deps: Deps, input: LoginRequest): Promise<AuthResponse> {
  const user = await findUserByEmail(deps.db, input.email);
  const ok = await bcrypt.compare(input.password, user?.passwordHash ?? NO_SUCH_USER_HASH);
  if (!user || !ok) throw new AppError('invalid_credentials', 401, 'Wrong e-mail or password');
  return { token: signToken(deps.config, user.id), user: toUserDto(user) };
}
