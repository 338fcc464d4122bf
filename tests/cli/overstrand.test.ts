// The `overstrand` command line as a user runs it: through the package bin (server/cli/bin.mjs),
// as a child process. Values: docs/conventions.md (positive trefoil Jones t + t^3 - t^4, Kh
// with Z/2 at (3,7), Bar-Natan 2002, arXiv math/0201043); determinant 3 and signature -2 of the
// positive trefoil (Lickorish, An Introduction to Knot Theory, ch. 6 and 8; from memory).
import { spawn, spawnSync } from 'node:child_process';
import path from 'node:path';
import { answerLine, jsonInteger } from '@/server/cli/requests';
import { fromBraid } from '@/shared/knot/braid';
import { seededRng } from '@/shared/knot/moves';
import { disks946, p33m3 } from '@/tests/shared/bands-fixtures';
import { movedAway } from '@/tests/shared/bands-moved';

const bin = path.join(__dirname, '../../server/cli/bin.mjs');
const run = (args: string[], input = '') => spawnSync(process.execPath, [bin, ...args], { input, encoding: 'utf8', timeout: 60_000 });
const lines = (text: string) => text.split('\n').filter((l) => l !== '').map((l) => JSON.parse(l));

describe('overstrand invariants', () => {
  it('answers a braid word as JSON', () => {
    const r = run(['invariants', '--braid', '1 1 1', '--json']);
    expect(r.status).toBe(0);
    const a = JSON.parse(r.stdout);
    expect(a).toMatchObject({ crossings: 3, components: 1, writhe: 3, determinant: 3, signature: -2, linking: [[3]] });
    expect(a.jones).toEqual([[1, 1], [3, 1], [4, -1]]);
    expect(a.alexander).toEqual([[-1, 1], [0, -1], [1, 1]]); // t^-1 - 1 + t (Rolfsen, Appendix C; from memory)
    expect(a.colourings).toEqual({ n: 3, count: 9 }); // 9 three-colourings, 3 constant (Fox 1962; from memory)
  });

  it('takes negative braid letters as values, not options (the negative trefoil)', () => {
    const a = JSON.parse(run(['invariants', '--braid', '-1 -1 -1', '--json']).stdout);
    expect(a).toMatchObject({ writhe: -3, signature: 2, name: 'invariants match 3_1 (mirror)' });
    expect(a.jones).toEqual([[-4, -1], [-3, 1], [-1, 1]]); // V(1/t) of the positive trefoil
  });

  it('prints a readable summary for PD and DT codes', () => {
    const pd = run(['invariants', '--pd', '[[1,5,2,4],[3,1,4,6],[5,3,6,2]]']);
    expect(pd.status).toBe(0);
    expect(pd.stdout).toMatch(/determinant\s+3\n/);
    expect(pd.stdout).toMatch(/name\s+invariants match 3_1/);
    const dt = run(['invariants', '--dt', '4 6 8 2']); // figure-eight (DT code from memory; Jones from Lickorish, ch. 3)
    expect(dt.stdout).toMatch(/Jones polynomial\s+t\^-2 - t\^-1 \+ 1 - t \+ t\^2\n/);
  });

  it('half-integer Jones exponents travel as 0.5 (Hopf link)', () => {
    const a = JSON.parse(run(['invariants', '--braid', '1 1', '--json']).stdout);
    expect(a.jones).toEqual([[0.5, -1], [2.5, -1]]); // -t^(1/2) - t^(5/2), Jones 1985 (from memory)
    expect(a.linking).toEqual([[0, 1], [1, 0]]);
  });

  it('rejects bad input with a message and exit code 1', () => {
    const r = run(['invariants', '--pd', '[[1,5,2,4]]']);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/label 1 appears 1 time/);
    const both = run(['invariants', '--braid', '1', '--dt', '4 6 2']);
    expect(both.status).toBe(1);
    expect(both.stderr).toMatch(/exactly one of --pd, --braid or --dt/);
  });
});

