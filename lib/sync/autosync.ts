// What keeps a device in sync without any screen asking (sync/SPEC.md S29, S31): start the
// engine, follow the browser's online/offline events, refresh the status counts on every
// store change, and push soon after local writes.
import type { LocalStore } from '@/lib/store/local-store';
import type { SyncEngine } from './engine';
import type { SyncStatusStore } from './status-store';

/** Writes arrive in bursts while drawing; wait this long after one before pushing. */
export const pushDelayMs = 2_000;

export function autoSync(store: LocalStore, engine: Pick<SyncEngine, 'start' | 'stop' | 'setOnline' | 'syncNow'>, status: SyncStatusStore): () => void {
  const w = typeof window !== 'undefined' && typeof window.addEventListener === 'function' ? window : null;
  const online = () => engine.setOnline(true);
  const offline = () => engine.setOnline(false);
  w?.addEventListener('online', online);
  w?.addEventListener('offline', offline);
  if (typeof navigator !== 'undefined' && navigator.onLine === false) engine.setOnline(false);

  let soon: ReturnType<typeof setTimeout> | null = null;
  const unsubscribe = store.subscribe(() => {
    void store.counts().then((counts) => {
      status.setState(counts);
      if (counts.waiting + counts.comments > 0 && status.getState().online && !soon) {
        soon = setTimeout(() => {
          soon = null;
          void engine.syncNow().catch(() => undefined);
        }, pushDelayMs);
      }
    });
  });
  void store.counts().then((counts) => status.setState(counts));
  engine.start();
  return () => {
    w?.removeEventListener('online', online);
    w?.removeEventListener('offline', offline);
    unsubscribe();
    if (soon) clearTimeout(soon);
    engine.stop();
  };
}
