// The class of a band surface over F2 through Bar-Natan's local algorithm ("Fast Khovanov
// homology computations", 2007, arXiv math/0606318) instead of the cube of resolutions.
//
// Every edge a band touches is cut open at its head, so the crossings form a tangle T whose open
// ends are the cut edges' tails and heads, and stage k of the band movie (saddle.ts) is T closed
// by a crossingless matching P_k of those ends: only heads move between stages. The engine
// simplifies T to T' by delooping and Gaussian elimination, a homotopy equivalence f: T -> T'
// (math/0606318, Lemmas 4.1, 4.2); closing commutes with it (Bar-Natan, math/0410495, Sect. 5),
// so H(T' P_k) = Kh(stage k). A band read backwards is the saddle P_k -> P_{k-1} beside the
// identity of T: (f x 1)(1 x S) = (1 x S)(f x 1), so on T' it is the same saddle, a merge or a
// split on every closed object. As in class.ts, Kh^{0,c}(D'; F2) = F2 for the c-component unlink
// D', so any cycle of T' P_last at (0, c) that is not a boundary stands for 1 x ... x 1; the
// saddles carry it to the class in H^{0,c-b}(T' P_0) = Kh^{0,c-b}(K; F2).
//
// Basis of the answer: the generators of T' P_0 at (h, q) = (0, c - b), in the engine's order
// (tensor.ts: by object of T', then by x-mask of its closed loops), that are not pivots of the
// boundaries' echelon form. T' depends on the code and the cut edges only, so classes computed
// with the same cut (localClasses) are compared by their normal forms. class-local-z.ts runs the
// same movie over Z.

import { Matching, cycles } from '../../khovanov/cobordism';
import { TangleComplex } from '../../khovanov/complex';
import { edgeMap } from '../../khovanov/cube';
import { crossingOrder } from '../../khovanov/order';
import { addInOrder } from '../../khovanov/parts';
import { tensor } from '../../khovanov/tensor';
import { F2Echelon, F2Vector, kernel, parity } from '../../linalg/f2';
import { primeField, Ring } from '../../linalg/ring';
import { orient, PDCode, withLabelAt } from '../pd';
import { cycleCount, Stage } from './saddle';
import { Saddle } from './types';

const F2 = primeField(2);

/** A class in the local basis: its normal form's generator numbers, and dim C^{0,q}/B^{0,q} of T' P_0. */
export interface LocalClassVector {
  support: number[];
  basisSize: number;
}

export interface Cut<T> {
  /** T': the crossings with every cut edge open, simplified. */
  readonly tangle: TangleComplex<T>;
  /** The fresh label at the head end of each cut edge. */
  readonly headEnd: ReadonlyMap<number, number>;
  readonly nMinus: number;
}

/** The crossings of `pd` with the edges `cut` opened at their heads, through the local algorithm. */
function cutTangle<T>(ring: Ring<T>, pd: PDCode, cut: readonly number[]): Cut<T> {
  const o = orient(pd);
  const fresh = Math.max(...pd.flat()) + 1;
  const headEnd = new Map(cut.map((l, k) => [l, fresh + k]));
  let code = pd;
  for (const [l, end] of headEnd) {
    const { crossing, position } = o.head.get(l)!;
    code = code.map((x, c) => (c === crossing ? withLabelAt(x, position, end) : x));
  }
  const empty = new TangleComplex(ring, []);
  empty.addObject({ mat: empty.matchingId([]), shift: 0, height: 0 });
  return { tangle: addInOrder(empty, code, crossingOrder(pd), () => {}), headEnd, nMinus: o.signs.filter((s) => s < 0).length };
}

/** The cut of every edge any of the movies' bands touches. */
export function cutFor<T>(ring: Ring<T>, pd: PDCode, movies: readonly { saddles: Saddle[] }[]): Cut<T> {
  return cutTangle(ring, pd, [...new Set(movies.flatMap((m) => m.saddles.flatMap(({ a, b }) => [a, b])))].sort((x, y) => x - y));
}

