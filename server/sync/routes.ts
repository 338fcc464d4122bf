import express, { Router } from 'express';
import { PullQuery, PushRequest, syncPaths, syncPushLimit } from '@/shared/api/sync';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { parse } from '../http/validate';
import * as sync from './use-cases';

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  // A push carries whole diagrams: its large body is read only once the token is good.
  router.post(syncPaths.push, auth, express.json({ limit: syncPushLimit }), async (req, res) => {
    res.json(await sync.push(deps, currentUser(req), parse(PushRequest, req.body)));
  });
  router.get(syncPaths.pull, auth, async (req, res) => {
    res.json(await sync.pull(deps, currentUser(req), parse(PullQuery, req.query, 'query')));
  });
  return router;
}