describe('overstrand batch', () => {
  it('answers good, malformed and failing lines, keeps ids, exits 0', () => {
    const input = [
      '{"id": 1, "braid": [1, 1, 1], "compute": ["jones", "determinant"]}',
      'this is not json',
      '{"id": "two", "pd": [[1, 2, 3]]}',
      '{"id": [3], "pd": [[1,5,2,4],[3,1,4,6],[5,3,6,7]]}',
      '',
      '{"id": 4, "braid": [1, 1], "compute": ["nonsense"]}',
      '{"id": 5, "dt": [4, 6, 2], "compute": ["kh"], "ring": "Z"}',
      '{"id": 6, "braid": [1], "pd": [[1,1,2,2]]}',
    ].join('\n');
    const r = run(['batch'], input);
    expect(r.status).toBe(0);
    const out = lines(r.stdout);
    expect(out).toHaveLength(7);
    expect(out[0]).toEqual({ id: 1, jones: [[1, 1], [3, 1], [4, -1]], determinant: 3 });
    expect(out[1]).toEqual({ id: null, error: 'the line is not valid JSON' });
    expect(out[2].id).toBe('two');
    expect(out[2].error).toMatch(/pd/);
    expect(out[3]).toEqual({ id: [3], error: 'label 2 appears 1 time; each label must appear exactly twice' });
    expect(out[4].id).toBe(4);
    expect(out[4].error).toMatch(/compute/);
    expect(out[5].kh.groups).toContainEqual({ i: 3, j: 7, free: 0, torsion: [2] });
    expect(out[6].error).toMatch(/exactly one of "pd", "braid", "dt" or "cable"/);
  });

  it('streams: an answer comes out before stdin is closed', async () => {
    const child = spawn(process.execPath, [bin, 'batch'], { stdio: ['pipe', 'pipe', 'inherit'] });
    const first = new Promise<string>((resolve) => child.stdout.once('data', (chunk: Buffer) => resolve(chunk.toString())));
    child.stdin.write('{"id": "early", "braid": [1, -2, 1, -2], "compute": ["determinant"]}\n');
    expect(JSON.parse(await first)).toEqual({ id: 'early', determinant: 5 }); // figure-eight, det 5 (Rolfsen, Appendix C; from memory)
    child.stdin.end();
    const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
    expect(code).toBe(0);
  }, 60_000);
});

describe('overstrand kh', () => {
  it('prints the Khovanov table of the trefoil, torsion included', () => {
    const r = run(['kh', '--braid', '1 1 1', '--ring', 'Z']);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/Khovanov homology over Z/);
    expect(r.stdout).toMatch(/7 .*Z\/2/);
    const q = JSON.parse(run(['kh', '--braid', '1 1 1', '--ring', 'Q', '--reduced', '--json']).stdout);
    expect(q.kh.ring).toBe('Q');
    expect(q.kh.reduced).toBe(true);
  });
});

