import type { DataSource, EntityManager } from 'typeorm';
import { Comment } from '../db/entities';

type Db = DataSource | EntityManager;

/** Oldest first: a discussion reads top to bottom. */
export const commentsOn = (db: Db, sketchId: string, groupId: string) =>
  db.getRepository(Comment).find({ where: { sketchId, groupId }, order: { createdAt: 'ASC', id: 'ASC' } });

export const findComment = (db: Db, id: string) => db.getRepository(Comment).findOneBy({ id });

export async function insertComment(db: Db, row: Comment): Promise<void> {
  await db.getRepository(Comment).insert(row);
}

export async function updateBody(db: Db, id: string, body: string, editedAt: Date): Promise<void> {
  await db.getRepository(Comment).update({ id }, { body, editedAt });
}

export async function deleteComment(db: Db, id: string): Promise<void> {
  await db.getRepository(Comment).delete({ id });
}
