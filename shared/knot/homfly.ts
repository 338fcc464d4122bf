// HOMFLY-PT polynomial by a skein tree over descending diagrams (W. B. R. Lickorish and
// K. C. Millett, "A polynomial invariant of oriented links", Topology 26, 1987), memoised on
// canonical signed Gauss codes of the connected pieces. Convention (docs/conventions.md):
// v^-1 P(L+) - v P(L-) = z P(L0), P(unknot) = 1.
//
// Walking the components in some order, each from a base point, a diagram in which every
// crossing is first met on its over-strand is an unlink of its c components: P = delta^(c-1),
// delta = (v^-1 - v) / z. Otherwise a crossing first met on its under-strand (a "bad" one) is
// switched or smoothed: P(D) = v^(2s) P(D switched) + s v^s z P(D smoothed), s its sign. The
// switched diagram has one bad crossing fewer from the same base points, the smoothed one a
// crossing fewer, so the tree ends. Split pieces multiply: P(L1 u L2) = delta P(L1) P(L2).
// Before every step Reidemeister I and II moves that take crossings away are undone.

import { Diagram } from './diagram';
import { Poly2 } from './poly2';
import { crossingOf, fromDiagram, isOver, pieceKey, pieces, signOf, simplifyLink, SkeinLink, smoothCrossing, switchCrossing } from './skein-diagram';

/** (v^-1 - v) z^-1, the value of a split unknot. */
const DELTA = Poly2.fromTriples([
  [-1, -1, 1],
  [1, -1, -1],
]);

/**
 * P(d) in v and z. The empty diagram (no components at all) is given 1, as for the bracket; it
 * has no honest value in this ring (a split union with it would have to divide by delta).
 * Cost: exponential in the crossings in the worst case; the memo and the simplifications keep
 * diagrams of a few dozen crossings fast in practice (see the homfly benchmark).
 */
export function homfly(d: Diagram): Poly2 {
  if (d.pd.length === 0 && d.unknots === 0) return Poly2.one;
  return linkPoly(fromDiagram(d), new Map());
}

function linkPoly(link: SkeinLink, memo: Map<string, Poly2>): Poly2 {
  const simple = simplifyLink(link);
  const parts = pieces(simple);
  let p = DELTA.pow(parts.length + simple.circles - 1);
  for (const piece of parts) p = p.mul(piecePoly(piece, memo));
  return p;
}

function piecePoly(piece: SkeinLink, memo: Map<string, Poly2>): Poly2 {
  const key = pieceKey(piece);
  const known = memo.get(key);
  if (known) return known;
  const x = firstBad(piece);
  let p: Poly2;
  if (x === undefined) p = DELTA.pow(piece.components.length - 1);
  else {
    const s = signOf(piece.components.flat().find((q) => crossingOf(q) === x)!);
    p = linkPoly(switchCrossing(piece, x), memo)
      .times(1n, 2 * s, 0)
      .add(linkPoly(smoothCrossing(piece, x), memo).times(BigInt(s), s, 1));
  }
  memo.set(key, p);
  return p;
}

/**
 * The first bad crossing of a walk that makes few of them: base points and component order are
 * independent choices (a self-crossing's status depends on its component's base point only, a
 * crossing of two components on which is walked first), so each is chosen on its own.
 */
function firstBad(piece: SkeinLink): number | undefined {
  const walked = new Set<number>();
  for (const k of componentOrder(piece)) {
    const c = piece.components[k];
    const b = basePoint(c);
    for (let t = 0; t < c.length; t++) {
      const p = c[(b + t) % c.length];
      if (walked.has(crossingOf(p))) continue;
      if (!isOver(p)) return crossingOf(p);
      walked.add(crossingOf(p));
    }
  }
  return undefined;
}

/** The start on a component that meets the fewest of its self-crossings first from below. */
function basePoint(c: readonly number[]): number {
  const n = c.length;
  const first = new Map<number, number>();
  const bad = new Array<number>(n).fill(0);
  c.forEach((p, i) => {
    const j = first.get(crossingOf(p));
    if (j === undefined) return void first.set(crossingOf(p), i);
    // Passes at j < i: starting in (j, i] meets pass i first, elsewhere pass j.
    const [overAt, underAt] = isOver(p) ? [i, j] : [j, i];
    for (let b = 0; b < n; b++) {
      const dOver = (overAt - b + n) % n;
      const dUnder = (underAt - b + n) % n;
      if (dUnder < dOver) bad[b]++;
    }
  });
  return bad.indexOf(Math.min(...bad));
}

/** Greedy: next the component that passes under the fewest of the components not yet walked. */
function componentOrder(piece: SkeinLink): number[] {
  const m = piece.components.length;
  const owner = new Map<number, number>(); // crossing -> component of its over pass
  piece.components.forEach((c, k) => c.forEach((p) => isOver(p) && owner.set(crossingOf(p), k)));
  const under = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  piece.components.forEach((c, k) => c.forEach((p) => !isOver(p) && under[k][owner.get(crossingOf(p))!]++));
  const left = new Set(piece.components.map((_, k) => k));
  const order: number[] = [];
  while (left.size > 0) {
    const cost = (k: number) => [...left].reduce((s, j) => (j === k ? s : s + under[k][j]), 0);
    const k = [...left].reduce((a, b) => (cost(b) < cost(a) ? b : a));
    left.delete(k);
    order.push(k);
  }
  return order;
}
