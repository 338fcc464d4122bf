// Browser tabs sharing one device database (lib/store/tab-owner.ts): the tab holding the lock
// opens it, the others work through it over a real BroadcastChannel (Node's), see its changes
// and its sync status, and the next tab takes over when the owner closes. The lock manager is a
// small stand-in with the Web Locks rules used: one holder per name, `ifAvailable` answers null
// when held, waiting requests are granted in order and an aborted one leaves the queue.
import { LocalStore } from '@/lib/store/local-store';
import { memoryDisk, memoryTables, type MemoryDisk } from '@/lib/store/memory';
import { shareAcrossTabs, type SharedDevice, type TabLinks } from '@/lib/store/tab-owner';
import { createSyncStatusStore } from '@/lib/sync/status-store';
import { nodeCrypto } from './node-crypto';

type Grant = (lock: unknown) => Promise<unknown>;

function fakeLocks(): TabLinks['locks'] {
  const holders = new Set<string>();
  const queues = new Map<string, (() => void)[]>();
  const hold = (name: string, grant: Grant) => {
    holders.add(name);
    return grant({ name }).finally(() => {
      holders.delete(name);
      queues.get(name)?.shift()?.();
    });
  };
  return {
    request(name, options, grant) {
      if (!holders.has(name)) return hold(name, grant);
      if (options.ifAvailable) return grant(null);
      return new Promise((resolve, reject) => {
        const queue = queues.get(name) ?? [];
        queues.set(name, queue);
        const next = () => hold(name, grant).then(resolve, reject);
        queue.push(next);
        options.signal?.addEventListener('abort', () => {
          queue.splice(queue.indexOf(next), 1);
          reject(new Error('aborted'));
        });
      });
    },
  };
}

function joinChannel(name: string, receive: (message: unknown) => void) {
  const channel = new BroadcastChannel(name);
  channel.onmessage = (e) => receive((e as MessageEvent).data);
  return channel;
}

const links = (locks: TabLinks['locks']): TabLinks => ({ locks, channel: joinChannel });

/** One browser tab: its own status store and engine; the "file" (disk) is the origin's, shared. */
function tab(disk: MemoryDisk, locks: TabLinks['locks']) {
  const status = createSyncStatusStore();
  const engine = { syncNow: jest.fn(async () => undefined) };
  const opens = { count: 0 };
  const device: SharedDevice = shareAcrossTabs('overstrand-device-u1', async () => {
    opens.count++;
    return { store: new LocalStore(memoryTables(disk), nodeCrypto), engine, stop: () => undefined };
  }, status, links(locks));
  return { device, status, engine, opens };
}

const until = async (check: () => boolean) => {
  for (let i = 0; i < 200 && !check(); i++) await new Promise((r) => setTimeout(r, 5));
  expect(check()).toBe(true);
};

let open: SharedDevice[] = [];
afterEach(() => {
  open.forEach((d) => d.stop());
  open = [];
});

/** Two tabs of one origin, opened in this order: one database file, one lock manager. */
function twoTabs() {
  const disk = memoryDisk();
  const locks = fakeLocks();
  const a = tab(disk, locks);
  const b = tab(disk, locks);
  open = [a.device, b.device];
  return { a, b };
}

test('the first tab owns the database; a second tab creates and lists through it', async () => {
  const { a, b } = twoTabs();
  const made = await b.device.store.create({ title: 'Hopf link from tab two' });
  await a.device.store.create({ title: 'Trefoil from tab one' });
  expect(a.device.owner()).toBe(true);
  expect(b.device.owner()).toBe(false);
  expect(a.opens.count + b.opens.count).toBe(1); // only the owner opened the database
  const titles = async (d: SharedDevice) => (await d.store.list()).map((s) => s.title).sort();
  expect(await titles(a.device)).toEqual(['Hopf link from tab two', 'Trefoil from tab one']);
  expect(await titles(b.device)).toEqual(['Hopf link from tab two', 'Trefoil from tab one']);
  expect((await b.device.store.get(made.id))?.title).toBe('Hopf link from tab two');
});

test('the other tab hears the owner\'s changes and sync status, and its "Sync now" runs the owner\'s engine', async () => {
  const { a, b } = twoTabs();
  await b.device.store.list(); // b has decided it is not the owner
  let heard = 0;
  b.device.store.subscribe(() => heard++);
  await a.device.store.create({ title: 'Written in tab one' });
  await until(() => heard > 0);
  a.status.setState({ waiting: 3, lastError: 'HTTP 503' });
  await until(() => b.status.getState().lastError === 'HTTP 503');
  expect(b.status.getState().waiting).toBe(3);
  await b.device.engine.syncNow();
  expect(a.engine.syncNow).toHaveBeenCalledTimes(1);
  expect(b.engine.syncNow).not.toHaveBeenCalled();
});

test('an error in the owner reaches the calling tab with its message', async () => {
  const { b } = twoTabs();
  await expect(b.device.store.resolveConflict('no-such-conflict', {})).rejects.toThrow('No conflict no-such-conflict on this device');
});

test('when the owner tab closes, the waiting tab opens the database and keeps its sketches', async () => {
  const { a, b } = twoTabs();
  await b.device.store.create({ title: 'Made before the first tab closed' });
  a.device.stop(); // stopping twice (again after the test) is harmless
  await until(() => b.device.owner());
  expect(b.opens.count).toBe(1);
  await b.device.store.create({ title: 'Made after' });
  expect((await b.device.store.list()).map((s) => s.title).sort()).toEqual(['Made after', 'Made before the first tab closed']);
});
