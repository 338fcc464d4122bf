// The chain map of a Reidemeister III move on Khovanov's cube, from R2 maps and isomorphisms:
// Bar-Natan, "Khovanov's homology for tangles and cobordisms", 2005, arXiv math/0410495,
// section 4.3. In the triangle, a and b are the crossings of the strand passing over at both
// corners, c that of the other two; C(D) is the cone of the c-edges alpha from the layer c = 0
// to the layer c = 1. In one layer (i1) a and b make an R2 bigon whose face is the triangle's;
// removing it leaves E (D without a, b and with c smoothed), and the same for D' leaves a
// renaming E' of E (iotaE). In the other layer (i2) D and D' are one diagram (iota, between the
// codes with c smoothed). f, g, h: the R2 maps up, down and the homotopy in layer i1 (primed
// for D'). Gaussian elimination (Bar-Natan, "Fast Khovanov homology computations", 2007, arXiv
// math/0606318, lemma 4.2) turns C(D) into the cone from layer i2 to E, or from E to layer i2,
// and the same for D'; the two cones' maps agree up to a sign sigma (Bar-Natan's two pictures),
// found where they are nonzero. The map, with iotaE carrying sigma:
// - i1 = 1: x in layer 0 goes to iota x + h' alpha' iota x, x in layer 1 to f' iotaE g x;
// - i1 = 0: x in layer 0 goes to f' iotaE g x + iota alpha h x, x in layer 1 to iota x.

import { edgeMap, resolve } from '../../khovanov/cube';
import { popcount } from '../../khovanov/cobordism';
import { Corner, faces } from '../moves/faces';
import { joinedCode } from '../moves/splice';
import { Crossing, PDCode } from '../pd';
import { cubeLabels, CubeGenerator, reidemeisterMaps, Term } from './reidemeister-maps';
import { renaming } from './renaming';

type GeneratorMap = (g: CubeGenerator) => Term[];

/** The R3 map C(D) -> C(D') for D' = applyR3(D, triangle) (moves/r3.ts: the triangle's crossings keep their indices). */
export function reidemeister3Map(before: PDCode, after: PDCode, triangle: readonly Corner[]): GeneratorMap {
  const k = triangle.findIndex((x, i) => (x.arrive + 1) % 2 === 1 && triangle[(i + 1) % 3].arrive % 2 === 1);
  if (k < 0) throw new RangeError('no strand passes over at two corners of the triangle');
  const [a, b, c] = [0, 1, 2].map((i) => triangle[(k + i) % 3].crossing);
  const pair = [a, b].sort((p, q) => p - q);
  const sides = [before, after].map((pd) => {
    const face = faces(pd).find((f) => f.length === 3 && [a, b, c].every((x) => f.some((y) => y.crossing === x)));
    if (!face) throw new RangeError('the codes do not share the triangle');
    const inner = face.map((y) => pd[y.crossing][y.arrive]);
    const i1 = reducible(pd, a, b, c, inner);
    const e = joined(pd, [a, b, c], [...through(pd[a]), ...through(pd[b]), ...smoothed(pd[c], i1)]).code;
    return { pd, e, i1, maps: reidemeisterMaps(e, pd, pair, { crossing: c, bit: i1, inner }), other: layer(pd, c, i1 === 1 ? 0 : 1) };
  });
  const [s, t] = sides;
  if (s.i1 !== t.i1) throw new RangeError('the triangle\'s reducible smoothing differs between the codes');
  const i1 = s.i1;
  // Anchored at a crossing outside the triangle, which both codes keep in place.
  const j = before.findIndex((_, i) => ![a, b, c].includes(i));
  if (j < 0) throw new RangeError('R3 on a diagram of three crossings: no crossing outside the triangle to anchor the isomorphisms');
  const then = (f: GeneratorMap, g: GeneratorMap): GeneratorMap => (x) => f(x).flatMap(([y, u]) => g(y).map(([z, v]) => [z, u * v] as const));
  const alpha = (pd: PDCode): GeneratorMap => {
    const labels = cubeLabels(pd);
    return ({ state, mask }) => {
      const top = state | (1 << c);
      const sign = popcount(state & ((1 << c) - 1)) % 2 ? -1 : 1;
      return edgeMap(resolve(pd, state, labels), resolve(pd, top, labels), pd[c], mask, (l) => labels.get(l)!).map((m) => [{ state: top, mask: m }, sign] as const);
    };
  };
  const jE = j - [a, b, c].filter((x) => x < j).length;
  const iotaE = renaming(s.e, t.e, [jE, jE]);
  const jC = j - (c < j ? 1 : 0);
  const iota = then(then(s.other.out, renaming(s.other.code, t.other.code, [jC, jC])), t.other.into);
  // The two cones' c-edge maps agree up to one sign (Bar-Natan's pictures fix no signs), read
  // off where they are nonzero; it goes with iotaE so that the cones are identified.
  const sigma = i1 === 1
    ? relativeSign(then(then(alpha(before), s.maps.down), iotaE), then(then(iota, alpha(after)), t.maps.down), generators(before, (x) => !((x >> c) & 1)))
    : relativeSign(then(then(s.maps.up, alpha(before)), iota), then(then(iotaE, t.maps.up), alpha(after)), generators(s.e, () => true));
  const reduced = then(then(then(s.maps.down, iotaE), t.maps.up), (g) => [[g, sigma]]);
  const correction = i1 === 1 ? then(then(iota, alpha(after)), t.maps.homotopy!) : then(then(s.maps.homotopy!, alpha(before)), iota);
  return (x) => {
    const layer = (x.state >> c) & 1;
    if (layer !== i1 && i1 === 1) return [...iota(x), ...correction(x)];
    if (layer !== i1) return iota(x);
    return i1 === 1 ? reduced(x) : [...reduced(x), ...correction(x)];
  };
}

