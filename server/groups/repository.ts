import type { DataSource, EntityManager } from 'typeorm';
import type { GroupSummary, Member, Role } from '@/shared/api/groups';
import { Group, Membership } from '../db/entities';

type Db = DataSource | EntityManager;

export async function insertGroup(db: Db, id: string, name: string, ownerId: string): Promise<void> {
  await db.getRepository(Group).insert({ id, name });
  await addMembership(db, id, ownerId, 'owner');
}

export const findGroup = (db: Db, id: string) => db.getRepository(Group).findOneBy({ id });

export async function addMembership(db: Db, groupId: string, userId: string, role: Role): Promise<void> {
  await db.getRepository(Membership).insert({ groupId, userId, role });
}

export const findMembership = (db: Db, groupId: string, userId: string) =>
  db.getRepository(Membership).findOneBy({ groupId, userId });

export const countOwners = (db: Db, groupId: string) =>
  db.getRepository(Membership).countBy({ groupId, role: 'owner' });

export async function setRole(db: Db, groupId: string, userId: string, role: Role): Promise<void> {
  await db.getRepository(Membership).update({ groupId, userId }, { role });
}

export async function deleteMembership(db: Db, groupId: string, userId: string): Promise<void> {
  await db.getRepository(Membership).delete({ groupId, userId });
}

/** The groups a user belongs to, with the user's role, by name. */
export async function groupsOf(db: Db, userId: string): Promise<GroupSummary[]> {
  const rows = await db
    .getRepository(Membership)
    .find({ where: { userId }, relations: { group: true }, order: { group: { name: 'ASC' } } });
  return rows.map((m) => ({ id: m.groupId, name: m.group!.name, role: m.role }));
}

/** Members of a group, by display name. */
export async function membersOf(db: Db, groupId: string): Promise<Member[]> {
  const rows = await db
    .getRepository(Membership)
    .find({ where: { groupId }, relations: { user: true }, order: { user: { displayName: 'ASC' } } });
  return rows.map(toMember);
}

export async function memberOf(db: Db, groupId: string, userId: string): Promise<Member | null> {
  const row = await db.getRepository(Membership).findOne({ where: { groupId, userId }, relations: { user: true } });
  return row && toMember(row);
}

const toMember = (m: Membership): Member => ({
  userId: m.userId,
  displayName: m.user!.displayName,
  email: m.user!.email,
  role: m.role,
});
