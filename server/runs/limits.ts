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
  /** Computations one person may have queued or running at once (sweep cells count). */
  maxLivePerUser: number;
}

export const defaultRunLimits = (): RunLimits => ({
  threads: Math.max(1, availableParallelism() - 1),
  maxCrossings: 400,
  maxWallMs: 30 * 60_000,
  maxMemoryMb: 2048,
  maxSweepCells: 64,
  progressEveryMs: 250,
  maxLivePerUser: 80,
});
