// Bands runs: the unlink check of a band presentation by Kh over Z in the run pool (no crossing
// limit but the run's), its certificate in the result, and refusals before any work.
import type { RunningServer } from '@/server/server';
import { defaultRunLimits } from '@/server/runs/limits';
import type { BandPresentation } from '@/shared/knot/bands';
import { ribbon, trefoil } from '@/tests/shared/bands-fixtures';
import { signUp, testServer } from './helpers';
import { ended, start, waitFor } from './runs-fixtures';

let server: RunningServer | undefined;
afterEach(async () => {
  await server?.stop();
  server = undefined;
});

const runsServer = () => testServer({ config: { runs: { ...defaultRunLimits(), threads: 1, progressEveryMs: 20 } } });
const body = (p: BandPresentation) => ({ kind: 'bands' as const, diagram: { pd: p.pd.map((x) => [...x] as [number, number, number, number]), unknots: p.unknots, bands: p.saddles.map(({ a, b }): [number, number] => [a, b]) } });
const presentation = (name: string) => ribbon.find((r) => r.name.startsWith(name))!.presentation;

it('certifies ribbon presentations through the run: the square knot by Kh over Z, 8_20 by simplification', async () => {
  // The presentations and their sources: tests/shared/bands-fixtures.ts (certified ribbon there too).
  server = await runsServer();
  const { token } = await signUp(server);
  const square = await start(server, token, body(presentation('square knot')));
  expect(square.status).toBe(201);
  expect(square.body).toMatchObject({ kind: 'bands', ring: 'Z', reduced: false });
  const done = await waitFor(server, token, square.body.id, ended);
  // One band from a knot to the 2-component unlink: chi = 2 - 1 = 1, a ribbon disk. Kh of the
  // 2-component unlink over Z: Z at (0, 2), Z^2 at (0, 0), Z at (0, -2) (Khovanov 2000, arXiv math/9908171).
  expect(done).toMatchObject({ status: 'done', result: { ring: 'Z', bands: { unlink: 'khovanov', components: 2, bands: 1, chi: 1, genusBound: 0, ribbon: true } } });
  expect(done.result!.bands!.after.pd.length).toBeGreaterThan(0);
  expect(done.result!.groups).toEqual([
    { i: 0, j: -2, free: 1, torsion: [] },
    { i: 0, j: 0, free: 2, torsion: [] },
    { i: 0, j: 2, free: 1, torsion: [] },
  ]);
  expect(done.progress.fraction).toBe(1);

  const p820 = await waitFor(server, token, (await start(server, token, body(presentation('8_20')))).body.id, ended);
  expect(p820).toMatchObject({ status: 'done', result: { bands: { unlink: 'crossingless', after: { pd: [], unknots: 2 }, ribbon: true } } });
}, 60_000);

it('does not certify the trefoil plus one band, a Hopf link of rank 4 like the unlink', async () => {
  // Kh(Hopf link) has rank 4 = 2^2 but not at h = 0 only (Khovanov 2000, arXiv math/9908171): not the unlink's group.
  server = await runsServer();
  const { token } = await signUp(server);
  const res = await start(server, token, body({ pd: trefoil.pd, unknots: 0, saddles: [{ a: 4, b: 6 }] }));
  const run = await waitFor(server, token, res.body.id, ended);
  expect(run).toMatchObject({ status: 'done', result: { bands: { unlink: 'none', components: 2, genusBound: null, ribbon: false } } });
  expect(run.result!.groups.reduce((sum, g) => sum + g.free, 0)).toBe(4);
}, 60_000);

it('refuses bad bands, another ring and bands on other kinds before any work', async () => {
  server = await runsServer();
  const { token } = await signUp(server);
  const pd = trefoil.pd.map((x) => [...x] as [number, number, number, number]);
  const missing = await start(server, token, { kind: 'bands', diagram: { pd, bands: [[4, 99]] } });
  expect(missing.status).toBe(400);
  expect(missing.body.error.fields.bands).toBe('there is no edge 99 in the PD code');
  // tests/shared/bands.test.ts: edges 2 and 5 of this trefoil run opposite ways around their face.
  const twisted = await start(server, token, { kind: 'bands', diagram: { pd, bands: [[2, 5]] } });
  expect(twisted.status).toBe(400);
  expect(twisted.body.error.fields.bands).toMatch(/non-orientable/);
  expect((await start(server, token, { kind: 'bands', ring: 'Q', diagram: { pd, bands: [[4, 6]] } })).status).toBe(400);
  expect((await start(server, token, { diagram: { pd, bands: [[4, 6]] } })).status).toBe(400);
});
