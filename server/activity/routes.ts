// Last-active tracking, cheaply: every request with a valid Bearer token stamps its user at most
// once a minute (an in-memory throttle), one upsert in user_activity. Mounted before every other
// area so it sees all signed-in requests; it never answers nor fails a request itself.
import { Router } from 'express';
import type { Deps } from '../deps';
import { verifyToken } from '../auth/tokens';
import { inTransaction } from '../db/transaction';
import { UserActivity } from '../db/entities';

const EVERY_MS = 60_000;

export function routes(deps: Deps): Router {
  const router = Router();
  const stamped = new Map<string, number>();
  router.use('/api', async (req, _res, next) => {
    const match = /^Bearer (\S+)$/.exec(req.get('authorization') ?? '');
    let userId: string | null = null;
    try {
      userId = match && verifyToken(deps.config, match[1]).userId;
    } catch {
      // requireAuth answers bad tokens on the routes that need one
    }
    const now = deps.now();
    if (userId && now.getTime() - (stamped.get(userId) ?? -Infinity) >= EVERY_MS) {
      stamped.set(userId, now.getTime());
      await inTransaction(deps.db, (m) => m.getRepository(UserActivity).upsert({ userId, lastActiveAt: now }, ['userId'])).catch((err) =>
        deps.log.warn({ err }, 'last-active stamp failed'),
      );
    }
    next();
  });
  return router;
}
