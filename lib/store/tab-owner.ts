// One device database for every browser tab of the app. expo-sqlite keeps it in an OPFS
// access-handle pool that only one tab can hold (a second gets NoModificationAllowedError from
// createSyncAccessHandle), so one tab owns it: the tab holding a Web Lock named after the account
// opens the store and runs the sync engine; every other tab sends its store calls to the owner
// over a BroadcastChannel and hears back the owner's store changes and sync status. When the
// owner closes, its lock passes to a tab waiting for it, which opens the database and takes over.
import type { SyncEngine } from '@/lib/sync/engine';
import type { SyncState, SyncStatusStore } from '@/lib/sync/status-store';
import type { SketchRepository, SyncStore } from './types';

/** What the screens use of the store: the sketch repository, photos waiting, the counts. */
export type DeviceStore = SketchRepository & Pick<SyncStore, 'pendingUploads' | 'counts'>;
export type DeviceEngine = Pick<SyncEngine, 'syncNow'>;

/** The opened database, in the owner tab. */
export interface Owned {
  store: DeviceStore;
  engine: DeviceEngine;
  /** Stops syncing (autosync's stop). */
  stop: () => void;
}

/** The parts of the Web Locks API and BroadcastChannel used here (tests pass their own). */
export interface TabLinks {
  locks: {
    request(name: string, options: { ifAvailable?: boolean; signal?: AbortSignal }, grant: (lock: unknown) => Promise<unknown>): Promise<unknown>;
  };
  /** Joins the channel of that name; `receive` hears every other tab's messages. */
  channel(name: string, receive: (message: unknown) => void): { postMessage(message: unknown): void; close(): void };
}

type Target = 'store' | 'engine';
type Message =
  | { kind: 'call'; id: string; from: string; target: Target; method: string; args: unknown[] }
  | { kind: 'reply'; id: string; to: string; value?: unknown; error?: string }
  | { kind: 'changed' }
  | { kind: 'status'; state: SyncState }
  | { kind: 'hello' };

interface Waiting {
  resolve: (v: unknown) => void;
  reject: (e: Error) => void;
}

export interface SharedDevice {
  store: DeviceStore;
  engine: DeviceEngine;
  /** Whether this tab holds the database now. */
  owner(): boolean;
  /** Sign-out: stop syncing, let the lock go, leave the channel. */
  stop(): void;
}

/**
 * The store and engine every tab uses, whichever tab owns the database. `open` runs in the
 * tab that gets the lock (once); until this tab knows whether it owns, calls wait.
 */
export function shareAcrossTabs(name: string, open: () => Promise<Owned>, status: SyncStatusStore, links: TabLinks): SharedDevice {
  const tab = globalThis.crypto.randomUUID(); // only browsers share tabs, and they have Web Crypto
  const channel = links.channel(name, (data) => receive(data as Message));
  const post = (m: Message) => channel.postMessage(m);
  const listeners = new Set<() => void>();
  const changed = () => listeners.forEach((l) => l());
  const waiting = new Map<string, Waiting>();
  let calls = 0;
  let owned: Promise<Owned> | null = null;
  let decided: () => void = () => undefined;
  const known = new Promise<void>((resolve) => (decided = resolve));
  const release = new AbortController();
  let letGo: () => void = () => undefined;
  const held = new Promise<void>((resolve) => (letGo = resolve));
  const cleanup: (() => void)[] = [];

  const own = () => {
    const opening = open();
    owned = opening;
    void opening.then((o) => {
      cleanup.push(o.stop, o.store.subscribe(() => (changed(), post({ kind: 'changed' }))));
      cleanup.push(status.subscribe((state) => post({ kind: 'status', state })));
      post({ kind: 'status', state: status.getState() });
    }, () => undefined);
    // A call still out to the owner that closed will never be answered.
    for (const w of waiting.values()) w.reject(new Error('The tab holding the sketchbook closed; try again'));
    waiting.clear();
    decided();
    changed(); // what the screens show now comes from this tab's own database
    return held;
  };

  const run = async (target: Target, method: string, args: unknown[]): Promise<unknown> => {
    await known;
    if (owned) {
      const object = (await owned)[target];
      return (Reflect.get(object, method) as (...a: unknown[]) => Promise<unknown>).apply(object, args);
    }
    const id = `${tab}:${++calls}`;
    return new Promise((resolve, reject) => {
      waiting.set(id, { resolve, reject });
      post({ kind: 'call', id, from: tab, target, method, args });
    });
  };

  function receive(m: Message) {
    if (m.kind === 'call' && owned) {
      const answer = (r: Omit<Extract<Message, { kind: 'reply' }>, 'kind' | 'id' | 'to'>) => post({ kind: 'reply', id: m.id, to: m.from, ...r });
      run(m.target, m.method, m.args).then((value) => answer({ value }), (e: unknown) => answer({ error: e instanceof Error ? e.message : String(e) }));
    } else if (m.kind === 'reply' && m.to === tab) {
      const w = waiting.get(m.id);
      waiting.delete(m.id);
      if (m.error !== undefined) w?.reject(new Error(m.error));
      else w?.resolve(m.value);
    } else if (m.kind === 'hello' && owned) {
      post({ kind: 'status', state: status.getState() });
    } else if (m.kind === 'status' && !owned) {
      status.setState(m.state);
    } else if (m.kind === 'changed' && !owned) {
      changed();
    }
  }

  void links.locks.request(name, { ifAvailable: true }, async (lock) => {
    if (lock) return own();
    decided(); // another tab owns the database: ask it, and queue to take over when it closes
    post({ kind: 'hello' });
    void links.locks.request(name, { signal: release.signal }, own).catch(() => undefined);
  });

  // Every method but subscribe goes to whichever tab owns the database. Not a thenable: `then`
  // stays undefined so the object can be handed through promises.
  const remote = <T extends object>(target: Target, local: Partial<T> = {}) =>
    new Proxy(local, {
      get: (o, method) =>
        Reflect.get(o, method) ?? (typeof method === 'string' && method !== 'then' ? (...args: unknown[]) => run(target, method, args) : undefined),
    }) as T;

  return {
    store: remote<DeviceStore>('store', {
      subscribe: (listener: () => void) => {
        listeners.add(listener);
        return () => void listeners.delete(listener);
      },
    }),
    engine: remote<DeviceEngine>('engine'),
    owner: () => owned !== null,
    stop: () => {
      cleanup.forEach((c) => c());
      release.abort();
      letGo();
      channel.close();
    },
  };
}
