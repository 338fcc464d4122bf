// requireAuth: the Bearer token must be valid, its user must still exist and the token must
// carry the user's current token version (not revoked). Routes then read the caller with
// currentUser(req).
import type { Request, RequestHandler } from 'express';
import type { User as UserDto } from '@/shared/api/auth';
import type { Deps } from '../deps';
import { unauthorized } from '../http/errors';
import { findUserById } from './repository';
import { verifyToken } from './tokens';

const callers = new WeakMap<Request, UserDto>();

export function requireAuth({ db, config }: Deps): RequestHandler {
  return async (req, _res, next) => {
    const match = /^Bearer (\S+)$/.exec(req.get('authorization') ?? '');
    if (!match) throw unauthorized('Sign in first: send Authorization: Bearer <token>');
    const claims = verifyToken(config, match[1]);
    const user = await findUserById(db, claims.userId);
    if (!user) throw unauthorized('The account of this token no longer exists');
    if (user.tokenVersion !== claims.version) throw unauthorized('This session was signed out; sign in again');
    callers.set(req, { id: user.id, email: user.email, displayName: user.displayName });
    next();
  };
}

/** The signed-in caller; only valid behind requireAuth. */
export function currentUser(req: Request): UserDto {
  const user = callers.get(req);
  if (!user) throw new Error('currentUser() used on a route without requireAuth');
  return user;
}
