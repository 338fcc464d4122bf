// The signed-in user's device store and sync engine. Mount <DeviceSync/> logic once (via
// useDeviceSync in the signed-in layout): it starts the engine and follows online/offline.
import { useEffect, useState } from 'react';
import { useStore } from 'zustand';
import { openDevice, syncStatus, type OpenDevice } from '@/lib/store/device';
import { selectStatus } from '@/lib/sync/status-store';
import { statusLabel } from '@/sync/status';
import { useSession } from './useSession';

export function useDevice(): OpenDevice | null {
  const userId = useSession((s) => s.user?.id ?? null);
  const [device, setDevice] = useState<OpenDevice | null>(null);
  useEffect(() => {
    if (!userId) return setDevice(null);
    let live = true;
    void openDevice(userId, () => useSession.getState().token).then((d) => live && setDevice(d));
    return () => {
      live = false;
    };
  }, [userId]);
  return device?.userId === userId ? device : null;
}

/** S29: sync on start, on reconnect, periodically; stops on sign-out. */
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
    engine.start();
    return () => {
      w?.removeEventListener('online', online);
      w?.removeEventListener('offline', offline);
      engine.stop();
    };
  }, [device]);
}

/** S31: the status line and "Sync now". */
export function useSyncStatus() {
  const status = useStore(syncStatus, selectStatus);
  const device = useDevice();
  return {
    status,
    label: statusLabel(status),
    syncNow: () => device?.engine.syncNow().catch(() => undefined),
  };
}