/** Stage k's closing P_k on the tangle's ends: each cut edge's tail end to the head end now at its head. */
function closing<T>(cut: Cut<T>, start: Stage, stage: Stage): Matching {
  const ends = cut.tangle.boundary;
  const position = new Map(ends.map((l, k) => [l, k]));
  const partner = new Array<number>(ends.length).fill(-1);
  for (const l of cut.headEnd.keys()) {
    const h = stage.heads.get(l)!;
    // The head slot belongs, in the start's code, to the edge whose head end it now is.
    const end = cut.headEnd.get(start.pd[h.crossing][h.position]);
    if (end === undefined) throw new Error('internal: a band moved the head of an edge that was not cut');
    const [u, v] = [position.get(l)!, position.get(end)!];
    partner[u] = v;
    partner[v] = u;
  }
  return partner;
}

/** T' closed by P: a complex of free modules in the delooped basis, and where each object of T' starts in it. */
export interface Closed<T> {
  readonly cx: TangleComplex<T>;
  readonly p: Matching;
  /** The closed generator of object o of T' with x-mask 0; -1 for dead objects. */
  readonly first: number[];
  /** The object of T' each closed generator comes from. */
  readonly owner: number[];
}

/** T' closed by the closing of `stage`, a stage of the movie that starts at `start`. */
export function closeAt<T>(cut: Cut<T>, start: Stage, stage: Stage): Closed<T> {
  const { tangle } = cut;
  const p = closing(cut, start, stage);
  const cap = new TangleComplex(tangle.ring, tangle.boundary);
  cap.addObject({ mat: cap.matchingId(p), shift: 0, height: 0 });
  const cx = tensor(tangle, cap);
  // tensor.ts numbers the new objects by object of the first factor, then by x-mask of the
  // closed loops (numbered by their smallest end, as cycles() numbers them); checked here.
  const first: number[] = [];
  const owner: number[] = [];
  let next = 0;
  tangle.objs.forEach((o, k) => {
    if (!tangle.alive[k]) return void first.push(-1);
    first.push(next);
    const loops = cycles(tangle.matchings[o.mat], p).count;
    const head = cx.objs[next];
    if (head.height !== o.height || head.shift !== o.shift + loops) throw new Error('internal: the closed complex is not laid out as tensor.ts lays it');
    next += 1 << loops;
    while (owner.length < next) owner.push(k);
  });
  if (next !== cx.objs.length) throw new Error('internal: the closed complex is not laid out as tensor.ts lays it');
  return { cx, p, first, owner };
}

/** The closed generators at height r and shift s, ascending. */
export function levelOf<T>(c: Closed<T>, r: number, s: number): number[] {
  const out: number[] = [];
  c.cx.objs.forEach((o, k) => {
    if (o.height === r && o.shift === s) out.push(k);
  });
  return out;
}

/** d of generator g as positions in `to` (a level's generators) with their coefficients (closed objects: the undotted term). */
export function imagesWith<T>(c: Closed<T>, g: number, to: Map<number, number>): [number, T][] {
  const out: [number, T][] = [];
  c.cx.out[g].forEach((m, t) => {
    const j = to.get(t);
    const x = m.get(0);
    if (j !== undefined && x !== undefined) out.push([j, x]);
  });
  return out;
}

export const positions = (level: number[]): Map<number, number> => new Map(level.map((g, i) => [g, i]));

/**
 * The band {a, b} read backwards on generator at[i] of T' P_k (`from`), into T' P_{k-1} at
 * shift one lower (`to`, its level `toLevel`): on every object the merge or split of the loops
 * through the two cut edges' tail ends. Positions in toLevel, each with coefficient 1.
 */
export function saddleImages<T>(cut: Cut<T>, from: Closed<T>, to: Closed<T>, at: number[], toLevel: number[], { a, b }: Saddle, i: number): number[] {
  const ends = cut.tangle.boundary;
  const [pa, pb] = [ends.indexOf(a), ends.indexOf(b)];
  const toPos = positions(toLevel);
  const o = from.owner[at[i]];
  const mask = at[i] - from.first[o];
  const m = cut.tangle.matchings[cut.tangle.objs[o].mat];
  const [before, after] = [cycles(m, from.p), cycles(m, to.p)];
  if (Math.abs(before.count - after.count) !== 1) throw new Error('internal: a band that is neither a merge nor a split on a resolution');
  return edgeMap(before, after, [pa, pb, pb], mask, (x) => x).map((image) => toPos.get(to.first[o] + image)!);
}

