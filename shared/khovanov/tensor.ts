// Bar-Natan's local algorithm (math/0606318, Sect. 5): the planar composition of two tangle
// complexes glued along their common ends (objects are pairs, d(a b) = da b + (-1)^h(a) a db),
// followed by delooping (a closed circle is isomorphic to the empty set shifted by +1 and -1).
// Adding one crossing is the composition with the crossing's complex, 0-smoothing ->
// 1-smoothing{1} by a saddle.

import { Crossing } from '../knot/pd';
import { Ring } from '../linalg/ring';
import { cycles, discDots, glue, genus, Matching, Piece, popcount, Theory } from './cobordism';
import { coefficients } from './coefficients';
import { Row, TangleComplex } from './complex';

/** 0-smoothing joins (a,b)(c,d), 1-smoothing joins (a,d)(b,c) (docs/conventions.md). */
const SMOOTHING: readonly Matching[] = [
  [1, 0, 3, 2],
  [3, 2, 1, 0],
];

/** The complex of one crossing x: its 0-smoothing, its 1-smoothing{1}, the saddle between. */
export function crossingComplex<T>(x: Crossing, ring: Ring<T>, theory: Theory): TangleComplex<T> {
  const cx = new TangleComplex(ring, x, theory);
  const zero = cx.addObject({ mat: cx.matchingId(SMOOTHING[0]), shift: 0, height: 0 });
  const one = cx.addObject({ mat: cx.matchingId(SMOOTHING[1]), shift: 1, height: 1 });
  cx.addTerm(zero, one, 0, ring.one);
  return cx;
}

/** The complex of the tangle with crossing x added. */
export function addCrossing<T>(old: TangleComplex<T>, x: Crossing): TangleComplex<T> {
  return tensor(old, crossingComplex(x, old.ring, old.theory));
}

interface Side {
  /** The new matching's id in the new complex. */
  readonly mat: number;
  /** Loop of every slot (-1 for slots on arcs to the boundary), loops numbered by first slot. */
  readonly loopOf: number[];
  readonly loops: number;
}

interface Gluing {
  readonly pieces: Piece[];
  /** Component of every disc of the morphism that moves (the other factor's is an identity). */
  readonly compPQ: number[];
  /** Component of every bottom loop and every top loop. */
  readonly bottomLoops: number[];
  readonly topLoops: number[];
  /**
   * Reduced surfaces already met, by (disc dots, bottom summands, top summands); an array, as
   * the keys are small and dense (a Map lookup was the merge step's hottest line).
   */
  readonly memo: ([number, number][] | undefined)[];
}

/**
 * How the first factor's boundary slots 0..n-1 and the second's slots n.. are wired: slots with
 * the same label are glued (also two of one crossing, a kink), the others are the new boundary.
 */
interface Wiring {
  readonly n: number;
  readonly labelOf: number[];
  /** The slot glued to each slot, or -1 for a slot on the new boundary. */
  readonly partner: number[];
  readonly freeSlots: number[];
  /** Position of each free slot on the new boundary (-1 for glued slots). */
  readonly newPos: number[];
}

function wiring(first: readonly number[], second: readonly number[]): Wiring {
  const labelOf = [...first, ...second];
  const slotsOf = new Map<number, number[]>();
  labelOf.forEach((l, slot) => slotsOf.set(l, [...(slotsOf.get(l) ?? []), slot]));
  const partner = labelOf.map((l, slot) => {
    const s = slotsOf.get(l)!;
    return s.length === 2 ? (s[0] === slot ? s[1] : s[0]) : -1;
  });
  const freeSlots = labelOf.map((_, slot) => slot).filter((slot) => partner[slot] < 0);
  const newPos = new Array<number>(labelOf.length).fill(-1);
  freeSlots.forEach((slot, k) => (newPos[slot] = k));
  return { n: first.length, labelOf, partner, freeSlots, newPos };
}

