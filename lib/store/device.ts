// The app's device store and sync engine, one per signed-in account (a shared browser never
// mixes two people's sketchbooks), opened on first use and kept in sync from then on.
import { openDatabaseAsync } from 'expo-sqlite';
import { randomId, sha256Hex } from '@/lib/crypto';
import { serverUrl } from '@/lib/http';
import { autoSync } from '@/lib/sync/autosync';
import { SyncEngine } from '@/lib/sync/engine';
import { createSyncStatusStore } from '@/lib/sync/status-store';
import { httpTransport } from '@/lib/sync/transport';
import { LocalStore } from './local-store';
import { migrate, sqliteTables } from './sqlite';

export interface OpenDevice {
  userId: string;
  store: LocalStore;
  engine: SyncEngine;
}

export const syncStatus = createSyncStatusStore();

const opened = new Map<string, Promise<OpenDevice>>();
const stops = new Map<string, () => void>();

const baseUrl = () => serverUrl('');

export function openDevice(userId: string, token: () => string | null): Promise<OpenDevice> {
  let d = opened.get(userId);
  if (!d) {
    d = (async () => {
      const db = await openDatabaseAsync(`overstrand-${userId}.db`);
      await migrate(db);
      const store = new LocalStore(sqliteTables(db), { newId: randomId, sha256Hex });
      const engine = new SyncEngine({ store, transport: httpTransport({ baseUrl, token }), status: syncStatus });
      stops.set(userId, autoSync(store, engine, syncStatus));
      return { userId, store, engine };
    })();
    opened.set(userId, d);
  }
  return d;
}

/** Sign-out: stop syncing every open account (their data stays on the device). */
export function stopDevices(): void {
  for (const stop of stops.values()) stop();
  stops.clear();
  opened.clear();
}
