import type { DataSource, EntityManager } from 'typeorm';
import { User } from '../db/entities';

type Db = DataSource | EntityManager;

export const findUserByEmail = (db: Db, email: string) => db.getRepository(User).findOneBy({ email });

export const findUserById = (db: Db, id: string) => db.getRepository(User).findOneBy({ id });

export const insertUser = (db: Db, user: Pick<User, 'id' | 'email' | 'displayName' | 'passwordHash'>) =>
  db.getRepository(User).save(db.getRepository(User).create(user));

/** Revokes every token of the user (they carry the old version); a new password can go with it. */
export const bumpTokenVersion = (db: Db, id: string, passwordHash?: string) =>
  db.getRepository(User).update({ id }, { tokenVersion: () => '"tokenVersion" + 1', ...(passwordHash && { passwordHash }) });
