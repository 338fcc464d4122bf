// The feed reads run results from the Runs area's table (server/feed/runs.ts): latest result per
// sketch, the "has results" filter, and "same invariants as" through an equal Khovanov result.
// Rows are written as server/runs stores them, with a result computed by the Khovanov engine.
import { randomUUID } from 'node:crypto';
import { khovanov } from '@/shared/khovanov';
import { poincareFormat } from '@/shared/khovanov/format';
import { FeedPage, GroupSketch } from '@/shared/api/feed';
import type { RunningServer } from '@/server/server';
import { api, auth, castServer, sketchOf, type Cast } from './feed-fixtures';

let server: RunningServer;
let c: Cast;
beforeAll(async () => ({ server, c } = await castServer()));
afterAll(() => server.stop());

// Positive trefoil, docs/conventions.md (from memory).
const trefoilPd: [number, number, number, number][] = [[1, 5, 2, 4], [3, 1, 4, 6], [5, 3, 6, 2]];

async function insertRun(sketchId: string, status: string, finishedAt: string, result: unknown, parentRunId: string | null = null) {
  await server.deps.db.query(
    `INSERT INTO "runs" ("id", "kind", "status", "label", "sketchId", "groupId", "startedBy", "parentRunId", "diagram", "diagramKey", "crossings",
       "ring", "reduced", "progress", "complexSize", "result", "createdAt", "finishedAt")
     VALUES (?, 'khovanov', ?, 'Kh over Z', ?, ?, ?, ?, '{}', ?, 3, 'Z', 0, 1, 0, ?, ?, ?)`,
    [randomUUID(), status, sketchId, c.group, c.as.member.id, parentRunId, randomUUID().replace(/-/g, ''), JSON.stringify(result), finishedAt, finishedAt],
  );
}

test('latest finished run, "has results", and same Khovanov result as a link', async () => {
  const kh = khovanov(trefoilPd, { ring: 'Z' });
  const withRun = await sketchOf(server, c.as.member, { title: 'Computed', diagram: { pd: trefoilPd, unknots: 0, framings: [null], strokes: [] }, groupId: c.group });
  // No PD code (so no Jones key): it can only be linked through its run's result.
  const typedLater = await sketchOf(server, c.as.member, { title: 'Only a result', diagram: { pd: [], unknots: 0, framings: [], strokes: [] }, groupId: c.group });
  const failed = await sketchOf(server, c.as.member, { title: 'Failed run', groupId: c.group });
  await insertRun(withRun, 'done', '2026-12-01T10:00:00.000Z', { ...kh, poincareText: 'older' });
  await insertRun(withRun, 'done', '2026-12-01T11:00:00.000Z', kh);
  await insertRun(typedLater, 'done', '2026-12-01T09:00:00.000Z', kh);
  await insertRun(failed, 'failed', '2026-12-01T09:00:00.000Z', null);

  const feed = FeedPage.parse((await api(server).get(`/api/groups/${c.group}/feed`).set(auth(c.as.viewer))).body);
  const item = feed.items.find((i) => i.id === withRun)!;
  expect(item.latestRun).toMatchObject({ kind: 'khovanov', finishedAt: '2026-12-01T11:00:00.000Z' });
  expect(item.latestRun!.summary).toBe(`Kh over Z: ${poincareFormat(kh.poincare, 'unicode')}`);
  expect(feed.items.find((i) => i.id === failed)!.latestRun).toBeNull();

  const results = FeedPage.parse((await api(server).get(`/api/groups/${c.group}/feed?hasResults=true`).set(auth(c.as.viewer))).body);
  expect(results.items.map((i) => i.id).sort()).toEqual([withRun, typedLater].sort());

  const page = GroupSketch.parse((await api(server).get(`/api/groups/${c.group}/feed/${typedLater}`).set(auth(c.as.viewer))).body);
  expect(page.sameInvariants.map((s) => s.id)).toEqual([withRun]);
});

test('s is known from the newest run that computed it, even when a later run did not', async () => {
  const kh = khovanov(trefoilPd, { ring: 'Z' });
  const sketch = await sketchOf(server, c.as.member, { title: 'With s', diagram: { pd: trefoilPd, unknots: 0, framings: [null], strokes: [] }, groupId: c.group });
  // docs/conventions.md: the positive trefoil has s = 2 (the stored value, as a run writes it).
  await insertRun(sketch, 'done', '2026-12-02T10:00:00.000Z', { ...kh, s: { Q: 2, F2: 2 } });
  await insertRun(sketch, 'done', '2026-12-02T11:00:00.000Z', kh);
  const feed = FeedPage.parse((await api(server).get(`/api/groups/${c.group}/feed`).set(auth(c.as.viewer))).body);
  expect(feed.items.find((i) => i.id === sketch)!.latestRun).toMatchObject({ finishedAt: '2026-12-02T11:00:00.000Z', s: 2 });
  const none = feed.items.find((i) => i.latestRun && i.id !== sketch)!;
  expect(none.latestRun!.s).toBeUndefined();
});
