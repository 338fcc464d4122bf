// Chain maps of Reidemeister I and II moves on Khovanov's cube complex over Z, and by reduction
// mod 2 over F2: Bar-Natan, "Khovanov's homology for tangles and cobordisms", 2005, arXiv
// math/0410495, section 4.3 (the maps of the Gaussian eliminations that prove invariance).
//
// The pair is a diagram D ("small") and D' ("big"), D' being D with the move's crossings added;
// D's crossings are D''s other crossings in the same order, at the same slots (the moves of
// shared/knot/moves keep both), so a circle of D is the circle of D' through the same slots.
// A generator is a resolution and the mask of its x-circles, as in shared/khovanov/cube.ts.
//
// The formulas are written with the move's crossings last; moving them there reorders the
// wedge of each resolution's 1-smoothings, a sign eps (pairs of an old 1-smoothing after a
// moved one). With O the small circle the move makes in some resolutions and X_e the product
// with x on the circle of the strand beside it:
// - R1, O in the 0-smoothing (a positive kink): up(v) = v.x_O - (X_e v).1_O; down keeps the
//   0-smoothing terms with x on O, dropping O.
// - R1, O in the 1-smoothing (a negative kink): up(v) = v.1_O in the 1-smoothing; down sends
//   w.1_O to w and w.x_O to -X_e w, and the 0-smoothing to 0.
// - R2: of the four resolutions of the two crossings, 00 and 11 are the turnback T, one mixed
//   resolution is D itself and the other T with O. up(v) = v + s (delta v).1_O, delta the
//   saddle from D to 11 and s the sign that cancels its image; down is the identity on D and
//   sends w.x_O to -beta(w), beta the saddle from 00 (the same T) to D, and w.1_O to 0.
// In each case down(up(v)) = v; up is a homotopy equivalence, so down is its homotopy inverse,
// and for R2 the inverses of the two cancelled isomorphisms give h with up down - 1 = dh + hd.
// R3 (reidemeister3.ts) uses R2 in one layer of a bigger cube, a further crossing smoothed.

import { popcount } from '../../khovanov/cobordism';
import { edgeMap, resolve, State } from '../../khovanov/cube';
import { faces } from '../moves/faces';
import { orient, PDCode } from '../pd';

export interface CubeGenerator {
  /** Bit k: crossing k takes its 1-smoothing. */
  readonly state: number;
  /** Bit c: circle c of resolve(pd, state, cubeLabels(pd)) carries x. */
  readonly mask: number;
}

export type Term = readonly [CubeGenerator, number];

export interface ReidemeisterMaps {
  /** C(D) -> C(D'): the move made. */
  readonly up: (g: CubeGenerator) => Term[];
  /** C(D') -> C(D): the move undone. */
  readonly down: (g: CubeGenerator) => Term[];
  /** R2 only: h on C(D') of degree (-1, 0) with up down - 1 = d h + h d (the eliminations' inverses). */
  readonly homotopy?: (g: CubeGenerator) => Term[];
}

/**
 * An R2 move seen in one layer of D''s cube: a crossing of D', not of D, kept at one smoothing
 * (D is D' with it smoothed), with which the two moved crossings bound a bigon whose face has
 * the labels `inner` (an R3 triangle with its third crossing smoothed). The maps then hold on
 * that layer only, and in the signs the crossing counts among D''s old ones.
 */
export interface Layer {
  readonly crossing: number;
  readonly bit: 0 | 1;
  readonly inner: readonly number[];
}

/** The label numbering of a code's cube: labels in increasing order. */
export const cubeLabels = (pd: PDCode): Map<number, number> => new Map([...new Set(pd.flat())].sort((p, q) => p - q).map((l, k) => [l, k]));

/**
 * The maps of the move that adds the crossings `moved` of `big` (one: R1, two: R2) to `small`.
 * A move may join crossingless circles of D to the code (components of D' that only pass its
 * crossings, absent from `small`): up then takes them to carry 1 (a birth, then the move), and
 * down, which would need them, throws.
 */
