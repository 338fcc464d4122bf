// The isomorphism of Khovanov cubes of two PD codes of one diagram: crossings renumbered and
// labels renamed, a crossing possibly read from its other incoming end (turned by two slots,
// which keeps both smoothings). Reordering crossings reorders the wedge of each resolution's
// 1-smoothings (Khovanov's signs, arXiv math/9908171): the sign of the inversions among them.

import { resolve } from '../../khovanov/cube';
import { PDCode, Slot, slotsOf } from '../pd';
import { cubeLabels, CubeGenerator, Term } from './reidemeister-maps';

/**
 * The cube isomorphism C(from) -> C(to) sending crossing anchor[0] to anchor[1] and following
 * the edges from there (a symmetric diagram has others; they need not act as +-1 on Kh).
 * Throws unless the codes are one connected diagram renamed.
 */
export function renaming(from: PDCode, to: PDCode, [a, b]: readonly [number, number]): (g: CubeGenerator) => Term[] {
  const found = [0, 2].map((turn) => follow(from, to, a, b, turn)).find((x) => x !== undefined);
  if (!found || from.length !== to.length) throw new RangeError('the codes are not one connected diagram renamed');
  const { phi, lambda } = found;
  const [lf, lt] = [cubeLabels(from), cubeLabels(to)];
  return ({ state, mask }) => {
    const ones = from.map((_, i) => i).filter((i) => (state >> i) & 1);
    const image = ones.reduce((s, i) => s | (1 << phi.get(i)!), 0);
    let inversions = 0;
    ones.forEach((i, k) => ones.slice(k + 1).forEach((j) => (inversions += phi.get(i)! > phi.get(j)! ? 1 : 0)));
    const [rf, rt] = [resolve(from, state, lf), resolve(to, image, lt)];
    let m = 0;
    for (const [l, k] of lf) if ((mask >> rf.of[k]) & 1) m |= 1 << rt.of[lt.get(lambda.get(l)!)!];
    return [[{ state: image, mask: m }, inversions % 2 ? -1 : 1]];
  };
}

// Crossing a of `from` read as crossing b of `to` turned by `turn` slots, then every crossing
// reached along the edges: the crossing map and the label map, or undefined on a mismatch.
function follow(from: PDCode, to: PDCode, a: number, b: number, turn: number): { phi: Map<number, number>; lambda: Map<number, number> } | undefined {
  const [sf, st] = [slotsOf(from), slotsOf(to)];
  const other = (slots: Map<number, Slot[]>, l: number, s: Slot): Slot => slots.get(l)!.find((t) => t.crossing !== s.crossing || t.position !== s.position)!;
  const phi = new Map([[a, b]]);
  const turns = new Map([[a, turn]]);
  const lambda = new Map<number, number>();
  const queue = [a];
  while (queue.length) {
    const i = queue.pop()!;
    const j = phi.get(i)!;
    for (let p = 0; p < 4; p++) {
      const q = (p + turns.get(i)!) % 4;
      const [l, m] = [from[i][p], to[j][q]];
      if ((lambda.get(l) ?? m) !== m) return undefined;
      lambda.set(l, m);
      const [x, y] = [other(sf, l, { crossing: i, position: p }), other(st, m, { crossing: j, position: q })];
      const t = (y.position - x.position + 4) % 4;
      if (t % 2 === 1) return undefined;
      if (phi.has(x.crossing)) {
        if (phi.get(x.crossing) !== y.crossing || turns.get(x.crossing) !== t) return undefined;
      } else {
        phi.set(x.crossing, y.crossing);
        turns.set(x.crossing, t);
        queue.push(x.crossing);
      }
    }
  }
  return phi.size === from.length && new Set(phi.values()).size === from.length ? { phi, lambda } : undefined;
}
