// Gaussian elimination in an additive category (Bar-Natan, math/0606318, Lemma 4.2): an
// isomorphism phi: b1 -> b2 inside the differential is cancelled, and every s -> b2 -> ... ->
// b1 -> t path adds -gamma phi^-1 delta to d(s -> t). An isomorphism between matchings is a
// unit multiple of the identity cobordism (same matching, same shift, undotted).

import { TangleComplex } from './complex';

function unitIdentity<T>(cx: TangleComplex<T>, s: number, t: number): T | undefined {
  const a = cx.objs[s];
  const b = cx.objs[t];
  if (a.mat !== b.mat || a.shift !== b.shift) return undefined;
  const m = cx.out[s].get(t)!;
  const c = m.get(0);
  return m.size === 1 && c !== undefined && cx.ring.isUnit(c) ? c : undefined;
}

/** Cancels isomorphisms until none is left; `check` runs between cancellations (for abort). */
export function simplify<T>(cx: TangleComplex<T>, check: () => void): void {
  const { ring } = cx;
  for (let changed = true; changed; ) {
    changed = false;
    for (let b1 = 0; b1 < cx.objs.length; b1++) {
      if (!cx.alive[b1]) continue;
      let b2 = -1;
      let phi: T | undefined;
      // Prefer the cancellation that touches the fewest other entries.
      let cost = Infinity;
      for (const t of cx.out[b1].keys()) {
        const c = unitIdentity(cx, b1, t);
        const k = c === undefined ? Infinity : cx.inn[t].size;
        if (k < cost) [b2, phi, cost] = [t, c, k];
      }
      if (b2 < 0) continue;
      cancel(cx, b1, b2, ring.neg(ring.inv(phi!)));
      changed = true;
      check();
    }
  }
}

// The loops run over inn[b2] and out[b1] while adding s -> t terms: those touch out[s] and
// inn[t] only, never these two (s is not b1 and t is not b2), so no copies are needed.
function cancel<T>(cx: TangleComplex<T>, b1: number, b2: number, minusInverse: T): void {
  const gammas = cx.out[b1];
  for (const s of cx.inn[b2]) {
    if (s === b1) continue;
    const delta = cx.out[s].get(b2)!;
    gammas.forEach((gamma, t) => {
      if (t !== b2) cx.addComposite(s, b1, t, delta, gamma, minusInverse);
    });
  }
  cx.remove(b1);
  cx.remove(b2);
}