export function reidemeisterMaps(small: PDCode, big: PDCode, moved: readonly number[], layer?: Layer): ReidemeisterMaps {
  if (moved.length !== 1 && moved.length !== 2) throw new RangeError('an R1 move adds one crossing and an R2 move two');
  if (big.length !== small.length + moved.length + (layer ? 1 : 0)) throw new RangeError(`a move from ${small.length} crossings adding ${moved.length} does not give ${big.length}`);
  // Old: every crossing of D' but the moved ones; kept: those that are D's, in D's order.
  const old = big.map((_, i) => i).filter((i) => !moved.includes(i));
  const kept = old.filter((i) => i !== layer?.crossing);
  const [sLabels, bLabels] = [cubeLabels(small), cubeLabels(big)];
  const freed = orient(big).components.filter((c) => c.every((l) => big.every((x, i) => moved.includes(i) || !x.includes(l)))).length;
  const inner = layer?.inner ?? innerLabels(big, moved);
  const bigState = (s: number, t: number): number => {
    let x = layer ? layer.bit << layer.crossing : 0;
    kept.forEach((b, j) => (x |= ((s >> j) & 1) << b));
    moved.forEach((b, i) => (x |= ((t >> i) & 1) << b));
    return x;
  };
  const parts = (x: number): { s: number; t: number } => ({
    s: kept.reduce((s, b, j) => s | (((x >> b) & 1) << j), 0),
    t: moved.reduce((t, b, i) => t | (((x >> b) & 1) << i), 0),
  });
  // Formulas order D''s crossings as D's, then the layer's crossing, then the moved ones.
  const eps = (x: number): number => {
    let pairs = 0;
    for (const k of moved) if ((x >> k) & 1) pairs += old.filter((j) => j > k && (x >> j) & 1).length;
    if (layer && (x >> layer.crossing) & 1) pairs += kept.filter((j) => j > layer.crossing && (x >> j) & 1).length;
    return pairs % 2 ? -1 : 1;
  };
  const memo = new Map<number, State>();
  const bigAt = (x: number): State => memo.get(x) ?? memo.set(x, resolve(big, x, bLabels)).get(x)!;
  const smallAt = (s: number): State => resolve(small, s, sLabels);

  // Circles matched through pairs of labels on them; a circle not reached (O) is dropped.
  const carry = (from: State, fromAt: Map<number, number>, to: State, toAt: Map<number, number>, pairs: readonly (readonly [number, number])[], mask: number): number => {
    let out = 0;
    for (const [p, q] of pairs) if ((mask >> from.of[fromAt.get(p)!]) & 1) out |= 1 << to.of[toAt.get(q)!];
    return out;
  };
  const slots = small.flatMap((x, j) => x.map((l, p) => [l, big[kept[j]][p]] as const));
  const back = slots.map(([p, q]) => [q, p] as const);
  // The tangle's ends keep their circles through all resolutions of the moved crossings but O.
  const outer = [...bLabels.keys()].filter((l) => !inner.includes(l)).map((l) => [l, l] as const);
  const lift = (s: number, mask: number, t: number): number => carry(smallAt(s), sLabels, bigAt(bigState(s, t)), bLabels, slots, mask);
  const drop = (x: number, mask: number): number => carry(bigAt(x), bLabels, smallAt(parts(x).s), sLabels, back, mask);
  const across = (x: number, y: number, mask: number): number => carry(bigAt(x), bLabels, bigAt(y), bLabels, outer, mask);
  const bit = (x: number, label: number): number => 1 << bigAt(x).of[bLabels.get(label)!];
  // The resolution of the moved crossings with O: the circle of the inner labels and no other.
  const circleO = (t: number): boolean => {
    const st = bigAt(bigState(0, t));
    const o = st.of[bLabels.get(inner[0])!];
    return [...bLabels.keys()].every((l) => inner.includes(l) === (st.of[bLabels.get(l)!] === o));
  };
  const undo = (down: (g: CubeGenerator) => Term[]) => (g: CubeGenerator): Term[] => {
    if (freed > 0) throw new RangeError(`undoing this move frees ${freed} crossingless circle${freed > 1 ? 's' : ''}, which the cube leaves out`);
    return down(g);
  };
  const term = (x: number, mask: number, c: number): Term => [{ state: x, mask }, c * eps(x)];
  const smallTerm = (x: number, mask: number, c: number): Term => [{ state: parts(x).s, mask: drop(x, mask) }, c * eps(x)];

  if (moved.length === 1) {
    const tO = circleO(0) ? 0 : 1;
    const e = big[moved[0]].find((l) => l !== inner[0])!;
    const xe = (x: number, mask: number): number | undefined => (mask & bit(x, e) ? undefined : mask | bit(x, e));
    const up = ({ state: s, mask }: CubeGenerator): Term[] => {
      const x = bigState(s, tO);
      const v = lift(s, mask, tO);
      if (tO === 1) return [term(x, v, 1)];
      const marked = xe(x, v);
      return [term(x, v | bit(x, inner[0]), 1), ...(marked === undefined ? [] : [term(x, marked, -1)])];
    };
    const down = ({ state: x, mask }: CubeGenerator): Term[] => {
      if (parts(x).t !== tO) return [];
      const o = mask & bit(x, inner[0]);
      if (tO === 0) return o ? [smallTerm(x, mask, 1)] : [];
      if (!o) return [smallTerm(x, mask, 1)];
      const marked = xe(x, mask);
      return marked === undefined ? [] : [smallTerm(x, marked, -1)];
    };
    return { up, down: undo(down) };
  }

  const tO = circleO(1) ? 1 : 2;
  const tD = 3 - tO;
  // The move bit flipped from 00 to tO (and from tD to 11), and the other.
  const [iO, iD] = tO === 1 ? [0, 1] : [1, 0];
  const sign = (t: number, i: number): number => (popcount(t & ((1 << i) - 1)) % 2 ? -1 : 1);
  const s = -sign(tD, iO) * sign(tO, iD);
  const up = ({ state, mask }: CubeGenerator): Term[] => {
    const x = bigState(state, tD);
    const v = lift(state, mask, tD);
    const [top, withO] = [bigState(state, 3), bigState(state, tO)];
    const delta = edgeMap(bigAt(x), bigAt(top), big[moved[iO]], v, (l) => bLabels.get(l)!);
    return [term(x, v, 1), ...delta.map((m) => term(withO, across(top, withO, m), s))];
  };
  const down = ({ state: x, mask }: CubeGenerator): Term[] => {
    const { s: state, t } = parts(x);
    if (t === tD) return [smallTerm(x, mask, 1)];
    if (t !== tO || !(mask & bit(x, inner[0]))) return [];
    const [bottom, atD] = [bigState(state, 0), bigState(state, tD)];
    const beta = edgeMap(bigAt(bottom), bigAt(atD), big[moved[iD]], across(x, bottom, mask), (l) => bLabels.get(l)!);
    // eps of the input: down undoes the reordering there.
    return beta.map((m) => [{ state, mask: drop(atD, m) }, -eps(x)] as const);
  };
  // Backwards along the two cancelled isomorphisms: 11 to the 1_O part of tO, the x_O part of tO to 00.
  const homotopy = ({ state: x, mask }: CubeGenerator): Term[] => {
    const { s: state, t } = parts(x);
    const tau = old.filter((j) => (x >> j) & 1).length % 2 ? -1 : 1;
    if (t === 3) {
      const to = bigState(state, tO);
      return [[{ state: to, mask: across(x, to, mask) }, -sign(tO, iD) * tau * eps(x) * eps(to)]];
    }
    if (t !== tO || !(mask & bit(x, inner[0]))) return [];
    const to = bigState(state, 0);
    return [[{ state: to, mask: across(x, to, mask) }, -tau * eps(x) * eps(to)]];
  };
  return { up, down: undo(down), homotopy };
}

/** R1: the label of the kink's loop; R2: the two labels of the bigon's face. */
function innerLabels(big: PDCode, moved: readonly number[]): number[] {
  if (moved.length === 1) {
    const x = big[moved[0]];
    const p = x.findIndex((l, q) => l === x[(q + 1) % 4]);
    if (p < 0) throw new RangeError(`crossing ${moved[0] + 1} is not a kink`);
    return [x[p]];
  }
  const face = faces(big).find((f) => f.length === 2 && f.every((c) => moved.includes(c.crossing)) && f[0].crossing !== f[1].crossing);
  if (!face) throw new RangeError(`crossings ${moved[0] + 1} and ${moved[1] + 1} bound no bigon`);
  return face.map((c) => big[c.crossing][c.arrive]);
}
