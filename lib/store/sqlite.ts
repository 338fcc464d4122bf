// Tables on SQLite through the async API of expo-sqlite (docs/stack.md: the only one that works on
// web). Only the few calls below are used, so Node tests run the same SQL on better-sqlite3.
import type { Collection, Tables } from './tables';

/** The part of expo-sqlite's SQLiteDatabase this store needs. */
export interface SqlDatabase {
  execAsync(sql: string): Promise<void>;
  runAsync(sql: string, ...params: (string | number)[]): Promise<unknown>;
  getAllAsync<T>(sql: string, ...params: (string | number)[]): Promise<T[]>;
  getFirstAsync<T>(sql: string, ...params: (string | number)[]): Promise<T | null>;
  withTransactionAsync(task: () => Promise<void>): Promise<void>;
}

const kv = (name: string) => `CREATE TABLE IF NOT EXISTS "${name}" (key TEXT PRIMARY KEY NOT NULL, value TEXT NOT NULL)`;

/** The store's own schema migrations, oldest first; PRAGMA user_version counts those applied. */
export const migrations: readonly string[] = [
  ['meta', 'records', 'outbox', 'rejected', 'revisions', 'uploads', 'comments', 'runs'].map(kv).join(';\n'),
];

/** Brings the schema up to date; resolves to how many migrations it applied. */
export async function migrate(db: SqlDatabase): Promise<number> {
  const row = await db.getFirstAsync<{ user_version: number }>('PRAGMA user_version');
  const from = row?.user_version ?? 0;
  for (let v = from; v < migrations.length; v++) {
    await db.withTransactionAsync(async () => {
      await db.execAsync(migrations[v]);
      await db.execAsync(`PRAGMA user_version = ${v + 1}`);
    });
  }
  return Math.max(0, migrations.length - from);
}

/** The caller (LocalStore) runs one operation at a time, so a transaction is never interleaved. */
export function sqliteTables(db: SqlDatabase): Tables {
  const where = (prefix: string) => (prefix ? [' WHERE substr(key, 1, ?) = ?', [prefix.length, prefix]] : ['', []]) as [string, (string | number)[]];
  const tables: Tables = {
    async get<T>(c: Collection, key: string) {
      const row = await db.getFirstAsync<{ value: string }>(`SELECT value FROM "${c}" WHERE key = ?`, key);
      return row ? (JSON.parse(row.value) as T) : undefined;
    },
    async put(c, key, value) {
      await db.runAsync(`INSERT OR REPLACE INTO "${c}" (key, value) VALUES (?, ?)`, key, JSON.stringify(value));
    },
    async remove(c, key) {
      await db.runAsync(`DELETE FROM "${c}" WHERE key = ?`, key);
    },
    async list<T>(c: Collection, prefix = '', limit = -1) {
      const [sql, params] = where(prefix);
      const rows = await db.getAllAsync<{ value: string }>(`SELECT value FROM "${c}"${sql} ORDER BY key LIMIT ?`, ...params, Number.isFinite(limit) ? limit : -1);
      return rows.map((r) => JSON.parse(r.value) as T);
    },
    async count(c, prefix = '') {
      const [sql, params] = where(prefix);
      return (await db.getFirstAsync<{ n: number }>(`SELECT COUNT(*) AS n FROM "${c}"${sql}`, ...params))?.n ?? 0;
    },
    async transaction<T>(work: (t: Tables) => Promise<T>) {
      let out: T | undefined;
      await db.withTransactionAsync(async () => {
        out = await work(tables);
      });
      return out as T;
    },
  };
  return tables;
}
