import { Router } from 'express';
import { z } from 'zod';
import { NotificationListQuery, UserSettings, notificationPaths } from '@/shared/api/notifications';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { parse } from '../http/validate';
import * as notifications from './use-cases';

const Params = z.object({ id: z.uuid({ message: 'Notification id must be a UUID' }) });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.get(notificationPaths.list, auth, async (req, res) => {
    const { unread } = parse(NotificationListQuery, req.query, 'query');
    res.json(await notifications.list(deps, currentUser(req), unread === 'true'));
  });
  router.post(notificationPaths.readAll, auth, async (req, res) => {
    await notifications.markAllRead(deps, currentUser(req));
    res.status(204).end();
  });
  router.post(notificationPaths.read(':id'), auth, async (req, res) => {
    const { id } = parse(Params, req.params, 'path');
    res.json(await notifications.markRead(deps, currentUser(req), id));
  });
  router.get(notificationPaths.settings, auth, async (req, res) => {
    res.json(await notifications.getSettings(deps, currentUser(req)));
  });
  router.put(notificationPaths.settings, auth, async (req, res) => {
    res.json(await notifications.putSettings(deps, currentUser(req), parse(UserSettings, req.body)));
  });
  return router;
}

/** On stop, the digests still waiting are sent rather than lost. */
export async function start(deps: Deps): Promise<{ stop(): Promise<void> }> {
  return { stop: () => notifications.pacerOf(deps).flush() };
}
