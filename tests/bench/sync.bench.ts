// Sync of 1000 sketches on loopback (goal: <= 5 s each way) and the size of a pull page.
// Real server (in-memory database), real engine and LocalStore over memory tables.
import { LocalStore } from '@/lib/store/local-store';
import { memoryTables } from '@/lib/store/memory';
import { SyncEngine } from '@/lib/sync/engine';
import { createSyncStatusStore } from '@/lib/sync/status-store';
import { httpTransport } from '@/lib/sync/transport';
import { AuthResponse } from '@/shared/api/auth';
import { defaultPullLimit } from '@/shared/api/sync';
import { startServer } from '@/server/server';

export interface BenchLine {
  name: string;
  value: number;
  unit: string;
  goal?: string;
}

const SKETCHES = 1000;

// A drawing of typical size: 3 crossings, 4 strokes of 150 points each.
const stroke = (k: number) => ({ points: Array.from({ length: 150 }, (_, i) => [Math.cos(i / 20 + k) * 100, Math.sin(i / 20 + k) * 100] as [number, number]) });
const diagram = {
  pd: [[1, 5, 2, 4], [3, 1, 4, 6], [5, 3, 6, 2]] as [number, number, number, number][],
  unknots: 0,
  framings: [null],
  strokes: [0, 1, 2, 3].map(stroke),
};

export async function syncBench(): Promise<BenchLine[]> {
  const server = await startServer({ config: { bcryptRounds: 4 } });
  try {
    const res = await fetch(`${server.url}/api/auth/register`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'bench@example.org', password: 'correct horse', displayName: 'Bench' }),
    });
    const { token } = AuthResponse.parse(await res.json());
    const device = () => {
      const store = new LocalStore(memoryTables());
      const transport = httpTransport({ baseUrl: () => server.url, token: () => token });
      return { store, engine: new SyncEngine({ store, transport, status: createSyncStatusStore() }) };
    };

    const a = device();
    for (let i = 0; i < SKETCHES; i++) await a.store.create({ title: `Sketch ${i}`, tags: ['bench'], diagram });
    let t = performance.now();
    await a.engine.syncNow();
    const pushMs = performance.now() - t;

    const b = device();
    t = performance.now();
    await b.engine.syncNow();
    const pullMs = performance.now() - t;
    const got = (await b.store.list()).length;
    if (got !== SKETCHES) throw new Error(`device B holds ${got} sketches, expected ${SKETCHES}`);

    const page = await fetch(`${server.url}/api/sync/pull?cursor=0&limit=${defaultPullLimit}`, { headers: { Authorization: `Bearer ${token}` } });
    const pageBytes = (await page.arrayBuffer()).byteLength;
    return [
      { name: `sync: push+pull ${SKETCHES} new sketches from one device`, value: Math.round(pushMs), unit: 'ms', goal: '<= 5000 ms' },
      { name: `sync: fresh device pulls ${SKETCHES} sketches`, value: Math.round(pullMs), unit: 'ms', goal: '<= 5000 ms' },
      { name: `sync: pull page of ${defaultPullLimit} sketches (4 strokes x 150 points each)`, value: Math.round(pageBytes / 1024), unit: 'KiB' },
    ];
  } finally {
    await server.stop();
  }
}

if (require.main === module) {
  void syncBench().then((lines) => {
    for (const l of lines) console.log(`${l.name}: ${l.value} ${l.unit}${l.goal ? ` (goal ${l.goal})` : ''}`);
  });
}
