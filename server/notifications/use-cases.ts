// Notifications: kept in-app for every kind, and e-mailed when the user's setting for that kind
// is on. notify() is the one entry point for every area (comments, invitations, runs).
import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import {
  notificationPayloads,
  type Notification as NotificationDto,
  type NotificationKind,
  type NotificationList,
  type NotificationPayload,
  type UserSettings,
} from '@/shared/api/notifications';
import { findUserById } from '../auth/repository';
import type { Notification } from '../db/entities';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { notFound } from '../http/errors';
import { createPacer, type Pacer } from './pacer';
import * as repo from './repository';

const toDto = (n: Notification): NotificationDto =>
  ({ id: n.id, kind: n.kind, payload: n.payload, createdAt: n.createdAt.toISOString(), readAt: n.readAt?.toISOString() ?? null }) as NotificationDto;

/**
 * Tells `userId` that something happened: stores an in-app notification and, if their setting
 * for `kind` is on, e-mails them, paced (pacer.ts: bursts become one digest). Call it after your
 * own transaction has committed. A failed e-mail is logged and does not fail the caller; the
 * in-app notification is kept either way.
 * The payload is checked against shared/api/notifications.ts (a wrong one throws: a bug).
 */
export async function notify<K extends NotificationKind>(deps: Deps, userId: string, kind: K, payload: NotificationPayload<K>): Promise<void> {
  const checked = notificationPayloads[kind].parse(payload) as NotificationPayload<K>;
  const row: Notification = { id: randomUUID(), userId, kind, payload: checked, createdAt: deps.now(), readAt: null };
  await inTransaction(deps.db, (m) => repo.insertNotification(m, row));
  const [user, settings] = [await findUserById(deps.db, userId), await repo.settingsOf(deps.db, userId)];
  if (!user || !settings.email[kind]) return;
  await pacerOf(deps).mail(user.email, { kind, payload: checked });
}

const pacers = new WeakMap<Deps, Pacer>();
/** One pacer per running server (its mail waits in memory). */
export function pacerOf(deps: Deps): Pacer {
  let p = pacers.get(deps);
  if (!p) pacers.set(deps, (p = createPacer(deps)));
  return p;
}

export async function list(deps: Deps, caller: User, unreadOnly: boolean): Promise<NotificationList> {
  const rows = await repo.notificationsOf(deps.db, caller.id, unreadOnly);
  return { items: rows.map(toDto), unread: await repo.countUnread(deps.db, caller.id) };
}

export async function markRead(deps: Deps, caller: User, id: string): Promise<NotificationDto> {
  return inTransaction(deps.db, async (m) => {
    await repo.markRead(m, caller.id, id, deps.now());
    const n = await repo.findNotification(m, caller.id, id);
    if (!n) throw notFound('No such notification');
    return toDto(n);
  });
}

export const markAllRead = (deps: Deps, caller: User) => inTransaction(deps.db, (m) => repo.markRead(m, caller.id, null, deps.now()));

export const getSettings = (deps: Deps, caller: User) => repo.settingsOf(deps.db, caller.id);

export async function putSettings(deps: Deps, caller: User, settings: UserSettings): Promise<UserSettings> {
  await inTransaction(deps.db, (m) => repo.saveSettings(m, caller.id, settings));
  return settings;
}
