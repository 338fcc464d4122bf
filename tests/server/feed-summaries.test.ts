// Feed summaries off the request thread (server/feed/summaries.ts): a written sketch reads as
// computing until the job pool has its Jones polynomial, an edit that keeps the diagram keeps
// the summary, a job over its time limit leaves the counts without Jones, and summaries
// missing when the server starts are computed then.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { FeedPage } from '@/shared/api/feed';
import type { RunningServer } from '@/server/server';
import { api, auth, cast, sketchOf, summarisedFeed, type Account } from './feed-fixtures';
import { testServer } from './helpers';
import { torus } from './runs-fixtures';
import { mutation, push } from './sync-fixtures';

let server: RunningServer | undefined;
afterEach(async () => {
  await server?.stop();
  server = undefined;
});

const feedOf = async (s: RunningServer, who: Account, groupId: string) => FeedPage.parse((await api(s).get(`/api/groups/${groupId}/feed`).set(auth(who))).body);
// T(9, 15): 120 crossings, 3 components (gcd(9, 15); common practice); its Jones polynomial
// takes seconds by tangle contraction, so a read right after the write finds it computing.
const big = { pd: torus(9, 15), unknots: 0, framings: [null, null, null], strokes: [] };
/** V(1) = (-2)^(c-1) for a c-component link (Jones 1985, "A polynomial invariant for knots via von Neumann algebras"). */
const atOne = (jones: [number, number | string][]) => jones.reduce((s, [, c]) => s + BigInt(c), 0n);

it('reads as computing, then has the Jones polynomial; an edit keeping the diagram keeps it', async () => {
  server = await testServer();
  const c = await cast(server);
  const id = await sketchOf(server, c.as.owner, { title: 'T(9,15)', diagram: big, groupId: c.group });
  const first = (await feedOf(server, c.as.member, c.group)).items.find((i) => i.id === id)!;
  expect(first.invariants).toEqual({ crossings: 120, components: null, jones: null, jonesText: null, computing: true });

  const done = (await summarisedFeed(server, c.as.member, c.group, 120_000)).items.find((i) => i.id === id)!;
  expect(done.invariants).toMatchObject({ crossings: 120, components: 3, computing: false });
  expect(atOne(done.invariants.jones!)).toBe(4n);

  const [r] = await push(server, c.as.owner.token, 'phone-1', [mutation('phone-1', Date.now(), id, 'update', { title: 'Renamed' }, done.version)]);
  expect(r.status).toBe('applied');
  const renamed = (await feedOf(server, c.as.member, c.group)).items.find((i) => i.id === id)!;
  expect(renamed.version).toBeGreaterThan(done.version);
  expect(renamed.invariants).toEqual(done.invariants); // at once: moved, not computed again
}, 180_000);

it('a summary job over its time limit leaves the counts and no Jones polynomial (not computing any more)', async () => {
  server = await testServer({ config: { jobs: { threads: 1, maxWallMs: 50, maxMemoryMb: 512 } } });
  const c = await cast(server);
  const id = await sketchOf(server, c.as.owner, { title: 'T(9,15)', diagram: big, groupId: c.group });
  const item = (await summarisedFeed(server, c.as.member, c.group)).items.find((i) => i.id === id)!;
  expect(item.invariants).toEqual({ crossings: 120, components: null, jones: null, jonesText: null, computing: false });
}, 60_000);

describe('at start', () => {
  let dir: string;
  beforeAll(() => (dir = mkdtempSync(join(tmpdir(), 'overstrand-summaries-'))));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('computes the summaries shared sketches lack (rows of older versions, or none)', async () => {
    const dbPath = join(dir, 'db.sqlite');
    server = await testServer({ dbPath });
    const c = await cast(server);
    await sketchOf(server, c.as.owner, { title: 'Trefoil', groupId: c.group });
    await summarisedFeed(server, c.as.member, c.group);
    // As a database from before summaries were written ahead of reads has them: none.
    await server.deps.db.query('DELETE FROM sketch_invariants');
    await server.stop();

    server = await testServer({ dbPath });
    // Before any read (a read would hand a missing summary to the pool too).
    const rows = () => server!.deps.db.query('SELECT COUNT(*) AS n FROM sketch_invariants') as Promise<{ n: number }[]>;
    for (const t0 = Date.now(); (await rows())[0].n === 0; await new Promise((r) => setTimeout(r, 50))) {
      if (Date.now() - t0 > 30_000) throw new Error('no summary computed at start');
    }
    const [item] = (await summarisedFeed(server, c.as.member, c.group)).items;
    // The positive trefoil: V = t + t^3 - t^4 (docs/conventions.md).
    expect(item.invariants).toMatchObject({ crossings: 3, components: 1, jones: [[1, 1], [3, 1], [4, -1]], computing: false });
  }, 60_000);
});
