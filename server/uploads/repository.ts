import { In, type DataSource, type EntityManager } from 'typeorm';
import { Attachment, AttachmentUploader } from '../db/entities';

type Db = DataSource | EntityManager;

export type AttachmentMeta = Omit<Attachment, 'data'>;
const meta = { sha256: true, size: true, mimeType: true, width: true, height: true, createdAt: true } as const;

export const attachmentMeta = (db: Db, sha256: string): Promise<AttachmentMeta | null> => db.getRepository(Attachment).findOne({ where: { sha256 }, select: meta });

export const attachmentsIn = (db: Db, hashes: string[]): Promise<AttachmentMeta[]> =>
  hashes.length ? db.getRepository(Attachment).find({ where: { sha256: In(hashes) }, select: meta }) : Promise.resolve([]);

/** The bytes as sent, kept only by rows from before the photo pipeline. */
export const legacyData = async (db: Db, sha256: string) => (await db.getRepository(Attachment).findOne({ where: { sha256 }, select: { sha256: true, data: true } }))?.data ?? null;

export async function markProcessed(db: Db, a: Omit<AttachmentMeta, 'createdAt'>): Promise<void> {
  await db.getRepository(Attachment).update({ sha256: a.sha256 }, { ...a, data: null });
}

/** `${sha256} ${userId}` for every upload of these hashes. */
export async function uploadsOf(db: Db, hashes: string[]): Promise<Set<string>> {
  const rows = hashes.length ? await db.getRepository(AttachmentUploader).findBy({ sha256: In(hashes) }) : [];
  return new Set(rows.map((r) => `${r.sha256} ${r.userId}`));
}

export async function isUploader(db: Db, sha256: string, userId: string): Promise<boolean> {
  return (await db.getRepository(AttachmentUploader).countBy({ sha256, userId })) > 0;
}

/** Stores the row unless already held (S26); true when it was new. */
export async function storeAttachment(db: Db, a: Omit<Attachment, 'createdAt'>, userId: string): Promise<boolean> {
  const had = (await db.getRepository(Attachment).countBy({ sha256: a.sha256 })) > 0;
  if (!had) await db.getRepository(Attachment).insert(a);
  await db.getRepository(AttachmentUploader).createQueryBuilder().insert().values({ sha256: a.sha256, userId }).orIgnore().execute();
  return !had;
}
