// The signed-in user's device store and sync engine (opening it starts syncing,
// lib/sync/autosync.ts), and the sync status for the screens.
import { useEffect } from 'react';
import { create, useStore } from 'zustand';
import { openDevice, stopDevices, syncStatus, type OpenDevice } from '@/lib/store/device';
import { statusLabel, statusOf } from '@/sync/status';
import { useSession } from './useSession';

// Shared by every component, so a write button works as soon as any of them opened it.
const opened = create<{ device: OpenDevice | null }>(() => ({ device: null }));

export function useDevice(): OpenDevice | null {
  const userId = useSession((s) => s.user?.id ?? null);
  const device = opened((s) => s.device);
  useEffect(() => {
    if (!userId) {
      stopDevices();
      opened.setState({ device: null });
      return;
    }
    let live = true;
    void openDevice(userId, () => useSession.getState().token).then((d) => live && opened.setState({ device: d }));
    return () => {
      live = false;
    };
  }, [userId]);
  return device?.userId === userId ? device : null;
}

/** S31: the status line and "Sync now". */
export function useSyncStatus() {
  const state = useStore(syncStatus); // the whole state: a derived object per call would loop
  const status = statusOf({ ...state, waiting: state.waiting + state.comments });
  const device = useDevice();
  return {
    status,
    label: statusLabel(status),
    state,
    syncNow: () => device?.engine.syncNow().catch(() => undefined),
  };
}
