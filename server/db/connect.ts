// Opens the SQLite database through TypeORM. Schema changes only ever come from migrations.
import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { DataSource } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';

export function createDataSource(path: string): DataSource {
  return new DataSource({
    type: 'better-sqlite3',
    database: path,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    // WAL lets readers run while a write is in progress; ':memory:' ignores it.
    enableWAL: path !== ':memory:',
    logging: false,
  });
}

/** Opens the database and applies pending migrations; safe to call on every start. */
export async function openDatabase(path: string): Promise<DataSource> {
  if (path !== ':memory:') mkdirSync(dirname(path), { recursive: true });
  const db = createDataSource(path);
  await db.initialize();
  await db.runMigrations({ transaction: 'each' });
  return db;
}
