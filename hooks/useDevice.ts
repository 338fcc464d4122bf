// The signed-in user's device store and sync engine. Call useDeviceSync() once in the
// signed-in layout: it starts the engine and follows online/offline and local writes.
import { useEffect } from 'react';
import { create, useStore } from 'zustand';
import { openDevice, syncStatus, type OpenDevice } from '@/lib/store/device';
import { statusLabel, statusOf } from '@/sync/status';
import { useSession } from './useSession';

// Shared by every component, so a write button works as soon as any of them opened it.
const opened = create<{ device: OpenDevice | null }>(() => ({ device: null }));

export function useDevice(): OpenDevice | null {
  const userId = useSession((s) => s.user?.id ?? null);
  const device = opened((s) => s.device);
  useEffect(() => {
    if (!userId) return;
    let live = true;
    void openDevice(userId, () => useSession.getState().token).then((d) => live && opened.setState({ device: d }));
    return () => {
      live = false;
    };
  }, [userId]);
  return device?.userId === userId ? device : null;
}

/** Writes arrive in bursts while drawing; wait this long after one before pushing. */
const pushDelayMs = 2_000;

/** S29: sync on start, on reconnect, periodically, soon after local writes; stops on sign-out. */
export function useDeviceSync(): void {
  const device = useDevice();
  useEffect(() => {
    if (!device) return;
    const { engine } = device;
    const online = () => engine.setOnline(true);
    const offline = () => engine.setOnline(false);
    const w = typeof window !== 'undefined' && typeof window.addEventListener === 'function' ? window : null;
    w?.addEventListener('online', online);
    w?.addEventListener('offline', offline);
    if (typeof navigator !== 'undefined' && navigator.onLine === false) engine.setOnline(false);
    // S31: local writes change "n changes waiting" at once; they are pushed soon after.
    let soon: ReturnType<typeof setTimeout> | null = null;
    const unsubscribe = device.store.subscribe(() => {
      void device.store.counts().then((counts) => {
        syncStatus.setState(counts);
        if (counts.waiting > 0 && syncStatus.getState().online && !soon) {
          soon = setTimeout(() => {
            soon = null;
            void engine.syncNow().catch(() => undefined);
          }, pushDelayMs);
        }
      });
    });
    engine.start();
    return () => {
      w?.removeEventListener('online', online);
      w?.removeEventListener('offline', offline);
      unsubscribe();
      if (soon) clearTimeout(soon);
      engine.stop();
    };
  }, [device]);
}

/** S31: the status line and "Sync now". */
export function useSyncStatus() {
  const state = useStore(syncStatus); // the whole state: a derived object per call would loop
  const status = statusOf(state);
  const device = useDevice();
  return {
    status,
    label: statusLabel(status),
    state,
    syncNow: () => device?.engine.syncNow().catch(() => undefined),
  };
}