function* generators(pd: PDCode, keep: (state: number) => boolean): Generator<CubeGenerator> {
  const labels = cubeLabels(pd);
  for (let state = 0; state < 1 << pd.length; state++) {
    if (!keep(state)) continue;
    const count = pd.length === 0 ? 0 : resolve(pd, state, labels).count;
    for (let mask = 0; mask < 1 << count; mask++) yield { state, mask };
  }
}

/** sigma with f = sigma g, read at the first generator where either is nonzero; throws when there is none. */
function relativeSign(f: GeneratorMap, g: GeneratorMap, domain: Iterable<CubeGenerator>): number {
  const sum = (terms: Term[]): Map<string, number> => {
    const out = new Map<string, number>();
    for (const [{ state, mask }, x] of terms) out.set(`${state}:${mask}`, (out.get(`${state}:${mask}`) ?? 0) + x);
    for (const [k, x] of out) if (x === 0) out.delete(k);
    return out;
  };
  for (const x of domain) {
    const [u, v] = [sum(f(x)), sum(g(x))];
    if (u.size === 0 && v.size === 0) continue;
    for (const sigma of [1, -1]) if (u.size === v.size && [...u].every(([k, y]) => v.get(k) === sigma * y)) return sigma;
    throw new RangeError('the cones\' c-edge maps of the two sides differ by more than a sign');
  }
  throw new RangeError('the cones\' c-edge maps vanish');
}

// The labels along each strand through crossing i (joined when i is taken out) and those
// the smoothing `bit` of it joins (a-b and c-d, or a-d and b-c).
const through = ([p, q, r, s]: Crossing): [number, number][] => [[p, r], [q, s]];
const smoothed = ([p, q, r, s]: Crossing, bit: 0 | 1): [number, number][] => [[p, bit === 0 ? q : s], [r, bit === 0 ? s : q]];

/**
 * The code without the crossings `remove`, the labels of each pair in `joins` made one, the
 * other crossings and their slots kept (its orientation may not be consistent; the cube does
 * not need one). Throws when a circle would be left with no crossing, which the cube leaves out.
 */
function joined(pd: PDCode, remove: readonly number[], joins: readonly [number, number][]): { code: PDCode; find: (l: number) => number } {
  const { pd: code, find } = joinedCode(pd, remove, joins);
  const present = new Set(code.flat());
  if (pd.flat().some((l) => !present.has(find(l)))) throw new RangeError('smoothing the triangle leaves a circle with no crossing');
  return { code, find };
}

/**
 * The layer c = bit of C(pd) and the cube of the code with c smoothed: the same resolutions,
 * circles matched through the joined labels; with c at 1 the crossings after it see one more
 * 1-smoothing, a sign.
 */
function layer(pd: PDCode, c: number, bit: 0 | 1): { code: PDCode; out: GeneratorMap; into: GeneratorMap } {
  const { code, find } = joined(pd, [c], smoothed(pd[c], bit));
  const [lp, lc] = [cubeLabels(pd), cubeLabels(code)];
  const low = (1 << c) - 1;
  const sign = (x: number): number => (bit && popcount(x >> (c + 1)) % 2 ? -1 : 1);
  // Circle of label l in pd's resolution x, and of its joined label in the code's resolution s.
  const circles = (x: number, s: number) => {
    const [rp, rc] = [resolve(pd, x, lp), resolve(code, s, lc)];
    return [...lp.keys()].map((l) => [rp.of[lp.get(l)!], rc.of[lc.get(find(l))!]] as const);
  };
  const carry = (pairs: readonly (readonly [number, number])[], mask: number): number => pairs.reduce((m, [u, v]) => ((mask >> u) & 1 ? m | (1 << v) : m), 0);
  const out: GeneratorMap = ({ state, mask }) => {
    const s = (state & low) | ((state >> (c + 1)) << c);
    return [[{ state: s, mask: carry(circles(state, s), mask) }, sign(state)]];
  };
  const into: GeneratorMap = ({ state, mask }) => {
    const x = (state & low) | (bit << c) | ((state >> c) << (c + 1));
    return [[{ state: x, mask: carry(circles(x, state).map(([u, v]) => [v, u] as const), mask) }, sign(x)]];
  };
  return { code, out, into };
}

/** The smoothing of c in which some resolution of a and b closes the triangle into a circle. */
function reducible(pd: PDCode, a: number, b: number, c: number, inner: readonly number[]): 0 | 1 {
  const labels = cubeLabels(pd);
  for (const bit of [0, 1] as const) {
    for (const t of [0, 1, 2, 3]) {
      const st = resolve(pd, (bit << c) | ((t & 1) << a) | ((t >> 1) << b), labels);
      const o = st.of[labels.get(inner[0])!];
      if ([...labels.keys()].every((l) => inner.includes(l) === (st.of[labels.get(l)!] === o))) return bit;
    }
  }
  throw new RangeError('the triangle closes into a circle in no resolution');
}
