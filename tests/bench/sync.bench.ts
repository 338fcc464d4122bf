// Sync of 1000 sketches on loopback (goal: <= 5 s each way) and the size of a pull page.
// Real server (in-memory database), real engine and LocalStore over memory tables.
import { LocalStore } from '@/lib/store/local-store';
import { nodeCrypto } from '../sync/node-crypto';
import { memoryTables } from '@/lib/store/memory';
import { SyncEngine } from '@/lib/sync/engine';
import { createSyncStatusStore } from '@/lib/sync/status-store';
import { httpTransport } from '@/lib/sync/transport';
import { AuthResponse } from '@/shared/api/auth';
import { defaultPullLimit } from '@/shared/api/sync';
import { startServer } from '@/server/server';
import { layoutPD } from '@/shared/layout/layout';
import { layoutToSketch } from '@/shared/layout/to-sketch';
import type { Line } from './timing';

const SKETCHES = 1000;

// A sketch as the Slate stores it: the trefoil's PD code (docs/conventions.md, from memory)
// with the drawing state the layout code makes for it (about 12 KB of JSON) as its geometry.
const pd = [[1, 5, 2, 4], [3, 1, 4, 6], [5, 3, 6, 2]] as [number, number, number, number][];
const diagram = { pd, unknots: 0, framings: [null], strokes: [], geometry: JSON.parse(JSON.stringify(layoutToSketch(layoutPD(pd)))) };

export async function syncBench(): Promise<Line[]> {
  const server = await startServer({ config: { bcryptRounds: 4 } });
  try {
    const res = await fetch(`${server.url}/api/auth/register`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'bench@example.org', password: 'correct horse', displayName: 'Bench' }),
    });
    const { token } = AuthResponse.parse(await res.json());
    const device = () => {
      const store = new LocalStore(memoryTables(), nodeCrypto);
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
    const body = await page.text();
    const pageBytes = body.length;
    const pageCount = JSON.parse(body).changes.length;
    const sketchBytes = JSON.stringify((await b.store.list())[0]).length;
    return [
      { name: `sync: push+pull ${SKETCHES} new sketches from one device`, value: Math.round(pushMs), unit: 'ms', goal: '<= 5000 ms' },
      { name: `sync: fresh device pulls ${SKETCHES} sketches`, value: Math.round(pullMs), unit: 'ms', goal: '<= 5000 ms' },
      { name: 'sync: sketches in that page', value: pageCount, unit: 'sketches' },
      { name: `sync: pull page (limit ${defaultPullLimit}, ~1 MB cap) of ${sketchBytes} B sketches`, value: Math.round(pageBytes / 1024), unit: 'KiB' },
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
