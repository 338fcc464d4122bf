// One step of Bar-Natan's local algorithm (math/0606318, Sect. 5): the planar composition of a
// tangle complex with the complex of one crossing, 0-smoothing -> 1-smoothing{1} by a saddle,
// followed by delooping (a closed circle is isomorphic to the empty set shifted by +1 and -1).

import { Crossing } from '../knot/pd';
import { cycles, dotsOf, glue, genus, Matching, Piece, popcount, Theory } from './cobordism';
import { TangleComplex } from './complex';
import { Mor } from './mor';

/** 0-smoothing joins (a,b)(c,d), 1-smoothing joins (a,d)(b,c) (docs/conventions.md). */
const SMOOTHING: readonly Matching[] = [
  [1, 0, 3, 2],
  [3, 2, 1, 0],
];

interface Side {
  /** The new matching's id in the new complex. */
  readonly mat: number;
  /** Loop of every slot (-1 for slots on arcs to the boundary), loops numbered by first slot. */
  readonly loopOf: number[];
  readonly loops: number;
}

interface Gluing {
  readonly pieces: Piece[];
  /** Component of every disc of the old morphism (the crossing's own morphisms carry no dots). */
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
 * How the old tangle's boundary slots 0..n-1 and the crossing's slots n..n+3 (a, b, c, d) are
 * wired: slots with the same label are glued, the others are the new boundary.
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

function wiring(boundary: readonly number[], x: Crossing): Wiring {
  const labelOf = [...boundary, ...x];
  const slotsOf = new Map<number, number[]>();
  labelOf.forEach((l, slot) => slotsOf.set(l, [...(slotsOf.get(l) ?? []), slot]));
  const partner = labelOf.map((l, slot) => {
    const s = slotsOf.get(l)!;
    return s.length === 2 ? (s[0] === slot ? s[1] : s[0]) : -1;
  });
  const freeSlots = labelOf.map((_, slot) => slot).filter((slot) => partner[slot] < 0);
  const newPos = new Array<number>(labelOf.length).fill(-1);
  freeSlots.forEach((slot, k) => (newPos[slot] = k));
  return { n: boundary.length, labelOf, partner, freeSlots, newPos };
}

/** The old matching `old` beside smoothing s of the crossing: the new matching and its closed loops. */
function smoothedSide(w: Wiring, old: Matching, s: number, matchingId: (m: number[]) => number): Side {
  const arc = (u: number): number => (u < w.n ? old[u] : w.n + SMOOTHING[s][u - w.n]);
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
 * The surface between old matchings p -> q with the crossing's smoothings sb -> st, glued along
 * the wiring, seen from the new complex's bottom and top sides.
 */
function glueSides(w: Wiring, p: Matching, q: Matching, sb: number, st: number, bottom: Side, top: Side, newCircles: { of: number[] }): Gluing {
  const oldDiscs = cycles(p, q);
  const crossingDiscs = cycles(SMOOTHING[sb], SMOOTHING[st]);
  const disc = (slot: number): number => (slot < w.n ? oldDiscs.of[slot] : oldDiscs.count + crossingDiscs.of[slot - w.n]);
  const arcs: [number, number][] = [];
  w.partner.forEach((other, slot) => {
    if (slot < other) arcs.push([disc(slot), disc(other)]);
  });
  const { comp, euler } = glue(oldDiscs.count + crossingDiscs.count, arcs);
  const circles = new Array<number>(euler.length).fill(0);
  const boundary = new Array<number>(euler.length).fill(0);
  newCircles.of.forEach((c, k) => {
    const piece = comp[disc(w.freeSlots[k])];
    if (!((boundary[piece] >> c) & 1)) circles[piece]++;
    boundary[piece] |= 1 << c;
  });
  const loopPieces = (s: Side): number[] => {
    const out = new Array<number>(s.loops).fill(-1);
    s.loopOf.forEach((loop, slot) => {
      if (loop >= 0 && out[loop] < 0) out[loop] = comp[disc(slot)];
    });
    out.forEach((piece) => circles[piece]++);
    return out;
  };
  const bottomLoops = loopPieces(bottom);
  const topLoops = loopPieces(top);
  return {
    pieces: euler.map((e, c) => ({ genus: genus(e, circles[c]), boundary: boundary[c] })),
    compPQ: comp.slice(0, oldDiscs.count),
    bottomLoops,
    topLoops,
    memo: [],
  };
}

/** The complex of the tangle with crossing x added. */
export function addCrossing<T>(old: TangleComplex<T>, x: Crossing): TangleComplex<T> {
  const { ring } = old;
  const w = wiring(old.boundary, x);
  const cx = new TangleComplex(ring, w.freeSlots.map((slot) => w.labelOf[slot]), old.theory);
  const matchingId = (m: number[]) => cx.matchingId(m);

  const sides = new Map<number, Side>();
  const side = (mat: number, s: number): Side => {
    const key = 2 * mat + s;
    let found = sides.get(key);
    if (!found) sides.set(key, (found = smoothedSide(w, old.matchings[mat], s, matchingId)));
    return found;
  };
  const gluings = new Map<number, Gluing>();
  const gluing = (pMat: number, qMat: number, sb: number, st: number): Gluing => {
    const key = 4 * (pMat * old.matchings.length + qMat) + 2 * sb + st;
    let found = gluings.get(key);
    if (!found) {
      const bottom = side(pMat, sb);
      const top = side(qMat, st);
      found = glueSides(w, old.matchings[pMat], old.matchings[qMat], sb, st, bottom, top, cycles(cx.matchings[bottom.mat], cx.matchings[top.mat]));
      gluings.set(key, found);
    }
    return found;
  };

  // New objects: loop bit 1 = the {-1} summand (x), bit 0 = the {+1} summand (1); the caps
  // onto the {+1} summand carry the theory's dual dot.
  // ids[k][s] = the new objects of old object k with smoothing s (k alive).
  const ids: number[][][] = new Array(old.objs.length);
  old.objs.forEach((o, k) => {
    if (!old.alive[k]) return;
    const summands = (s: number): number[] => {
      const { mat, loops } = side(o.mat, s);
      const out = new Array<number>(1 << loops);
      for (let bits = 0; bits < out.length; bits++) out[bits] = cx.addObject({ mat, shift: o.shift + s + loops - 2 * popcount(bits), height: o.height + s });
      return out;
    };
    ids[k] = [summands(0), summands(1)];
  });

  // The glued morphism between summands: cups on bottom loops (dotted for x), caps on top
  // loops (dotted for 1).
  const connect = (from: number[], to: number[], g: Gluing, f: Mor<T>, sign: T): void => {
    f.forEach((c, mask) => {
      const sc = ring.mul(sign, c);
      for (let sigma = 0; sigma < from.length; sigma++) {
        for (let tau = 0; tau < to.length; tau++) {
          const terms = surface(old.theory, g, mask, sigma, tau);
          for (let t = 0; t < terms.length; t++) {
            const [m, k] = terms[t];
            cx.addTerm(from[sigma], to[tau], m, k === 1 ? sc : ring.mul(ring.fromInt(k), sc));
          }
        }
      }
    });
  };

  const identity = new Mor<T>();
  identity.set(0, ring.one);
  old.objs.forEach((o, k) => {
    if (!old.alive[k]) return;
    const [zero, one] = ids[k];
    old.out[k].forEach((f, t) => {
      const [tZero, tOne] = ids[t];
      connect(zero, tZero, gluing(o.mat, old.objs[t].mat, 0, 0), f, ring.one);
      connect(one, tOne, gluing(o.mat, old.objs[t].mat, 1, 1), f, ring.one);
    });
    connect(zero, one, gluing(o.mat, o.mat, 0, 1), identity, o.height % 2 ? ring.neg(ring.one) : ring.one);
  });
  return cx;
}

// The glued surface with dots `mask` on the old discs, capped as the summands say, reduced.
function surface(theory: Theory, g: Gluing, mask: number, sigma: number, tau: number): [number, number][] {
  const key = (mask * (1 << g.bottomLoops.length) + sigma) * (1 << g.topLoops.length) + tau;
  let terms = g.memo[key];
  if (!terms) {
    const dots = dotsOf(g.pieces.length, [g.compPQ], [mask]);
    g.bottomLoops.forEach((piece, l) => (dots[piece] += (sigma >> l) & 1));
    const capDots = new Array<number>(g.pieces.length).fill(0);
    g.topLoops.forEach((piece, l) => (capDots[piece] += 1 - ((tau >> l) & 1)));
    terms = theory.reduce(g.pieces, dots, capDots);
    g.memo[key] = terms;
  }
  return terms;
}
