// A surface's class moved from its presentation's code to the knot's own diagram: the class's
// normal form is a cycle of C^{0,chi} of the code; the chain maps undoing the fingers
// (carry.ts) send it to a cycle of the knot diagram's cube, reduced there to its normal form
// (class.ts over F2, class-z.ts over Z up to sign). The maps are isomorphisms on Kh of bidegree
// (0, 0) (Bar-Natan, "Khovanov's homology for tangles and cobordisms", 2005, arXiv
// math/0410495), so presentations drawn with other fingers get their classes in one basis.

import { resolve } from '../../khovanov/cube';
import { Int } from '../../linalg/int';
import { orient, PDCode } from '../pd';
import { f2NormalForm, odd } from './class';
import { zNormalForm } from './class-z';
import { Chain, Fingers, undoFingers } from './carry';
import { level, movie, EnhancedState } from './cube-levels';
import { cubeLabels } from './reidemeister-maps';
import type { SurfaceClass } from './index';
import { BandError } from './types';

/** The states of a class's normal form with their coefficients, as a chain of the cube of `pd`. */
export function classChain(pd: PDCode, c: SurfaceClass): Chain {
  const labels = cubeLabels(pd);
  const out = new Map<string, readonly [{ state: number; mask: number }, number]>();
  c.support.forEach((e, i) => {
    if ('generator' in e) throw new BandError('a class on the local route has no cube coordinates to carry');
    const { smoothing, x }: EnhancedState = e;
    const state = [...smoothing].reduce((s, bit, k) => s | (bit === '1' ? 1 << k : 0), 0);
    const circles = resolve(pd, state, labels);
    const mask = x.reduce((m, l) => m | (1 << circles.of[labels.get(l)!]), 0);
    out.set(`${state}:${mask}`, [{ state, mask }, c.coefficients[i]]);
  });
  return out;
}

/** The class `c` of a presentation on the code `pd`, carried to the knot's own diagram `fingers.common`. */
export function carriedClass(pd: PDCode, c: SurfaceClass, fingers: Fingers): SurfaceClass {
  const image = undoFingers(pd, fingers)(classChain(pd, c));
  const start = { pd: fingers.common, heads: orient(fingers.common).head };
  const m = movie(start);
  const at = level(m.cubeOf(start), m.nMinus, c.q);
  const chain = new Map<number, Int>();
  for (const [{ state, mask }, x] of image.values()) {
    const i = at.index[at.stateAt.get(state) ?? -1]?.get(mask);
    if (i === undefined) throw new Error(`the carried class left C^{0,${c.q}}: the finger maps are not of bidegree (0, 0)`);
    chain.set(i, x);
  }
  if (c.ring === 'F2') {
    const found = f2NormalForm(m, start, at, c.q, odd(chain));
    return { ...c, ...found, coefficients: found.support.map(() => 1), zero: found.support.length === 0 };
  }
  const found = zNormalForm(m, start, at, c.q, chain);
  return { ...c, ...found, zero: found.support.length === 0 };
}
