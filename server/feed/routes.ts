import { Router } from 'express';
import { z } from 'zod';
import { FeedQuery, ShareRequest, feedPaths } from '@/shared/api/feed';
import { RecordId } from '@/shared/api/sketches';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { GroupParams } from '../groups/routes';
import { parse } from '../http/validate';
import { summariesOf } from './summaries';
import * as feed from './use-cases';

const SketchParams = z.object({ id: RecordId });
const GroupSketchParams = GroupParams.extend({ sketchId: RecordId });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.get(feedPaths.feed(':id'), auth, async (req, res) => {
    const { id } = parse(GroupParams, req.params, 'path');
    res.json(await feed.feed(deps, currentUser(req), id, parse(FeedQuery, req.query, 'query')));
  });
  router.get(feedPaths.groupSketch(':id', ':sketchId'), auth, async (req, res) => {
    const { id, sketchId } = parse(GroupSketchParams, req.params, 'path');
    res.json(await feed.groupSketch(deps, currentUser(req), id, sketchId));
  });
  router.put(feedPaths.share(':id'), auth, async (req, res) => {
    const { id } = parse(SketchParams, req.params, 'path');
    const { groupId } = parse(ShareRequest, req.body);
    res.json(await feed.share(deps, currentUser(req), id, groupId));
  });
  router.delete(feedPaths.share(':id'), auth, async (req, res) => {
    const { id } = parse(SketchParams, req.params, 'path');
    res.json(await feed.share(deps, currentUser(req), id, null));
  });
  router.post(feedPaths.fork(':id'), auth, async (req, res) => {
    const { id } = parse(SketchParams, req.params, 'path');
    res.status(201).json(await feed.fork(deps, currentUser(req), id));
  });
  return router;
}

/** Started with the server: summaries missing for shared sketches go to the job pool; stopped before the database closes. */
export async function start(deps: Deps): Promise<{ stop(): Promise<void> }> {
  const summaries = summariesOf(deps);
  await summaries.start();
  return summaries;
}
