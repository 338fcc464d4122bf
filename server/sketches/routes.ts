import { Router } from 'express';
import { z } from 'zod';
import { RecordId, SketchListQuery, sketchPaths } from '@/shared/api/sketches';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { parse } from '../http/validate';
import * as sketches from './use-cases';

const Params = z.object({ id: RecordId });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.get(sketchPaths.sketches, auth, async (req, res) => {
    res.json(await sketches.listSketches(deps, currentUser(req), parse(SketchListQuery, req.query, 'query')));
  });
  router.get(sketchPaths.sketch(':id'), auth, async (req, res) => {
    const { id } = parse(Params, req.params, 'path');
    res.json(await sketches.getSketch(deps, currentUser(req), id));
  });
  return router;
}
