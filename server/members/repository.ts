import type { DataSource, EntityManager } from 'typeorm';
import { Invitation, Membership, UserActivity } from '../db/entities';

type Db = DataSource | EntityManager;

/** Members with their join time and last activity, by display name. */
export async function rosterOf(db: Db, groupId: string) {
  const rows = await db.getRepository(Membership).find({ where: { groupId }, relations: { user: true }, order: { user: { displayName: 'ASC' } } });
  const seen = rows.length ? await db.getRepository(UserActivity).findBy(rows.map((r) => ({ userId: r.userId }))) : [];
  const last = new Map(seen.map((a) => [a.userId, a.lastActiveAt]));
  return rows.map((m) => ({ m, lastActiveAt: last.get(m.userId) ?? null }));
}

/** A resend replaces the link: the old token stops working, the expiry starts again. */
export async function renewInvitation(db: Db, id: string, tokenHash: string, expiresAt: Date): Promise<void> {
  await db.getRepository(Invitation).update({ id }, { tokenHash, expiresAt });
}
