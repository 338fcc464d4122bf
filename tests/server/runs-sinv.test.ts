// Khovanov runs that also compute the s-invariant: stored in the result, refused for links and
// sweeps before any work, and a stored result reused only when it carries s.
import type { RunningServer } from '@/server/server';
import { defaultRunLimits } from '@/server/runs/limits';
import { signUp, testServer } from './helpers';
import { ended, start, torus, trefoil, waitFor } from './runs-fixtures';

let server: RunningServer | undefined;
afterEach(async () => {
  await server?.stop();
  server = undefined;
});

const runsServer = () => testServer({ config: { runs: { ...defaultRunLimits(), threads: 1, progressEveryMs: 20 } } });

it('a knot run with computeS stores s over Q and F2 beside Kh, and the bar reaches 1', async () => {
  server = await runsServer();
  const { token } = await signUp(server);
  // s(T(3,4)) = (3-1)(4-1) = 6 (Rasmussen, "Khovanov homology and the slice genus", 2010, arXiv math/0402131).
  const res = await start(server, token, { diagram: { pd: torus(3, 4) }, ring: 'Q', computeS: true });
  expect(res.status).toBe(201);
  expect(res.body.computeS).toBe(true);
  const run = await waitFor(server, token, res.body.id, ended);
  expect(run).toMatchObject({ status: 'done', computeS: true, result: { s: { Q: 6, F2: 6 } } });
  expect(run.progress.fraction).toBe(1);
});

it('refuses s for a link and for a cable sweep, with the reason on the field', async () => {
  server = await runsServer();
  const { token } = await signUp(server);
  // T(2,4) is a link of two components (common practice: gcd(2,4) = 2).
  const link = await start(server, token, { diagram: { pd: torus(2, 4) }, computeS: true });
  expect(link.status).toBe(400);
  expect(link.body.error).toMatchObject({ message: 's is defined for knots here; this link has 2 components', fields: { computeS: 's is defined for knots here' } });
  const sweep = await start(server, token, { kind: 'cable-sweep', sweep: { maxStrands: 1 }, diagram: { pd: trefoil() }, computeS: true });
  expect(sweep.status).toBe(400);
  expect(sweep.body.error.fields.computeS).toBe('s is computed on Khovanov runs of knots, not on a cable sweep or a bands run');
});

it('reuses a stored result for s only when it computed s', async () => {
  server = await runsServer();
  const { token } = await signUp(server);
  const plain = await waitFor(server, token, (await start(server, token, { diagram: { pd: trefoil() } })).body.id, ended);
  expect(plain.result!.s).toBeUndefined();
  const withS = (await start(server, token, { diagram: { pd: trefoil() }, computeS: true })).body;
  expect(withS.reusedFrom).toBeNull();
  // docs/conventions.md: the positive trefoil has s = 2.
  expect((await waitFor(server, token, withS.id, ended)).result!.s).toEqual({ Q: 2, F2: 2 });
  const again = (await start(server, token, { diagram: { pd: trefoil() }, computeS: true })).body;
  expect(again).toMatchObject({ status: 'done', reusedFrom: withS.id, result: { s: { Q: 2, F2: 2 } } });
}, 60_000);
