// The sync status every screen can read (sync/SPEC.md S31), as a zustand store outside React
// so the engine (no React) writes it and hooks/useSyncStatus reads it.
import { createStore } from 'zustand/vanilla';
import type { StatusInput } from '@/sync/status';

export interface SyncState extends StatusInput {
  /** S34: comments written offline, still to post; the status counts them as waiting too. */
  comments: number;
}

export const initialSyncState: SyncState = {
  online: true,
  syncing: false,
  waiting: 0,
  conflicts: 0,
  rejected: 0,
  comments: 0,
  lastError: null,
  lastSyncedAt: null,
};

export const createSyncStatusStore = () => createStore<SyncState>(() => ({ ...initialSyncState }));
export type SyncStatusStore = ReturnType<typeof createSyncStatusStore>;