/** Matching p of the first factor beside matching q of the second: the new matching and its closed loops. */
function smoothedSide(w: Wiring, p: Matching, q: Matching, matchingId: (m: number[]) => number): Side {
  const arc = (u: number): number => (u < w.n ? p[u] : w.n + q[u - w.n]);
  const seen = new Array<boolean>(w.labelOf.length).fill(false);
  const matching = new Array<number>(w.freeSlots.length);
  for (const u of w.freeSlots) {
    if (seen[u]) continue;
    let v = arc(u);
    seen[u] = seen[v] = true;
    while (w.partner[v] >= 0) {
      const next = w.partner[v];
      v = arc(next);
      seen[next] = seen[v] = true;
    }
    matching[w.newPos[u]] = w.newPos[v];
    matching[w.newPos[v]] = w.newPos[u];
  }
  const loopOf = new Array<number>(w.labelOf.length).fill(-1);
  let loops = 0;
  for (let u = 0; u < w.labelOf.length; u++) {
    if (seen[u]) continue;
    let cur = u;
    do {
      const v = arc(cur);
      seen[cur] = seen[v] = true;
      loopOf[cur] = loopOf[v] = loops;
      cur = w.partner[v];
    } while (cur !== u);
    loops++;
  }
  return { mat: matchingId(matching), loopOf, loops };
}

/**
 * The surface between matchings p1 -> q1 of the first factor beside p2 -> q2 of the second,
 * glued along the wiring, seen from the new complex's bottom and top sides; `moving` says which
 * factor's discs carry the morphism's dots.
 */
function glueSides(w: Wiring, [p1, q1, p2, q2]: Matching[], moving: 0 | 1, bottom: Side, top: Side, newCircles: { of: number[] }): Gluing {
  const discs1 = cycles(p1, q1);
  const discs2 = cycles(p2, q2);
  // The disc of every slot: the first factor's discs, then the second's.
  const disc = new Array<number>(w.labelOf.length);
  for (let slot = 0; slot < w.labelOf.length; slot++) disc[slot] = slot < w.n ? discs1.of[slot] : discs1.count + discs2.of[slot - w.n];
  const arcs: number[] = [];
  for (let slot = 0; slot < w.partner.length; slot++) if (slot < w.partner[slot]) arcs.push(disc[slot], disc[w.partner[slot]]);
  const { comp, euler } = glue(discs1.count + discs2.count, arcs);
  const circles = new Array<number>(euler.length).fill(0);
  const boundary = new Array<number>(euler.length).fill(0);
  for (let k = 0; k < newCircles.of.length; k++) {
    const c = newCircles.of[k];
    const piece = comp[disc[w.freeSlots[k]]];
    if (!((boundary[piece] >> c) & 1)) circles[piece]++;
    boundary[piece] |= 1 << c;
  }
  const bottomLoops = loopPieces(bottom, comp, disc, circles);
  const topLoops = loopPieces(top, comp, disc, circles);
  return {
    pieces: euler.map((e, c) => ({ genus: genus(e, circles[c]), boundary: boundary[c] })),
    compPQ: moving === 0 ? comp.slice(0, discs1.count) : comp.slice(discs1.count),
    bottomLoops,
    topLoops,
    memo: [],
  };
}

/** The piece of every closed loop of side s, each loop also counted in `circles` of its piece. */
function loopPieces(s: Side, comp: readonly number[], disc: readonly number[], circles: number[]): number[] {
  const out = new Array<number>(s.loops).fill(-1);
  for (let slot = 0; slot < s.loopOf.length; slot++) {
    const loop = s.loopOf[slot];
    if (loop >= 0 && out[loop] < 0) out[loop] = comp[disc[slot]];
  }
  for (let l = 0; l < out.length; l++) circles[out[l]]++;
  return out;
}

/**
 * The complex of the two tangles side by side, glued where their ends share a label; `ends2`
 * relabels the second factor's ends (a complex computed once stands for every copy of its
 * tangle). Neither factor is changed.
 */