/** The generic part of a movie read backwards: where it starts and how a vector crosses a band. */
export interface Carry<T, V> {
  /** A cycle of T' P_last at (r, shift) standing for 1 x ... x 1, given the level, its d and its boundaries' rows. */
  start(at: number[], d: (i: number) => [number, T][], below: [number, T][][], c: number): V;
  /** The image of v, given each generator's images (coefficient 1). */
  cross(v: V, images: (i: number) => number[]): V;
}

/**
 * The movie `stages`/`saddles` read backwards on T' closed per stage: the unlink's class at
 * T' P_last to a cycle of T' P_0 at (0, q), with that level, its d and its boundaries' rows.
 */
export function carryBack<T, V>(cut: Cut<T>, k0: Closed<T>, stages: Stage[], saddles: Saddle[], carry: Carry<T, V>): { v: V; q: number; at: number[]; d: (i: number) => [number, T][]; below: [number, T][][] } {
  const r = cut.nMinus;
  const last = stages.length - 1;
  const c = cycleCount(stages[last]);
  // Shifts before the global q-shift n_+ - 2 n_-, which every stage shares.
  const nPlus = stages[0].pd.length - r;
  const shiftOf = (q: number): number => q - nPlus + 2 * r;
  const around = (closed: Closed<T>, q: number) => {
    const at = levelOf(closed, r, shiftOf(q));
    const above = positions(levelOf(closed, r + 1, shiftOf(q)));
    const here = positions(at);
    const below = levelOf(closed, r - 1, shiftOf(q)).map((g) => imagesWith(closed, g, here));
    return { at, d: (i: number) => imagesWith(closed, at[i], above), below };
  };
  let closed = last === 0 ? k0 : closeAt(cut, stages[0], stages[last]);
  const first = around(closed, c);
  let at = first.at;
  let v = carry.start(first.at, first.d, first.below, c);
  for (let k = last; k > 0; k--) {
    const to = k === 1 ? k0 : closeAt(cut, stages[0], stages[k - 1]);
    const toLevel = levelOf(to, r, shiftOf(c - (last - k) - 1));
    const [from, fromLevel] = [closed, at];
    v = carry.cross(v, (i) => saddleImages(cut, from, to, fromLevel, toLevel, saddles[k - 1], i));
    [closed, at] = [to, toLevel];
  }
  const q = c - last;
  return { v, q, ...around(closed, q) };
}

/**
 * The classes of several band presentations of one code, all with the same cut (the edges any
 * of them touches), so their normal forms are comparable. `movies[j]` is presentation j's stages
 * (bandStages) and saddles; each must end at a certified unlink.
 */
export function localClasses(pd: PDCode, movies: readonly { stages: Stage[]; saddles: Saddle[] }[]): LocalClassVector[] {
  const cut = cutFor(F2, pd, movies);
  const start = movies[0].stages[0];
  const k0 = closeAt(cut, start, start);
  return movies.map(({ stages, saddles }) => localClass(cut, k0, stages, saddles));
}

const echelonOf = (rows: [number, number][][]): F2Echelon => {
  const e = new F2Echelon();
  for (const row of rows) e.add(parity(row.map(([j]) => j)));
  return e;
};

const f2Carry: Carry<number, F2Vector> = {
  start(at, d, below, c) {
    const b0 = echelonOf(below);
    const cyclesAt = [...kernel(at.length, (i) => parity(d(i).map(([j]) => j)))];
    // Kh^{0,c} of the c-component unlink is F2: one cycle class beyond the boundaries.
    if (cyclesAt.length - b0.rank !== 1) throw new Error(`Kh^{0,${c}} of the after-bands diagram has dimension ${cyclesAt.length - b0.rank}, not 1: it is not the ${c}-component unlink`);
    return cyclesAt.map((k) => b0.reduce(k)).find((k) => k.length > 0)!;
  },
  cross: (v, images) => parity(v.flatMap(images)),
};

function localClass(cut: Cut<number>, k0: Closed<number>, stages: Stage[], saddles: Saddle[]): LocalClassVector {
  const { v, at, d, below } = carryBack(cut, k0, stages, saddles, f2Carry);
  // The self-check: the image is a cycle of T' P_0 (the saddles are chain maps).
  if (parity(v.flatMap((i) => d(i).map(([j]) => j))).length > 0) throw new Error('internal: the image of the unlink class under the bands is not a cycle');
  const b = echelonOf(below);
  return { support: b.reduce(v), basisSize: at.length - b.rank };
}
