import { Router } from 'express';
import { z } from 'zod';
import { RunListQuery, runPaths, StartRunRequest } from '@/shared/api/runs';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { parse } from '../http/validate';
import { schedulerOf } from './scheduler';
import * as runs from './use-cases';

const Params = z.object({ id: z.string().min(1).max(100) });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.post(runPaths.runs, auth, async (req, res) => {
    res.status(201).json(await runs.startRun(deps, currentUser(req), parse(StartRunRequest, req.body)));
  });
  router.get(runPaths.runs, auth, async (req, res) => {
    res.json(await runs.listRuns(deps, currentUser(req), parse(RunListQuery, req.query, 'query')));
  });
  router.get(runPaths.run(':id'), auth, async (req, res) => {
    res.json(await runs.getRun(deps, currentUser(req), parse(Params, req.params, 'path').id));
  });
  router.post(runPaths.cancel(':id'), auth, async (req, res) => {
    res.json(await runs.cancelRun(deps, currentUser(req), parse(Params, req.params, 'path').id));
  });
  return router;
}

/** Started with the server: picks up queued and interrupted runs; stopped before the database closes. */
export async function start(deps: Deps): Promise<{ stop(): Promise<void> }> {
  const scheduler = schedulerOf(deps);
  await scheduler.start();
  return scheduler;
}
