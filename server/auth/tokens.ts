// Access tokens: HS256 JWTs whose subject is the user id, with an expiry.
import jwt from 'jsonwebtoken';
import type { Config } from '../config';
import { unauthorized } from '../http/errors';

export function signToken(config: Config, userId: string): string {
  return jwt.sign({}, config.jwtSecret, {
    algorithm: 'HS256',
    subject: userId,
    expiresIn: config.tokenTtl as jwt.SignOptions['expiresIn'],
  });
}

/** The user id in a valid token; throws 401 for a bad, expired or foreign token. */
export function verifyToken(config: Config, token: string): string {
  try {
    const payload = jwt.verify(token, config.jwtSecret, { algorithms: ['HS256'] });
    if (typeof payload === 'object' && typeof payload.sub === 'string') return payload.sub;
  } catch (err) {
    if (err instanceof jwt.TokenExpiredError) throw unauthorized('Your session has expired; sign in again');
  }
  throw unauthorized('The access token is not valid; sign in again');
}
