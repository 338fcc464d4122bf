// S31: the one status line the device shows, most urgent first.
export type SyncStatus =
  | { kind: 'offline'; waiting: number }
  | { kind: 'syncing'; waiting: number }
  | { kind: 'conflict'; conflicts: number; waiting: number }
  | { kind: 'rejected'; rejected: number; waiting: number }
  | { kind: 'waiting'; waiting: number }
  | { kind: 'upToDate' };

export interface StatusInput {
  online: boolean;
  syncing: boolean;
  waiting: number;
  conflicts: number;
  /** S8: mutations the server refused, kept aside on the device. */
  rejected: number;
}

export function statusOf(s: StatusInput): SyncStatus {
  if (!s.online) return { kind: 'offline', waiting: s.waiting };
  if (s.syncing) return { kind: 'syncing', waiting: s.waiting };
  if (s.conflicts > 0) return { kind: 'conflict', conflicts: s.conflicts, waiting: s.waiting };
  if (s.rejected > 0) return { kind: 'rejected', rejected: s.rejected, waiting: s.waiting };
  if (s.waiting > 0) return { kind: 'waiting', waiting: s.waiting };
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
    case 'waiting':
      return `${s.waiting} change${s.waiting === 1 ? '' : 's'} waiting`;
    case 'upToDate':
      return 'Up to date';
  }
}