describe('request answers in process', () => {
  it('writes integers beyond 2^53 as strings', () => {
    expect(jsonInteger(2n ** 60n)).toBe('1152921504606846976');
    expect(jsonInteger(-7n)).toBe(-7);
  });

  it('computes only what is asked, and the defaults without kh', () => {
    expect(JSON.parse(answerLine('{"id":0,"braid":[1,1,1],"compute":["crossings"]}'))).toEqual({ id: 0, crossings: 3 });
    const all = JSON.parse(answerLine('{"id":0,"braid":[1,-1,1],"unknots":1}'));
    expect(all.components).toBe(2);
    expect(all.kh).toBeUndefined();
    expect(all.determinant).toBe(0); // split link (unknot + unknot): det 0 (common practice)
  });

  it('answers a wide braid (the Temperley-Lieb sweep) with the bracket and Jones of its PD code', () => {
    // The same diagram given as PD goes through the general contraction; the two must agree.
    const word = Array.from({ length: 40 }, (_, i) => ((i % 6) + 1) * (i % 3 === 0 ? -1 : 1));
    const pd = fromBraid(word, 7).pd;
    const byBraid = JSON.parse(answerLine(JSON.stringify({ id: 0, braid: word, unknots: 2, compute: ['bracket', 'jones'] })));
    const byPD = JSON.parse(answerLine(JSON.stringify({ id: 0, pd, unknots: 2, compute: ['bracket', 'jones'] })));
    expect(byBraid).toEqual(byPD);
  });

  it('answers "s" over Q and F2 for a knot, and an {id, error} line for a link', () => {
    // s(T(3,4)) = 6 and s of the negative trefoil = -2 (Rasmussen 2010, arXiv math/0402131; docs/conventions.md signs).
    expect(JSON.parse(answerLine('{"id":7,"braid":[1,2,1,2,1,2,1,2],"compute":["s"]}'))).toEqual({ id: 7, s: { Q: 6, F2: 6 } });
    expect(JSON.parse(answerLine('{"id":8,"braid":[-1,-1,-1],"compute":["s","signature"]}'))).toEqual({ id: 8, s: { Q: -2, F2: -2 }, signature: 2 });
    expect(JSON.parse(answerLine('{"id":0,"pd":[],"compute":["s"]}'))).toEqual({ id: 0, s: { Q: 0, F2: 0 } });
    expect(JSON.parse(answerLine('{"id":9,"braid":[1,1],"compute":["s"]}'))).toEqual({ id: 9, error: 's is defined for knots here; this link has 2 components' });
    expect(JSON.parse(answerLine('{"id":9,"braid":[1,1,1]}')).s).toBeUndefined();
  });

  it('answers "homfly" as [vExp, zExp, coeff] triples, only when asked', () => {
    // Positive trefoil 2v^2 - v^4 + v^2 z^2 (docs/conventions.md, HOMFLY-PT; from memory, checked in tests/shared/homfly.test.ts).
    expect(JSON.parse(answerLine('{"id":3,"braid":[1,1,1],"compute":["homfly"]}'))).toEqual({ id: 3, homfly: [[2, 0, 2], [2, 2, 1], [4, 0, -1]] });
    // Two-component unlink: (v^-1 - v) z^-1 (the skein relation at a kink).
    expect(JSON.parse(answerLine('{"id":4,"pd":[],"unknots":2,"compute":["homfly"]}'))).toEqual({ id: 4, homfly: [[-1, -1, 1], [1, -1, -1]] });
    expect(JSON.parse(answerLine('{"id":3,"braid":[1,1,1]}')).homfly).toBeUndefined();
  });

  it('reads an empty PD code as the unknot, and "unknots" as free components', () => {
    // <O> = 1 and <O O> = -A^2 - A^-2 (docs/conventions.md).
    expect(JSON.parse(answerLine('{"id":0,"pd":[],"compute":["components","bracket","name"]}'))).toEqual({ id: 0, components: 1, bracket: [[0, 1]], name: 'invariants match 0_1 (the unknot)' });
    expect(JSON.parse(answerLine('{"id":0,"pd":[],"unknots":2,"compute":["bracket","determinant"]}'))).toEqual({ id: 0, bracket: [[-2, -1], [2, -1]], determinant: 0 });
  });
});

describe('cables in requests', () => {
  const ask = (request: object) => JSON.parse(answerLine(JSON.stringify({ id: 0, ...request })));

  it('the (3,0)-cable of the +1-framed unknot is T(3,3): same Khovanov homology as the closure of (s1 s2)^3 (common practice)', () => {
    const c = ask({ cable: { of: { pd: [], framings: [1] }, rPlus: 3, rMinus: 0 }, compute: ['pd', 'crossings', 'components', 'kh'], ring: 'Z' });
    expect(c.crossings).toBe(6); // one full twist of 3 strands
    expect(c.components).toBe(3);
    expect(c.pd).toHaveLength(6);
    expect(c.kh).toEqual(ask({ braid: [1, 2, 1, 2, 1, 2], compute: ['kh'], ring: 'Z' }).kh);
  });

  it('returns the cable PD code, which reads back as the same diagram', () => {
    // The 0-framed right trefoil: its (2,1)-cable has 9 * 3 grid crossings and 3 full negative twists of 3 strands.
    const c = ask({ cable: { of: { braid: [1, 1, 1], framings: [0] }, component: 0, rPlus: 2, rMinus: 1 }, compute: ['pd', 'crossings', 'jones'] });
    expect(c.crossings).toBe(27 + 18);
    expect(ask({ pd: c.pd, unknots: c.unknots, compute: ['jones'] }).jones).toEqual(c.jones);
  });

  it('refuses a cable beside a code, a missing component and bad framings', () => {
    expect(ask({ braid: [1], cable: { of: { braid: [1, 1, 1] }, rPlus: 1, rMinus: 0 } }).error).toMatch(/exactly one of/);
    expect(ask({ cable: { of: { braid: [1, 1, 1] }, component: 3, rPlus: 1, rMinus: 0 } }).error).toMatch(/no component 4/);
    expect(ask({ cable: { of: { braid: [1, 1, 1], framings: [0, 1] }, rPlus: 2, rMinus: 0 } }).error).toMatch(/2 framings given for 1 component/);
  });
});

