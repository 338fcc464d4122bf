// better-sqlite3 gives TypeORM a single connection, so two overlapping transactions would
// collide ("transaction already started"). Transactions therefore run one at a time, and must
// do database work only (no mail, no network) so the queue stays short.
import type { DataSource, EntityManager } from 'typeorm';

const queues = new WeakMap<DataSource, Promise<unknown>>();

export function inTransaction<T>(db: DataSource, work: (m: EntityManager) => Promise<T>): Promise<T> {
  const previous = queues.get(db) ?? Promise.resolve();
  const next = previous.catch(() => undefined).then(() => db.transaction(work));
  queues.set(db, next);
  return next;
}
