// What the server and its queue workers agree on: the BullMQ queue, a job's data and return
// value, and how a cancel reaches whichever worker holds the job. A job's id is its run's id.
import { Redis } from 'ioredis';
import type { RunLimits } from '../limits';
import type { ComputeOutcome, Computation } from './execute';

export const QUEUE = 'overstrand-runs';

/** Tries of a job: a computation that throws, or whose worker dies (stalls), this often fails the run. */
export const ATTEMPTS = 3;

export interface JobData {
  computation: Computation;
  /** The server's limits; the heap limit is the worker's own (RUN_MAX_MEMORY_MB where it runs). */
  limits: Pick<RunLimits, 'maxWallMs' | 'progressEveryMs'>;
}

/** null: cancelled, nothing to record (the row says so already). */
export type JobResult = ComputeOutcome | null;

export interface JobProgress {
  fraction: number;
  objects: number;
}

/** Every worker listens here for the ids of runs cancelled while they compute them. */
export const CANCEL_CHANNEL = `${QUEUE}:cancel`;

/** Set before the cancel is published, so a worker that takes the job just then sees it too. */
export const cancelledKey = (runId: string) => `${QUEUE}:cancelled:${runId}`;

/** BullMQ's workers block on Redis, so a connection never gives up on a command. */
export const connect = (url: string) => new Redis(url, { maxRetriesPerRequest: null });
