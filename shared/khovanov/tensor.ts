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
 * The complex of the tangle with crossing x added. Slots 0..n-1 are the old boundary points,
 * n..n+3 the crossing's a, b, c, d; slots with the same label are glued.
 */
export function addCrossing<T>(old: TangleComplex<T>, x: Crossing): TangleComplex<T> {
  const { ring } = old;
  const n = old.boundary.length;
  const labelOf = [...old.boundary, ...x];
  const slotsOf = new Map<number, number[]>();
  labelOf.forEach((l, slot) => slotsOf.set(l, [...(slotsOf.get(l) ?? []), slot]));
  const join = labelOf.map((l, slot) => {
    const s = slotsOf.get(l)!;
    return s.length === 2 ? (s[0] === slot ? s[1] : s[0]) : -1;
  });
  const freeSlots = labelOf.map((_, slot) => slot).filter((slot) => join[slot] < 0);
  const newPos = new Array<number>(labelOf.length).fill(-1);
  freeSlots.forEach((slot, k) => (newPos[slot] = k));
  const cx = new TangleComplex(ring, freeSlots.map((slot) => labelOf[slot]), old.theory);

  const sides = new Map<number, Side>();
  const side = (mat: number, s: number): Side => {
    const key = 2 * mat + s;
    const cached = sides.get(key);
    if (cached) return cached;
    const p = old.matchings[mat];
    const arc = (u: number): number => (u < n ? p[u] : n + SMOOTHING[s][u - n]);
    const seen = new Array<boolean>(labelOf.length).fill(false);
    const matching = new Array<number>(freeSlots.length);
    for (const u of freeSlots) {
      if (seen[u]) continue;
      let v = arc(u);
      seen[u] = seen[v] = true;
      while (join[v] >= 0) {
        const w = join[v];
        v = arc(w);
        seen[w] = seen[v] = true;
      }
      matching[newPos[u]] = newPos[v];
      matching[newPos[v]] = newPos[u];
    }
    const loopOf = new Array<number>(labelOf.length).fill(-1);
    let loops = 0;
    for (let u = 0; u < labelOf.length; u++) {
      if (seen[u]) continue;
      let cur = u;
      do {
        const v = arc(cur);
        seen[cur] = seen[v] = true;
        loopOf[cur] = loopOf[v] = loops;
        cur = join[v];
      } while (cur !== u);
      loops++;
    }
    const result = { mat: cx.matchingId(matching), loopOf, loops };
    sides.set(key, result);
    return result;
  };

  const gluings = new Map<number, Gluing>();
  const gluing = (pMat: number, qMat: number, sb: number, st: number): Gluing => {
    const key = 4 * (pMat * old.matchings.length + qMat) + 2 * sb + st;
    const cached = gluings.get(key);
    if (cached) return cached;
    const bottom = side(pMat, sb);
    const top = side(qMat, st);
    const pq = cycles(old.matchings[pMat], old.matchings[qMat]);
    const xs = cycles(SMOOTHING[sb], SMOOTHING[st]);
    const disc = (slot: number): number => (slot < n ? pq.of[slot] : pq.count + xs.of[slot - n]);
    const arcs: [number, number][] = [];
    join.forEach((partner, slot) => {
      if (slot < partner) arcs.push([disc(slot), disc(partner)]);
    });
    const { comp, euler } = glue(pq.count + xs.count, arcs);
    const circles = new Array<number>(euler.length).fill(0);
    const boundary = new Array<number>(euler.length).fill(0);
    const nc = cycles(cx.matchings[bottom.mat], cx.matchings[top.mat]);
    nc.of.forEach((c, k) => {
      const piece = comp[disc(freeSlots[k])];
      if (!((boundary[piece] >> c) & 1)) circles[piece]++;
      boundary[piece] |= 1 << c;
    });
    const loopComps = (s: Side): number[] => {
      const out = new Array<number>(s.loops).fill(-1);
      s.loopOf.forEach((loop, slot) => {
        if (loop >= 0 && out[loop] < 0) out[loop] = comp[disc(slot)];
      });
      out.forEach((piece) => circles[piece]++);
      return out;
    };
    const bottomLoops = loopComps(bottom);
    const topLoops = loopComps(top);
    const result: Gluing = {
      pieces: euler.map((e, c) => ({ genus: genus(e, circles[c]), boundary: boundary[c] })),
      compPQ: comp.slice(0, pq.count),
      bottomLoops,
      topLoops,
      memo: [],
    };
    gluings.set(key, result);
    return result;
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
          for (let n = 0; n < terms.length; n++) {
            const [m, k] = terms[n];
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
