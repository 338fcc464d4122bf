// Storage of runs. The scheduler reads the queue from here; use-cases write requests and
// outcomes. Status changes are conditional on the current status, so a cancelled run is never
// overwritten by a late result.
import { In, IsNull, type DataSource, type EntityManager } from 'typeorm';
import type { RunKind, RunStatus } from '@/shared/api/runs';
import { Run, User } from '../db/entities';

type Db = DataSource | EntityManager;

const repo = (db: Db) => db.getRepository(Run);

export const insertRun = (db: Db, run: Run) => repo(db).insert(run);

export const findRun = (db: Db, id: string) => repo(db).findOneBy({ id });

export const childrenOf = (db: Db, parentRunId: string) =>
  repo(db).find({ where: { parentRunId }, order: { createdAt: 'ASC', id: 'ASC' } });

/** Updates the run only while its status is one of `from`; answers whether it did. */
export async function updateIf(db: Db, id: string, from: readonly RunStatus[], patch: Partial<Run>): Promise<boolean> {
  const r = await repo(db).update({ id, status: In([...from]) }, patch);
  return (r.affected ?? 0) > 0;
}

/** The kinds of run that compute (a sweep only gathers its cells). */
const computing: RunKind[] = ['khovanov', 'bands'];

/** The queued computation of lowest turn (then oldest) not already taken by this process. */
export function nextQueued(db: Db, taken: readonly string[]): Promise<Run | null> {
  const qb = repo(db).createQueryBuilder('r').where('r.status = :q AND r.kind IN (:...k)', { q: 'queued', k: computing });
  if (taken.length) qb.andWhere('r.id NOT IN (:...taken)', { taken });
  return qb.orderBy('r.turn', 'ASC').addOrderBy('r.createdAt', 'ASC').addOrderBy('r.id', 'ASC').getOne();
}

const live = { status: In(['queued', 'running']), kind: In(computing) };

/** One person's computations queued or running (their quota, and the turn of their next). */
export const countLive = (db: Db, startedBy: string) => repo(db).countBy({ ...live, startedBy });

/** Every computation queued or running, as a queue back end reconciles them at start. */
export const liveComputations = (db: Db) => repo(db).find({ where: live, order: { turn: 'ASC', createdAt: 'ASC' } });

/** A computation that must start again from the beginning. */
export const backInQueue = { status: 'queued', startedAt: null, progress: 0, complexSize: 0, worker: null } satisfies Partial<Run>;

/** At start: computations a previous process left running go back to the queue; `taken` are this process's own. */
export async function requeueInterrupted(db: Db, taken: readonly string[]): Promise<number> {
  const qb = repo(db).createQueryBuilder().update().set(backInQueue)
    .where('status = :r AND kind IN (:...k)', { r: 'running', k: computing });
  if (taken.length) qb.andWhere('id NOT IN (:...taken)', { taken });
  return (await qb.execute()).affected ?? 0;
}

/** A finished computation of the same diagram (up to relabelling), ring and reduced flag. */
/** A done run of the same diagram, ring and reduced; when s is wanted, one that computed it. */
export const findReusable = (db: Db, diagramKey: string, ring: string, reduced: boolean, computeS: boolean) =>
  repo(db).findOne({ where: { diagramKey, ring, reduced, kind: 'khovanov', status: 'done', ...(computeS && { computeS }) }, order: { createdAt: 'ASC' } });

/** Top-level runs (sweep cells are read through their sweep), newest first. */
export function listTopLevel(db: Db, where: { startedBy?: string; sketchId?: string; groupId?: string }, take = 200) {
  return repo(db).find({ where: { ...where, parentRunId: IsNull() }, order: { createdAt: 'DESC', id: 'DESC' }, take });
}

export async function displayNames(db: Db, ids: readonly string[]): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const users = await db.getRepository(User).find({ where: { id: In([...new Set(ids)]) }, select: { id: true, displayName: true } });
  return new Map(users.map((u) => [u.id, u.displayName]));
}
