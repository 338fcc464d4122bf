// Limits every run obeys, and the size of the worker pool. Part of the server Config
// (config.runs); tests shrink them to make limits trip quickly.
import { availableParallelism } from 'node:os';

export interface RunLimits {
  /** Worker threads computing at once; default: all cores but one (at least one). */
  threads: number;
  /** Largest diagram (crossings) a run accepts; cable-sweep cells count their cable's crossings. */
  maxCrossings: number;
  /** Wall time of one computation, from the moment a worker starts it. */
  maxWallMs: number;
  /** V8 old-generation heap of each worker thread (piscina resourceLimits). */
  maxMemoryMb: number;
  /** Cells a cable sweep may have. */
  maxSweepCells: number;
  /** Progress is written to the run row at most this often. */
  progressEveryMs: number;
}

export const defaultRunLimits = (): RunLimits => ({
  threads: Math.max(1, availableParallelism() - 1),
  maxCrossings: 400,
  maxWallMs: 30 * 60_000,
  maxMemoryMb: 2048,
  maxSweepCells: 64,
  progressEveryMs: 250,
});

/** RUN_THREADS, RUN_MAX_CROSSINGS, RUN_MAX_MINUTES, RUN_MAX_MEMORY_MB override the defaults. */
export function runLimitsFromEnv(env: NodeJS.ProcessEnv): RunLimits {
  const base = defaultRunLimits();
  const num = (name: string, fallback: number): number => {
    const v = env[name];
    if (v === undefined || v === '') return fallback;
    const n = Number(v);
    if (!Number.isFinite(n) || n <= 0) throw new Error(`${name} must be a positive number, got ${JSON.stringify(v)}`);
    return n;
  };
  return {
    ...base,
    threads: Math.floor(num('RUN_THREADS', base.threads)),
    maxCrossings: Math.floor(num('RUN_MAX_CROSSINGS', base.maxCrossings)),
    maxWallMs: num('RUN_MAX_MINUTES', base.maxWallMs / 60_000) * 60_000,
    maxMemoryMb: Math.floor(num('RUN_MAX_MEMORY_MB', base.maxMemoryMb)),
  };
}
