// The app's device store and sync engine, one per signed-in account (a shared browser never
// mixes two people's sketchbooks), opened on first use and kept in sync from then on. In a
// browser, tabs share one database through the tab that owns it (tab-owner.ts).
import { openDatabaseAsync } from 'expo-sqlite';
import { randomId, sha256Hex } from '@/lib/crypto';
import { serverUrl } from '@/lib/http';
import { autoSync } from '@/lib/sync/autosync';
import { SyncEngine } from '@/lib/sync/engine';
import { createSyncStatusStore } from '@/lib/sync/status-store';
import { httpTransport } from '@/lib/sync/transport';
import { LocalStore } from './local-store';
import { migrate, sqliteTables } from './sqlite';
import { shareAcrossTabs, type DeviceEngine, type DeviceStore, type Owned, type TabLinks } from './tab-owner';

export interface OpenDevice {
  userId: string;
  store: DeviceStore;
  engine: DeviceEngine;
}

export const syncStatus = createSyncStatusStore();

const opened = new Map<string, Promise<OpenDevice>>();
const stops = new Map<string, () => void>();

const baseUrl = () => serverUrl('');

async function openOwned(userId: string, token: () => string | null): Promise<Owned> {
  try {
    const db = await openDatabaseAsync(`overstrand-${userId}.db`);
    await migrate(db);
    const store = new LocalStore(sqliteTables(db), { newId: randomId, sha256Hex });
    const engine = new SyncEngine({ store, transport: httpTransport({ baseUrl, token }), status: syncStatus });
    return { store, engine, stop: autoSync(store, engine, syncStatus) };
  } catch (e) {
    // The status line must not claim "Up to date" for a sketchbook that never opened.
    syncStatus.setState({ lastError: `The sketchbook on this device could not be opened: ${e instanceof Error ? e.message : String(e)}` });
    throw e;
  }
}

function joinChannel(name: string, receive: (message: unknown) => void) {
  const channel = new BroadcastChannel(name);
  channel.onmessage = (e) => receive(e.data);
  return channel;
}

/** Browsers with Web Locks and BroadcastChannel (every tab of the origin); native apps have one. */
function tabLinks(): TabLinks | null {
  const locks = typeof navigator !== 'undefined' ? (navigator as { locks?: TabLinks['locks'] }).locks : undefined;
  return locks && typeof BroadcastChannel !== 'undefined' ? { locks, channel: joinChannel } : null;
}

export function openDevice(userId: string, token: () => string | null): Promise<OpenDevice> {
  let d = opened.get(userId);
  if (!d) {
    const links = tabLinks();
    if (links) {
      const shared = shareAcrossTabs(`overstrand-device-${userId}`, () => openOwned(userId, token), syncStatus, links);
      stops.set(userId, shared.stop);
      d = Promise.resolve({ userId, store: shared.store, engine: shared.engine });
    } else {
      d = openOwned(userId, token).then((o) => {
        stops.set(userId, o.stop);
        return { userId, store: o.store, engine: o.engine };
      });
    }
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
