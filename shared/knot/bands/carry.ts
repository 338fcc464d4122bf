// Chains of a band presentation's cube carried to the cube of the knot's own diagram (the code
// without the fingers that brought each band to a short saddle) through the chain maps that
// undo the fingers' R1 and R2 moves (Bar-Natan, "Khovanov's homology for tangles and
// cobordisms", 2005, arXiv math/0410495, section 4.3: reidemeister-maps.ts), then the renaming
// onto that diagram's code (renaming.ts). A finger lies in a thin strip along its band's core:
// the face at its tip is a bigon (a strand it passes) or a monogon (a half twist), so it is
// taken back from the tip one move at a time. Every move removes finger crossings only, so the
// isotopy stays inside the strips and the diagram's own crossings never move.

import { diagram, Diagram } from '../diagram';
import { bigons, kinks, removeBigon, removeKink } from '../moves';
import { PDCode } from '../pd';
import { CubeGenerator, reidemeisterMaps, Term } from './reidemeister-maps';
import { renaming } from './renaming';
import { BandError } from './types';

/** A chain of a cube complex: generators (keyed by state:mask) with nonzero integer coefficients. */
export type Chain = ReadonlyMap<string, readonly [CubeGenerator, number]>;

/** Where a presentation's code sits over the knot's own diagram. */
export interface Fingers {
  /** The knot's own diagram: one connected piece with crossings (the cube leaves crossingless circles out). */
  readonly common: PDCode;
  /** For each crossing of the presentation's code, the crossing of `common` it is, or -1 where fingers cross. */
  readonly of: readonly number[];
}

const key = (g: CubeGenerator): string => `${g.state}:${g.mask}`;

/** f applied to a chain, term by term. */
export function applyMap(f: (g: CubeGenerator) => Term[], c: Chain): Chain {
  const out = new Map<string, readonly [CubeGenerator, number]>();
  for (const [g, x] of c.values()) {
    for (const [h, y] of f(g)) {
      const s = (out.get(key(h))?.[1] ?? 0) + x * y;
      if (s === 0) out.delete(key(h));
      else out.set(key(h), [h, s]);
    }
  }
  return out;
}

/** One removal: the code before and after it and the crossings it took out (indices before). */
export interface FingerMove {
  readonly big: PDCode;
  readonly small: PDCode;
  readonly moved: readonly number[];
}

/**
 * The R1 and R2 removals of finger crossings from `pd` down to the knot's own crossings. `pick`
 * chooses among the removals available at each step (default the first): tests pass a random
 * one, since any order takes back the same fingers. BandError when fingers remain that no such
 * move removes (a crossing of the knot inside a finger's strip would need R3).
 */
export function fingerMoves(pd: PDCode, of: readonly number[], pick: (count: number) => number = () => 0): { moves: FingerMove[]; last: PDCode; kept: number[] } {
  const moves: FingerMove[] = [];
  let d: Diagram = diagram(pd);
  let left = [...of];
  while (left.some((x) => x < 0)) {
    const finger = (i: number) => left[i] < 0;
    const options: { moved: number[]; next: () => Diagram }[] = [
      ...kinks(d).filter(finger).map((k) => ({ moved: [k], next: () => removeKink(d, k) })),
      ...bigons(d).filter((b) => b.crossings.every(finger)).map((b) => ({ moved: [...b.crossings].sort((p, q) => p - q), next: () => removeBigon(d, b) })),
    ];
    if (options.length === 0) throw new BandError('the fingers of the bands cannot be taken back by R1 and R2 moves alone (a crossing lies inside a finger)');
    const { moved, next } = options[pick(options.length)];
    const small = next();
    if (small.unknots > d.unknots) throw new BandError('taking a finger back leaves a crossingless circle, which the cube leaves out');
    moves.push({ big: d.pd, small: small.pd, moved });
    left = left.filter((_, i) => !moved.includes(i));
    d = small;
  }
  return { moves, last: d.pd, kept: left };
}

/**
 * The chain map C(pd) -> C(common) of the fingers taken back (fingerMoves) and the renaming,
 * checked to send every remaining crossing where `of` says. BandError when `common` is not the
 * code left (another diagram, or not one connected piece).
 */
export function undoFingers(pd: PDCode, { common, of }: Fingers, pick?: (count: number) => number): (c: Chain) => Chain {
  if (of.length !== pd.length) throw new RangeError(`${of.length} crossings placed for a code of ${pd.length}`);
  const { moves, last, kept } = fingerMoves(pd, of, pick);
  if (kept.length === 0 || kept.length !== common.length) throw new BandError('the knot drawing has no crossings or other crossings than the presentation: no common diagram');
  let rename: (g: CubeGenerator) => Term[];
  try {
    rename = renaming(last, common, [0, kept[0]]);
  } catch {
    throw new BandError('without its fingers the presentation is not drawn on the knot drawing given');
  }
  // The renaming follows the edges from one anchor; it must agree with `of` everywhere else too.
  kept.forEach((k, j) => {
    if (rename({ state: 1 << j, mask: 0 })[0][0].state !== 1 << k) throw new BandError('without its fingers the presentation is not drawn on the knot drawing given');
  });
  const downs = moves.map(({ big, small, moved }) => reidemeisterMaps(small, big, moved).down);
  return (c) => applyMap(rename, downs.reduce((x, down) => applyMap(down, x), c));
}