describe('bands in requests', () => {
  const ask = (request: object) => JSON.parse(answerLine(JSON.stringify({ id: 0, ...request })));
  const trefoil = [[4, 2, 5, 1], [2, 6, 3, 5], [6, 4, 1, 3]]; // fromBraid([1, 1, 1], 2)
  // P(3,3,-3) = 9_46 as pretzelLink([3, 3, -3]) builds it (tests/shared/bands-fixtures.ts).
  const p946 = [[12, 1, 13, 2], [2, 11, 3, 12], [10, 3, 11, 4], [6, 13, 7, 14], [14, 5, 15, 6], [4, 15, 5, 16], [7, 1, 8, 18], [17, 9, 18, 8], [9, 17, 10, 16]];

  it('answers "bands": two bands take the trefoil to the unknot, a genus-1 surface (tests/shared/bands.test.ts)', () => {
    expect(ask({ pd: trefoil, bands: [[4, 6], [2, 6]], compute: ['bands'] })).toEqual({
      id: 0,
      bands: { after: { pd: [], unknots: 1, components: 1 }, components: 1, bands: 2, unlink: 'crossingless', chi: -1, genusBound: 1, ribbon: false },
    });
  });

  it('answers "surfaceClass" with "compareBands": the two standard disks of 9_46 differ (Sundberg and Swann, arXiv 2103.01438)', () => {
    const a = ask({ pd: p946, bands: [[2, 12]], compareBands: [[6, 14]], compute: ['surfaceClass'] });
    expect(a.surfaceClass).toMatchObject({ h: 0, q: 1, zero: false, compare: { verdict: 'differ', other: { h: 0, q: 1, zero: false } } });
    expect(a.surfaceClass.support[0]).toEqual({ smoothing: expect.stringMatching(/^[01]{9}$/), x: expect.any(Array) });
  });

  it('answers "surfaceClass" past 14 crossings on the local route: 9_46 moved away from its bands, the disks still differ', () => {
    // Moves away from the bands induce an isomorphism carrying both classes (Jacobsson 2004, arXiv
    // math/0206303), so they still differ (Sundberg and Swann, arXiv 2103.01438).
    const { pd, bands } = movedAway(p33m3.pd, [disks946.first[0].saddles, disks946.second[0].saddles], 6, seededRng(18));
    expect(pd.length).toBeGreaterThan(14);
    const pairs = (list: { a: number; b: number }[]) => list.map(({ a, b }) => [a, b]);
    const a = ask({ pd, bands: pairs(bands[0]), compareBands: pairs(bands[1]), compute: ['surfaceClass'] });
    expect(a.surfaceClass).toMatchObject({ basis: 'local', h: 0, q: 1, zero: false, compare: { verdict: 'differ', other: { basis: 'local', q: 1, zero: false } } });
    expect(a.surfaceClass.support[0]).toEqual({ generator: expect.any(Number) });
  });

  it('answers "surfaceClass" over Z with "ring": "Z": the disks of 9_46 differ up to sign, each class primitive (tests/shared/bands-class.test.ts)', () => {
    const a = ask({ pd: p946, bands: [[2, 12]], compareBands: [[6, 14]], compute: ['surfaceClass'], ring: 'Z' });
    expect(a.surfaceClass).toMatchObject({ ring: 'Z', h: 0, q: 1, zero: false, divisibility: 1, compare: { verdict: 'differ', other: { ring: 'Z', q: 1, divisibility: 1 } } });
    expect(a.surfaceClass.coefficients).toHaveLength(a.surfaceClass.support.length);
    expect(ask({ pd: p946, bands: [[2, 12]], compute: ['surfaceClass'], ring: 'Q' }).error).toMatch(/over "F2" \(the default\) or "Z"/);
  });

  // The two disks, each after a finger of its own (an R2 pushed in a face away from its band:
  // crossings 10 and 11), so their codes differ; 9_46 itself is the common diagram.
  const fingeredA = [[1, 10, 2, 11], [11, 22, 12, 1], [21, 12, 22, 13], [15, 4, 16, 5], [5, 14, 6, 15], [13, 6, 14, 7], [18, 10, 19, 9], [8, 20, 9, 19], [20, 8, 21, 7], [17, 2, 18, 3], [16, 4, 17, 3]];
  const fingeredB = [[1, 10, 2, 11], [11, 22, 12, 1], [21, 12, 22, 13], [15, 2, 16, 3], [3, 14, 4, 15], [13, 4, 14, 5], [16, 8, 17, 7], [6, 20, 7, 19], [20, 6, 21, 5], [18, 10, 19, 9], [17, 8, 18, 9]];

  it('answers "surfaceClass" on "knot": each disk carried down its own finger, the classes still differ and the first is the class without the finger', () => {
    const a = ask({ pd: fingeredA, bands: [[11, 1]], knot: p946, fingers: [10, 11], compareWith: { pd: fingeredB, bands: [[15, 3]], fingers: [10, 11] }, compute: ['surfaceClass'] });
    // Sundberg and Swann, arXiv 2103.01438: the two standard disks of 9_46 have different classes.
    expect(a.surfaceClass).toMatchObject({ h: 0, q: 1, zero: false, compare: { verdict: 'differ', other: { q: 1, zero: false } } });
    // A finger is an isotopy away from the band: its chain maps give back the class on 9_46 itself.
    const plain = ask({ pd: p946, bands: [[2, 12]], compute: ['surfaceClass'] }).surfaceClass;
    expect(a.surfaceClass.support).toEqual(plain.support);
  });

  it('refuses "fingers" without "knot", "knot" with "compareBands", and fingers that are not the knot diagram\'s complement', () => {
    expect(ask({ pd: fingeredA, bands: [[11, 1]], fingers: [10, 11], compute: ['surfaceClass'] }).error).toMatch(/need "knot"/);
    expect(ask({ pd: fingeredA, bands: [[11, 1]], knot: p946, compareBands: [[1, 11]], compute: ['surfaceClass'] }).error).toMatch(/"compareWith", not "compareBands"/);
    expect(ask({ pd: fingeredA, bands: [[11, 1]], knot: p946, fingers: [10, 12], compute: ['surfaceClass'] }).error).toBe('there is no crossing 12 among 11 to be a finger\'s');
    expect(ask({ pd: fingeredA, bands: [[11, 1]], knot: p946, fingers: [1, 2], compute: ['surfaceClass'] }).error).toMatch(/fingers/);
  });

  it('refuses bands without a PD code, a class without bands, a bad band and a code over the crossing limit', () => {
    expect(ask({ braid: [1, 1, 1], bands: [[4, 6]], compute: ['bands'] }).error).toMatch(/name edges of the request's "pd" code/);
    expect(ask({ pd: trefoil, compute: ['surfaceClass'] }).error).toMatch(/need "bands"/);
    expect(ask({ pd: trefoil, bands: [[2, 5]], compute: ['bands'] }).error).toBe('band 1 would make the surface non-orientable: edges 2 and 5 run opposite ways around their common face');
    const big = ask({ braid: new Array(31).fill(1), compute: ['pd'] }).pd;
    expect(ask({ pd: big, bands: [[1, 3]], compute: ['surfaceClass'] }).error).toBe('the class is computed on the cube of resolutions, up to 14 crossings and by the local algorithm up to 30; this diagram has 31');
  });
});
