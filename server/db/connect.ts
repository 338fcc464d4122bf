// Opens the SQLite database through TypeORM. Schema changes only ever come from migrations.
import 'reflect-metadata';
import { chmodSync, closeSync, mkdirSync, openSync } from 'node:fs';
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
  if (path !== ':memory:') {
    // Owner-only: the file holds password hashes and every group's data. SQLite gives its -wal
    // and -shm files the database file's mode; an older world-readable file is tightened too.
    mkdirSync(dirname(path), { recursive: true, mode: 0o700 });
    closeSync(openSync(path, 'a', 0o600));
    chmodSync(path, 0o600);
  }
  const db = createDataSource(path);
  await db.initialize();
  await db.runMigrations({ transaction: 'each' });
  return db;
}
