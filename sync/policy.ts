// Per record type: which fields only say "when" (S19: they keep the latest time and never
// conflict) and the defaults a record starts from when an update arrives first (S13).
import type { Fields, RecordType } from '@/shared/api/sync';
import { sketchDefaults } from '@/shared/api/sketches';

export interface TypePolicy {
  latest: readonly string[];
  defaults: (now: string) => Fields;
}

export const policies: Record<RecordType, TypePolicy> = {
  sketch: { latest: ['updatedAt'], defaults: (now) => ({ ...sketchDefaults(now) }) },
  // Conflict copies are made whole by the server (S20); devices only patch resolved/deleted.
  conflict: { latest: [], defaults: () => ({ resolved: false, deleted: false }) },
};
