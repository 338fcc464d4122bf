// Gaussian elimination in an additive category (Bar-Natan, math/0606318, Lemma 4.2): an
// isomorphism phi: b1 -> b2 inside the differential is cancelled, and every s -> b2 -> ... ->
// b1 -> t path adds -gamma phi^-1 delta to d(s -> t). An isomorphism between matchings is a
// unit multiple of the identity cobordism (same matching, same shift, undotted). Cancellations
// go cheapest first, by the Markowitz count (|in(b2)| - 1)(|out(b1)| - 1) of entries they may
// create, as in sparse LU (Markowitz 1957): the fill-in, not the count of cancellations, is
// what costs time and memory.

import { TangleComplex } from './complex';

/** The unit c when entry k of row s is c times an isomorphism (same matching, same shift, undotted). */
function unitIdentity<T>(cx: TangleComplex<T>, s: number, k: number): T | undefined {
  const row = cx.out[s];
  const a = cx.objs[s];
  const b = cx.objs[row.targets[k]];
  if (a.mat !== b.mat || a.shift !== b.shift || row.masks[k] !== 0) return undefined;
  const c = row.values[k] as T;
  return cx.ring.isUnit(c) ? c : undefined;
}

const markowitz = <T>(cx: TangleComplex<T>, b1: number, b2: number): number => (cx.inn[b2].length - 1) * (cx.out[b1].size - 1);

/** Cancels isomorphisms until none is left; `check` runs between cancellations (for abort). */
export function simplify<T>(cx: TangleComplex<T>, check: () => void): void {
  const { ring } = cx;
  for (let changed = true; changed; ) {
    changed = false;
    const candidates: [number, number, number][] = [];
    for (let b1 = 0; b1 < cx.objs.length; b1++) {
      if (!cx.alive[b1]) continue;
      const row = cx.out[b1];
      for (let k = 0; k < row.size; k++) if (unitIdentity(cx, b1, k) !== undefined) candidates.push([markowitz(cx, b1, row.targets[k]), b1, row.targets[k]]);
    }
    candidates.sort((x, y) => x[0] - y[0]);
    for (const [cost, b1, b2] of candidates) {
      if (!cx.alive[b1] || !cx.alive[b2]) continue;
      const k = cx.out[b1].targets.indexOf(b2);
      const phi = k < 0 ? undefined : unitIdentity(cx, b1, k);
      if (phi === undefined) continue;
      // Earlier cancellations changed the counts: a pair grown dearer waits for the next pass.
      if (markowitz(cx, b1, b2) > 2 * cost + 8) {
        changed = true;
        continue;
      }
      cancel(cx, b1, b2, ring.neg(ring.inv(phi)));
      changed = true;
      check();
    }
  }
}

// d(b1 -> b2) = -1/minusInverse; also used over k[H] on entries c H^m (shared/rasmussen/).
// The loops run over inn[b2] and out[b1] while adding s -> t terms: those touch out[s] and
// inn[t] only, never these two (s is not b1 and t is not b2), so no copies are needed.
export function cancel<T>(cx: TangleComplex<T>, b1: number, b2: number, minusInverse: T): void {
  for (const s of cx.inn[b2]) if (s !== b1) cx.addComposites(s, b1, b2, minusInverse);
  cx.remove(b1);
  cx.remove(b2);
}
