import { Router } from 'express';
import { z } from 'zod';
import { CommentRequest, NewCommentRequest, commentPaths } from '@/shared/api/comments';
import { RecordId } from '@/shared/api/sketches';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { limiter } from '../http/rate-limit';
import { parse } from '../http/validate';
import * as comments from './use-cases';

const SketchParams = z.object({ id: RecordId });
const CommentParams = z.object({ commentId: z.uuid({ message: 'Comment id must be a UUID' }) });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.get(commentPaths.comments(':id'), auth, async (req, res) => {
    const { id } = parse(SketchParams, req.params, 'path');
    res.json(await comments.list(deps, currentUser(req), id));
  });
  // Per author; only comments actually made count (a device resending a comment's id does not).
  const { limit, windowMs } = deps.config.commentRateLimit;
  const perAuthor = limiter(deps.config.commentRateLimit, `You are commenting very fast: at most ${limit} comments in ${windowMs / 1000} seconds; wait a moment and post again`, {
    keyGenerator: (req) => currentUser(req).id,
    skipSuccessfulRequests: true,
    requestWasSuccessful: (_req, res) => res.statusCode !== 201,
  });
  router.post(commentPaths.comments(':id'), auth, perAuthor, async (req, res) => {
    const { id } = parse(SketchParams, req.params, 'path');
    const { body, id: commentId } = parse(NewCommentRequest, req.body);
    const { comment, created } = await comments.add(deps, currentUser(req), id, body, commentId);
    res.status(created ? 201 : 200).json(comment);
  });
  router.patch(commentPaths.comment(':commentId'), auth, async (req, res) => {
    const { commentId } = parse(CommentParams, req.params, 'path');
    const { body } = parse(CommentRequest, req.body);
    res.json(await comments.edit(deps, currentUser(req), commentId, body));
  });
  router.delete(commentPaths.comment(':commentId'), auth, async (req, res) => {
    const { commentId } = parse(CommentParams, req.params, 'path');
    await comments.remove(deps, currentUser(req), commentId);
    res.status(204).end();
  });
  return router;
}
