import { IsNull, type DataSource, type EntityManager } from 'typeorm';
import { Invitation } from '../db/entities';

type Db = DataSource | EntityManager;

export async function insertInvitation(db: Db, row: Omit<Invitation, 'acceptedAt' | 'acceptedById'>) {
  const repo = db.getRepository(Invitation);
  return repo.save(repo.create({ ...row, acceptedAt: null, acceptedById: null }));
}

export const deleteInvitation = (db: Db, id: string) => db.getRepository(Invitation).delete({ id });

export const findInGroup = (db: Db, groupId: string, id: string) => db.getRepository(Invitation).findOneBy({ groupId, id });

export const findByTokenHash = (db: Db, tokenHash: string) =>
  db.getRepository(Invitation).findOne({ where: { tokenHash }, relations: { group: true, invitedBy: true } });

/** Not yet accepted, newest first; expired ones are filtered by the caller's clock. */
export const unaccepted = (db: Db, groupId: string) =>
  db.getRepository(Invitation).find({ where: { groupId, acceptedAt: IsNull() }, order: { createdAt: 'DESC' } });

export async function markAccepted(db: Db, id: string, userId: string, at: Date): Promise<void> {
  await db.getRepository(Invitation).update({ id }, { acceptedAt: at, acceptedById: userId });
}
