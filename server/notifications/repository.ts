import type { DataSource, EntityManager } from 'typeorm';
import { IsNull } from 'typeorm';
import { defaultUserSettings, type UserSettings as Settings } from '@/shared/api/notifications';
import { Notification, UserSettings } from '../db/entities';

type Db = DataSource | EntityManager;

export async function insertNotification(db: Db, row: Notification): Promise<void> {
  await db.getRepository(Notification).insert(row as object); // the deep-partial type cannot map unknown-valued JSON
}

export function notificationsOf(db: Db, userId: string, unreadOnly: boolean, take = 100) {
  return db.getRepository(Notification).find({
    where: { userId, ...(unreadOnly && { readAt: IsNull() }) },
    order: { createdAt: 'DESC', id: 'DESC' },
    take,
  });
}

export const countUnread = (db: Db, userId: string) => db.getRepository(Notification).countBy({ userId, readAt: IsNull() });

/** Only the user's own notification: another user's id changes nothing. */
export async function markRead(db: Db, userId: string, id: string | null, at: Date): Promise<number> {
  const res = await db.getRepository(Notification).update({ userId, readAt: IsNull(), ...(id && { id }) }, { readAt: at });
  return res.affected ?? 0;
}

export const findNotification = (db: Db, userId: string, id: string) => db.getRepository(Notification).findOneBy({ userId, id });

export async function settingsOf(db: Db, userId: string): Promise<Settings> {
  const row = await db.getRepository(UserSettings).findOneBy({ userId });
  const d = defaultUserSettings();
  return row ? { email: { ...d.email, ...row.settings.email } } : d;
}

export async function saveSettings(db: Db, userId: string, settings: Settings): Promise<void> {
  await db.getRepository(UserSettings).upsert({ userId, settings }, ['userId']);
}