export function tensor<T>(first: TangleComplex<T>, second: TangleComplex<T>, ends2: readonly number[] = second.boundary): TangleComplex<T> {
  const { ring } = first;
  const w = wiring(first.boundary, ends2);
  const cx = new TangleComplex(ring, w.freeSlots.map((slot) => w.labelOf[slot]), first.theory);
  const matchingId = (m: number[]) => cx.matchingId(m);
  const [n1, n2] = [first.matchings.length, second.matchings.length];

  const sides = new Map<number, Side>();
  const side = (m1: number, m2: number): Side => {
    const key = m1 * n2 + m2;
    let found = sides.get(key);
    if (!found) sides.set(key, (found = smoothedSide(w, first.matchings[m1], second.matchings[m2], matchingId)));
    return found;
  };
  // Gluings where the first factor moves (p1 -> q1 beside m2), or the second (m1 beside p2 -> q2).
  const gluings: [Map<number, Gluing>, Map<number, Gluing>] = [new Map(), new Map()];
  const gluing = (p1: number, q1: number, p2: number, q2: number, moving: 0 | 1): Gluing => {
    const key = moving === 0 ? (p1 * n1 + q1) * n2 + p2 : (p1 * n2 + p2) * n2 + q2;
    let found = gluings[moving].get(key);
    if (!found) {
      const bottom = side(p1, p2);
      const top = side(q1, q2);
      const mats = [first.matchings[p1], first.matchings[q1], second.matchings[p2], second.matchings[q2]];
      found = glueSides(w, mats, moving, bottom, top, cycles(cx.matchings[bottom.mat], cx.matchings[top.mat]));
      gluings[moving].set(key, found);
    }
    return found;
  };

  // New objects: loop bit 1 = the {-1} summand (x), bit 0 = the {+1} summand (1); the caps
  // onto the {+1} summand carry the theory's dual dot.
  // ids[k1][k2] = the new objects of the pair (k1, k2) of live objects.
  const live2 = second.objs.map((_, k) => k).filter((k) => second.alive[k]);
  const ids: number[][][] = new Array(first.objs.length);
  first.objs.forEach((o1, k1) => {
    if (!first.alive[k1]) return;
    ids[k1] = new Array(second.objs.length);
    for (const k2 of live2) {
      const o2 = second.objs[k2];
      const { mat, loops } = side(o1.mat, o2.mat);
      const out = new Array<number>(1 << loops);
      for (let bits = 0; bits < out.length; bits++) out[bits] = cx.addObject({ mat, shift: o1.shift + o2.shift + loops - 2 * popcount(bits), height: o1.height + o2.height });
      ids[k1][k2] = out;
    }
  });

  // The glued morphism between summands: cups on bottom loops (dotted for x), caps on top
  // loops (dotted for 1).
  const coef = coefficients(ring);
  const connect = (from: number[], to: number[], g: Gluing, row: Row<T>, k: number, sign: T): void => {
    row.terms(k, (c, mask) => {
      const sc = coef.mul(sign, c);
      for (let sigma = 0; sigma < from.length; sigma++) {
        for (let tau = 0; tau < to.length; tau++) {
          const terms = surface(first.theory, g, mask, sigma, tau);
          for (let t = 0; t < terms.length; t++) {
            const m = terms[t][0];
            const n = terms[t][1];
            cx.addTerm(from[sigma], to[tau], m, n === 1 ? sc : coef.mul(ring.fromInt(n), sc));
          }
        }
      }
    });
  };

  const minusOne = ring.neg(ring.one);
  first.objs.forEach((o1, k1) => {
    if (!first.alive[k1]) return;
    for (const k2 of live2) {
      const m2 = second.objs[k2].mat;
      const row1 = first.out[k1];
      for (let k = 0; k < row1.size; k++) {
        const t = row1.targets[k];
        connect(ids[k1][k2], ids[t][k2], gluing(o1.mat, first.objs[t].mat, m2, m2, 0), row1, k, ring.one);
      }
      const sign = o1.height % 2 ? minusOne : ring.one;
      const row2 = second.out[k2];
      for (let k = 0; k < row2.size; k++) {
        const t = row2.targets[k];
        connect(ids[k1][k2], ids[k1][t], gluing(o1.mat, o1.mat, m2, second.objs[t].mat, 1), row2, k, sign);
      }
    }
  });
  return cx;
}

const capScratch: number[] = [];

// The glued surface with dots `mask` on the old discs, capped as the summands say, reduced.
function surface(theory: Theory, g: Gluing, mask: number, sigma: number, tau: number): [number, number][] {
  const key = (mask * (1 << g.bottomLoops.length) + sigma) * (1 << g.topLoops.length) + tau;
  let terms = g.memo[key];
  if (!terms) {
    const dots = discDots(g.pieces.length, g.compPQ, mask);
    for (let l = 0; l < g.bottomLoops.length; l++) dots[g.bottomLoops[l]] += (sigma >> l) & 1;
    for (let k = 0; k < g.pieces.length; k++) capScratch[k] = 0;
    for (let l = 0; l < g.topLoops.length; l++) capScratch[g.topLoops[l]] += 1 - ((tau >> l) & 1);
    terms = theory.reduce(g.pieces, dots, capScratch);
    g.memo[key] = terms;
  }
  return terms;
}
