// Access tokens: HS256 JWTs whose subject is the user id, with an expiry and the user's token
// version (users.tokenVersion): bumping the version revokes every token signed before.
import jwt from 'jsonwebtoken';
import type { Config } from '../config';
import { unauthorized } from '../http/errors';

export interface TokenClaims {
  userId: string;
  version: number;
}

export function signToken(config: Config, user: { id: string; tokenVersion: number }): string {
  return jwt.sign({ ver: user.tokenVersion }, config.jwtSecret, {
    algorithm: 'HS256',
    subject: user.id,
    expiresIn: config.tokenTtl as jwt.SignOptions['expiresIn'],
  });
}

/** The claims of a valid token; throws 401 for a bad, expired or foreign token. */
export function verifyToken(config: Config, token: string): TokenClaims {
  try {
    const payload = jwt.verify(token, config.jwtSecret, { algorithms: ['HS256'] });
    if (typeof payload === 'object' && typeof payload.sub === 'string' && Number.isInteger(payload.ver)) {
      return { userId: payload.sub, version: payload.ver };
    }
  } catch (err) {
    if (err instanceof jwt.TokenExpiredError) throw unauthorized('Your session has expired; sign in again');
  }
  throw unauthorized('The access token is not valid; sign in again');
}
