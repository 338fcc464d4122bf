// Run results for the feed, read from the Runs area's table (server/runs, created by the
// migrations before any request) by plain SQL, so the feed does not import that area. Columns
// used: runs.id, sketchId, status ('done' = a result), finishedAt, kind, parentRunId (a
// sweep's cells are skipped), ring, reduced, result (JSON with the Poincare polynomial's terms `poincare`, and s when computed).
import type { DataSource, EntityManager } from 'typeorm';
import type { RunSummary } from '@/shared/api/feed';
import { poincareFormat } from '@/shared/khovanov/format';

type Db = DataSource | EntityManager;

// A bands run's table is of the diagram after the bands, not of the sketch's link: left out.
const DONE = `r."status" = 'done' AND r."parentRunId" IS NULL AND r."kind" != 'bands'`;

/** SQL for "this sketch has a finished run". */
export const hasResultsSql = (sketchColumn: string): string => `EXISTS (SELECT 1 FROM "runs" r WHERE r."sketchId" = ${sketchColumn} AND ${DONE})`;

const marks = (n: number) => Array.from({ length: n }, () => '?').join(',');

export async function latestRuns(db: Db, sketchIds: string[]): Promise<Map<string, RunSummary>> {
  const out = new Map<string, RunSummary>();
  if (sketchIds.length === 0) return out;
  const rows: { id: string; sketchId: string; kind: string; ring: string; reduced: number; finishedAt: string; poincare: string | null; s: number | null }[] = await db.query(
    `SELECT r."id" AS id, r."sketchId" AS sketchId, r."kind" AS kind, r."ring" AS ring, r."reduced" AS reduced, r."finishedAt" AS finishedAt,
            json_extract(r."result", '$.poincare') AS poincare, json_extract(r."result", '$.s.Q') AS s
       FROM "runs" r WHERE ${DONE} AND r."sketchId" IN (${marks(sketchIds.length)}) ORDER BY r."finishedAt" DESC`,
    sketchIds,
  );
  for (const r of rows) {
    // Not the run's label: it is the sketch's title, which the feed shows already.
    const what = `${r.kind === 'cable-sweep' ? 'Cable sweep' : 'Kh'} over ${r.ring}${r.reduced ? ', reduced' : ''}`;
    const summary = r.poincare ? `${what}: ${poincareFormat(JSON.parse(r.poincare) as [number, number, number][], 'unicode')}` : what;
    if (!out.has(r.sketchId)) out.set(r.sketchId, { id: r.id, kind: r.kind, finishedAt: r.finishedAt, summary });
    // Newest first: the first run that computed s gives it.
    const latest = out.get(r.sketchId)!;
    if (latest.s === undefined && r.s !== null) latest.s = r.s;
  }
  return out;
}

/** Sketches among `candidates` with a finished run giving the same Khovanov Poincaré polynomial (same ring, reduced or not) as one of `sketchId`'s. */
export async function sameKhovanov(db: Db, sketchId: string, candidates: string[]): Promise<Set<string>> {
  if (candidates.length === 0) return new Set();
  const rows: { sketchId: string }[] = await db.query(
    `SELECT DISTINCT o."sketchId" AS sketchId FROM "runs" r JOIN "runs" o
        ON o."ring" = r."ring" AND o."reduced" = r."reduced"
       AND json_extract(o."result", '$.poincareText') = json_extract(r."result", '$.poincareText')
     WHERE r."sketchId" = ? AND ${DONE} AND o."status" = 'done' AND o."parentRunId" IS NULL
       AND o."sketchId" IN (${marks(candidates.length)})`,
    [sketchId, ...candidates],
  );
  return new Set(rows.map((r) => r.sketchId));
}
