// The feed's Readout summaries (invariants.ts) are computed in the job pool (server/jobs), once
// per diagram: when a shared sketch is written (sync push calls refresh) and, at start, for
// every shared sketch without a summary of its version (the backfill). Reads only look them up;
// a sketch whose summary is not in yet reads as computing, and the read hands it back here.
// An edit that keeps the diagram (a title, a tag) moves the summary to the new version.
import { createHash } from 'node:crypto';
import type { Diagram } from '@/shared/api/sketches';
import type { Deps } from '../deps';
import type { Summary } from './invariants';
import * as repo from './repository';

type Counted = Pick<Diagram, 'pd' | 'unknots'>;

/** What a summary depends on: the PD code and the unknots, hashed. */
export const diagramHash = (d: Counted): string => createHash('sha256').update(JSON.stringify([d.pd, d.unknots])).digest('hex');

/** What a summary job that failed (its time or memory limit) leaves: the counts, no Jones. */
const withoutJones = (d: Counted): Summary => ({ crossings: d.pd.length, components: null, jones: null, jonesText: null, key: null });

class Summaries {
  /** DB work, one step at a time, so a write and a finished job never interleave. */
  private chain: Promise<void> = Promise.resolve();
  /** Sketches waiting for the pool, with the diagram to summarise. */
  private readonly waiting = new Map<string, { hash: string; diagram: Counted }>();
  /** The sketch and diagram hash in the pool now; one at a time, so the pool's other thread is free for requests' jobs. */
  private computing: string | null = null;
  private stopped = false;

  constructor(private readonly deps: Deps) {}

  /** Brings these sketches' summaries up to date: resolves when the cheap part is done, the jobs go on. */
  refresh(ids: readonly string[]): Promise<void> {
    return this.serially(() => this.check(ids));
  }

  /** Summaries missing for some shared sketch (rows from before a restart, or from older versions). */
  async start(): Promise<void> {
    const ids = await repo.sketchesWithoutSummary(this.deps.db);
    for (let k = 0; k < ids.length; k += 200) void this.refresh(ids.slice(k, k + 200));
    if (ids.length) this.deps.log.info({ sketches: ids.length }, 'feed summaries to compute');
  }

  async stop(): Promise<void> {
    this.stopped = true;
    this.waiting.clear();
    await this.chain;
  }

  private serially(work: () => Promise<void>): Promise<void> {
    this.chain = this.chain.then(work).catch((err: unknown) => this.deps.log.error({ err }, 'feed summary update failed'));
    return this.chain;
  }

  private async check(ids: readonly string[]): Promise<void> {
    if (this.stopped || ids.length === 0) return;
    const { db } = this.deps;
    const stored = await repo.storedSummaries(db, ids);
    for (const s of await repo.sharedDiagrams(db, ids)) {
      const row = stored.get(s.id);
      if (row?.version === s.version) continue;
      const hash = diagramHash(s.diagram);
      if (row?.diagramHash === hash) await repo.moveSummary(db, s.id, s.version);
      else if (this.computing !== `${s.id}:${hash}`) this.waiting.set(s.id, { hash, diagram: { pd: s.diagram.pd, unknots: s.diagram.unknots } });
    }
    this.next();
  }

  private next(): void {
    const first = this.waiting.entries().next();
    if (this.stopped || this.computing || first.done) return;
    const [id, { hash, diagram }] = first.value;
    this.waiting.delete(id);
    this.computing = `${id}:${hash}`;
    void this.deps.jobs
      .run('summary', diagram)
      .catch((err: unknown) => {
        if (!this.stopped) this.deps.log.warn({ err, sketchId: id }, 'feed summary not computed');
        return withoutJones(diagram);
      })
      .then((summary) => this.serially(() => this.store(id, hash, summary)))
      .finally(() => {
        this.computing = null;
        this.next();
      });
  }

  /** Kept at the sketch's current version, unless its diagram changed while the job ran. */
  private async store(id: string, hash: string, summary: Summary): Promise<void> {
    if (this.stopped) return;
    const [now] = await repo.sharedDiagrams(this.deps.db, [id]);
    if (now && diagramHash(now.diagram) === hash) await repo.saveSummary(this.deps.db, { sketchId: id, version: now.version, diagramHash: hash, ...summary });
  }
}

const services = new WeakMap<Deps, Summaries>();

/** One summaries service per running server (its Deps). */
export function summariesOf(deps: Deps): Summaries {
  let s = services.get(deps);
  if (!s) services.set(deps, (s = new Summaries(deps)));
  return s;
}
