import type { DataSource, EntityManager } from 'typeorm';
import { Attachment, AttachmentUploader } from '../db/entities';

type Db = DataSource | EntityManager;

export const findAttachment = (db: Db, sha256: string) => db.getRepository(Attachment).findOneBy({ sha256 });

export const attachmentMeta = (db: Db, sha256: string) =>
  db.getRepository(Attachment).findOne({ where: { sha256 }, select: { sha256: true, size: true, mimeType: true } });

export async function isUploader(db: Db, sha256: string, userId: string): Promise<boolean> {
  return (await db.getRepository(AttachmentUploader).countBy({ sha256, userId })) > 0;
}

/** Stores the bytes unless already held (S26); true when they were new. */
export async function storeAttachment(db: Db, a: Omit<Attachment, 'createdAt'>, userId: string): Promise<boolean> {
  const had = (await db.getRepository(Attachment).countBy({ sha256: a.sha256 })) > 0;
  if (!had) await db.getRepository(Attachment).insert(a);
  await db.getRepository(AttachmentUploader).createQueryBuilder().insert().values({ sha256: a.sha256, userId }).orIgnore().execute();
  return !had;
}
