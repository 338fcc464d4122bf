// The device store's storage: named collections of JSON values by string key, listed in key
// order. Two implementations: expo-sqlite on the device (sqlite.ts) and memory (memory.ts,
// for tests and benchmarks). All store logic above it (local-store.ts) is shared.
export const collections = ['meta', 'records', 'outbox', 'rejected', 'revisions', 'uploads', 'comments', 'runs'] as const;
export type Collection = (typeof collections)[number];

export interface Tables {
  get<T>(c: Collection, key: string): Promise<T | undefined>;
  put(c: Collection, key: string, value: unknown): Promise<void>;
  remove(c: Collection, key: string): Promise<void>;
  /** Values whose key starts with `prefix`, in key order, at most `limit`. */
  list<T>(c: Collection, prefix?: string, limit?: number): Promise<T[]>;
  count(c: Collection, prefix?: string): Promise<number>;
  /** All or nothing; the store calls it one at a time. */
  transaction<T>(work: (t: Tables) => Promise<T>): Promise<T>;
}

/** Keys that sort in number order (the outbox by clock, revisions by clock). */
export const numberKey = (n: number): string => String(n).padStart(15, '0');
