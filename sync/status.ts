// S31: the one status line the device shows, most urgent first.
export type SyncStatus =
  | { kind: 'offline'; waiting: number }
  | { kind: 'syncing'; waiting: number }
  | { kind: 'conflict'; conflicts: number; waiting: number }
  | { kind: 'rejected'; rejected: number; waiting: number }
  | { kind: 'failed'; error: string; waiting: number }
  | { kind: 'waiting'; waiting: number }
  | { kind: 'notYet' }
  | { kind: 'upToDate' };

export interface StatusInput {
  online: boolean;
  syncing: boolean;
  waiting: number;
  conflicts: number;
  /** S8: mutations the server refused, kept aside on the device. */
  rejected: number;
  /** Why the last round (or opening the device store) failed; null after a round succeeds. */
  lastError: string | null;
  /** When a round last succeeded in this session; null: none yet, so nothing says up to date. */
  lastSyncedAt: string | null;
}

export function statusOf(s: StatusInput): SyncStatus {
  if (!s.online) return { kind: 'offline', waiting: s.waiting };
  if (s.syncing) return { kind: 'syncing', waiting: s.waiting };
  if (s.lastError !== null) return { kind: 'failed', error: s.lastError, waiting: s.waiting };
  if (s.conflicts > 0) return { kind: 'conflict', conflicts: s.conflicts, waiting: s.waiting };
  if (s.rejected > 0) return { kind: 'rejected', rejected: s.rejected, waiting: s.waiting };
  if (s.waiting > 0) return { kind: 'waiting', waiting: s.waiting };
  if (s.lastSyncedAt === null) return { kind: 'notYet' };
  return { kind: 'upToDate' };
}

export function statusLabel(s: SyncStatus): string {
  switch (s.kind) {
    case 'offline':
      return s.waiting > 0 ? `Offline, ${s.waiting} change${s.waiting === 1 ? '' : 's'} waiting` : 'Offline';
    case 'syncing':
      return 'Syncing';
    case 'conflict':
      return `${s.conflicts} conflict${s.conflicts === 1 ? '' : 's'} to resolve`;
    case 'rejected':
      return `${s.rejected} change${s.rejected === 1 ? '' : 's'} refused by the server`;
    case 'failed':
      return s.waiting > 0 ? `Sync failed, ${s.waiting} change${s.waiting === 1 ? '' : 's'} waiting` : 'Sync failed';
    case 'waiting':
      return `${s.waiting} change${s.waiting === 1 ? '' : 's'} waiting`;
    case 'notYet':
      return 'Not synced yet';
    case 'upToDate':
      return 'Up to date';
  }
}
