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
// with the same cut (localClasses) are compared by their normal forms.

import { Matching, cycles } from '../../khovanov/cobordism';
import { TangleComplex } from '../../khovanov/complex';
import { edgeMap } from '../../khovanov/cube';
import { crossingOrder } from '../../khovanov/order';
import { addInOrder } from '../../khovanov/parts';
import { tensor } from '../../khovanov/tensor';
import { F2Echelon, F2Vector, kernel, parity } from '../../linalg/f2';
import { primeField } from '../../linalg/ring';
import { orient, PDCode, withLabelAt } from '../pd';
import { cycleCount, Stage } from './saddle';
import { Saddle } from './types';

const F2 = primeField(2);

/** A class in the local basis: its normal form's generator numbers, and dim C^{0,q}/B^{0,q} of T' P_0. */
export interface LocalClassVector {
  support: number[];
  basisSize: number;
}

interface Cut {
  /** T': the crossings with every cut edge open, simplified. */
  readonly tangle: TangleComplex<number>;
  /** The fresh label at the head end of each cut edge. */
  readonly headEnd: ReadonlyMap<number, number>;
  readonly nMinus: number;
}

/** The crossings of `pd` with the edges `cut` opened at their heads, through the local algorithm. */
function cutTangle(pd: PDCode, cut: readonly number[]): Cut {
  const o = orient(pd);
  const fresh = Math.max(...pd.flat()) + 1;
  const headEnd = new Map(cut.map((l, k) => [l, fresh + k]));
  let code = pd;
  for (const [l, end] of headEnd) {
    const { crossing, position } = o.head.get(l)!;
    code = code.map((x, c) => (c === crossing ? withLabelAt(x, position, end) : x));
  }
  const empty = new TangleComplex(F2, []);
  empty.addObject({ mat: empty.matchingId([]), shift: 0, height: 0 });
  return { tangle: addInOrder(empty, code, crossingOrder(pd), () => {}), headEnd, nMinus: o.signs.filter((s) => s < 0).length };
}

/** Stage k's closing P_k on the tangle's ends: each cut edge's tail end to the head end now at its head. */
function closing(cut: Cut, start: Stage, stage: Stage): Matching {
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

/** T' closed by P: a complex of F2 vector spaces in the delooped basis, and where each object of T' starts in it. */
interface Closed {
  readonly cx: TangleComplex<number>;
  readonly p: Matching;
  /** The closed generator of object o of T' with x-mask 0; -1 for dead objects. */
  readonly first: number[];
  /** The object of T' each closed generator comes from. */
  readonly owner: number[];
}

function close(cut: Cut, p: Matching): Closed {
  const { tangle } = cut;
  const cap = new TangleComplex(F2, tangle.boundary);
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
function levelOf(c: Closed, r: number, s: number): number[] {
  const out: number[] = [];
  c.cx.objs.forEach((o, k) => {
    if (o.height === r && o.shift === s) out.push(k);
  });
  return out;
}

/** d of generator g as positions in `to` (a level's generators); every entry is 1 over F2. */
function images(c: Closed, g: number, to: Map<number, number>): number[] {
  return parity(c.cx.out[g].keys().map((t) => to.get(t)).filter((j): j is number => j !== undefined));
}

const positions = (level: number[]): Map<number, number> => new Map(level.map((g, i) => [g, i]));

/** The boundaries at (r, s): the images of the level below. */
function boundaries(c: Closed, r: number, s: number, at: number[]): F2Echelon {
  const echelon = new F2Echelon();
  const to = positions(at);
  for (const g of levelOf(c, r - 1, s)) echelon.add(images(c, g, to));
  return echelon;
}

/**
 * The band {a, b} read backwards, from T' P_k (`from`, a vector over its level `at`) to
 * T' P_{k-1} at shift one lower: on every object the merge or split of the loops through the
 * two cut edges' tail ends.
 */
function saddleBack(cut: Cut, from: Closed, to: Closed, at: number[], toLevel: number[], { a, b }: Saddle, v: F2Vector): number[] {
  const ends = cut.tangle.boundary;
  const [pa, pb] = [ends.indexOf(a), ends.indexOf(b)];
  const toPos = positions(toLevel);
  const out: number[] = [];
  for (const i of v) {
    const o = from.owner[at[i]];
    const mask = at[i] - from.first[o];
    const m = cut.tangle.matchings[cut.tangle.objs[o].mat];
    const [before, after] = [cycles(m, from.p), cycles(m, to.p)];
    if (Math.abs(before.count - after.count) !== 1) throw new Error('internal: a band that is neither a merge nor a split on a resolution');
    for (const image of edgeMap(before, after, [pa, pb, pb], mask, (x) => x)) out.push(toPos.get(to.first[o] + image)!);
  }
  return parity(out);
}

/**
 * The classes of several band presentations of one code, all with the same cut (the edges any
 * of them touches), so their normal forms are comparable. `movies[j]` is presentation j's stages
 * (bandStages) and saddles; each must end at a certified unlink.
 */
export function localClasses(pd: PDCode, movies: readonly { stages: Stage[]; saddles: Saddle[] }[]): LocalClassVector[] {
  const cut = cutTangle(pd, [...new Set(movies.flatMap((m) => m.saddles.flatMap(({ a, b }) => [a, b])))].sort((x, y) => x - y));
  const start = movies[0].stages[0];
  const k0 = close(cut, closing(cut, start, start));
  return movies.map(({ stages, saddles }) => localClass(cut, k0, stages, saddles));
}

function localClass(cut: Cut, k0: Closed, stages: Stage[], saddles: Saddle[]): LocalClassVector {
  const r = cut.nMinus;
  const last = stages.length - 1;
  const c = cycleCount(stages[last]);
  // Shifts before the global q-shift n_+ - 2 n_-, which every stage shares.
  const nPlus = stages[0].pd.length - r;
  const shiftOf = (q: number): number => q - nPlus + 2 * r;
  let closed = last === 0 ? k0 : close(cut, closing(cut, stages[0], stages[last]));
  let at = levelOf(closed, r, shiftOf(c));
  const above = positions(levelOf(closed, r + 1, shiftOf(c)));
  const d0 = (i: number): number[] => images(closed, at[i], above);
  const b0 = boundaries(closed, r, shiftOf(c), at);
  const cyclesAt = [...kernel(at.length, d0)];
  // Kh^{0,c} of the c-component unlink is F2: one cycle class beyond the boundaries.
  if (cyclesAt.length - b0.rank !== 1) throw new Error(`Kh^{0,${c}} of the after-bands diagram has dimension ${cyclesAt.length - b0.rank}, not 1: it is not the ${c}-component unlink`);
  let v: F2Vector = cyclesAt.map((k) => b0.reduce(k)).find((k) => k.length > 0)!;
  for (let k = last; k > 0; k--) {
    const to = k === 1 ? k0 : close(cut, closing(cut, stages[0], stages[k - 1]));
    const toLevel = levelOf(to, r, shiftOf(c - (last - k) - 1));
    v = saddleBack(cut, closed, to, at, toLevel, saddles[k - 1], v);
    [closed, at] = [to, toLevel];
  }
  const q = c - last;
  // The self-check: the image is a cycle of T' P_0 (the saddles are chain maps).
  const up = positions(levelOf(closed, r + 1, shiftOf(q)));
  if (parity(v.flatMap((i) => images(closed, at[i], up))).length > 0) throw new Error('internal: the image of the unlink class under the bands is not a cycle');
  const b = boundaries(closed, r, shiftOf(q), at);
  return { support: b.reduce(v), basisSize: at.length - b.rank };
}
