import type { DataSource, EntityManager } from 'typeorm';
import { Photo } from '../db/entities';

type Db = DataSource | EntityManager;

export const photosOf = (db: Db, sketchId: string) => db.getRepository(Photo).find({ where: { sketchId }, order: { createdAt: 'ASC', id: 'ASC' } });

export const findPhoto = (db: Db, id: string) => db.getRepository(Photo).findOneBy({ id });

export async function insertPhoto(db: Db, row: Photo): Promise<void> {
  await db.getRepository(Photo).insert(row);
}

export async function deletePhoto(db: Db, id: string): Promise<void> {
  await db.getRepository(Photo).delete({ id });
}
