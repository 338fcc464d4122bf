// Chains of a band presentation's cube carried to the cube of the knot's own diagram (the code
// without the fingers that brought each band to a short saddle) through the chain maps that
// undo the fingers' R1 and R2 moves (Bar-Natan, "Khovanov's homology for tangles and
// cobordisms", 2005, arXiv math/0410495, section 4.3: reidemeister-maps.ts), then the renaming
// onto that diagram's code (renaming.ts). A finger lies in a thin strip along its band's core:
// the face at its tip is a bigon (a strand it passes), a monogon (a half twist) or a triangle (a
// crossing of the knot inside the strip: R3, reidemeister3.ts), so it is taken back from the tip
// one move at a time (a few R3s in a row where crossings of the knot lie deeper inside). Every
// move has a finger crossing, so the isotopy stays near the strips and the diagram's own
// crossings are never removed.

import { diagram, Diagram } from '../diagram';
import { applyR3, bigons, kinks, removeBigon, removeKink, triangles } from '../moves';
import { PDCode } from '../pd';
import { CubeGenerator, reidemeisterMaps, Term } from './reidemeister-maps';
import { reidemeister3Map } from './reidemeister3';
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

type GeneratorMap = (g: CubeGenerator) => Term[];

// The R1 and R2 removals of finger crossings available in d.
function removals(d: Diagram, finger: (i: number) => boolean): { moved: number[]; next: () => Diagram }[] {
  return [
    ...kinks(d).filter(finger).map((k) => ({ moved: [k], next: () => removeKink(d, k) })),
    ...bigons(d).filter((b) => b.crossings.every(finger)).map((b) => ({ moved: [...b.crossings].sort((p, q) => p - q), next: () => removeBigon(d, b) })),
  ];
}

/** How many R3 moves in a row may free a removal: a finger's tip past the knot crossings inside it. */
const R3_DEPTH = 3;

// Up to `depth` R3 moves on triangles with a finger corner after which an R1 or R2 of finger
// crossings is possible, with their chain maps (triangles whose map reidemeister3.ts refuses are
// passed over); the shortest such sequence, depth first.
function slides(d: Diagram, finger: (i: number) => boolean, depth: number): { maps: GeneratorMap[]; after: Diagram } | undefined {
  for (let k = 1; k <= depth; k++) {
    const found = slideExactly(d, finger, k);
    if (found) return found;
  }
  return undefined;
}

function slideExactly(d: Diagram, finger: (i: number) => boolean, k: number): { maps: GeneratorMap[]; after: Diagram } | undefined {
  for (const t of triangles(d).filter((tri) => tri.some((c) => finger(c.crossing)))) {
    const after = applyR3(d, t);
    const rest = k === 1 ? (removals(after, finger).length > 0 ? { maps: [], after } : undefined) : slideExactly(after, finger, k - 1);
    if (!rest) continue;
    try {
      return { maps: [reidemeister3Map(d.pd, after.pd, t), ...rest.maps], after: rest.after };
    } catch (e) {
      if (!(e instanceof RangeError)) throw e;
    }
  }
  return undefined;
}

/**
 * The moves taking the fingers back from `pd` to the knot's own crossings, as chain maps: R1
 * and R2 removals of finger crossings and, where a crossing of the knot lies inside a finger,
 * the R3 moves that slide the finger's tip past it (up to R3_DEPTH in a row, taken only when a
 * removal follows). `pick` chooses among the removals available at each step (default
 * the first): tests pass a random one, since any order takes back the same fingers. BandError
 * when fingers remain that no such move takes back.
 */
export function fingerMoves(pd: PDCode, of: readonly number[], pick: (count: number) => number = () => 0): { maps: GeneratorMap[]; last: PDCode; kept: number[] } {
  const maps: GeneratorMap[] = [];
  let d: Diagram = diagram(pd);
  let left = [...of];
  const finger = (i: number) => left[i] < 0;
  while (left.some((x) => x < 0)) {
    const options = removals(d, finger);
    if (options.length === 0) {
      const slid = slides(d, finger, R3_DEPTH);
      if (!slid) throw new BandError('the fingers of the bands cannot be taken back by Reidemeister moves through their own crossings');
      maps.push(...slid.maps);
      d = slid.after;
      continue;
    }
    const { moved, next } = options[pick(options.length)];
    const small = next();
    if (small.unknots > d.unknots) throw new BandError('taking a finger back leaves a crossingless circle, which the cube leaves out');
    maps.push(reidemeisterMaps(small.pd, d.pd, moved).down);
    left = left.filter((_, i) => !moved.includes(i));
    d = small;
  }
  return { maps, last: d.pd, kept: left };
}

/**
 * The chain map C(pd) -> C(common) of the fingers taken back (fingerMoves) and the renaming,
 * checked to send every remaining crossing where `of` says. BandError when `common` is not the
 * code left (another diagram, or not one connected piece).
 */
export function undoFingers(pd: PDCode, { common, of }: Fingers, pick?: (count: number) => number): (c: Chain) => Chain {
  if (of.length !== pd.length) throw new RangeError(`${of.length} crossings placed for a code of ${pd.length}`);
  const { maps, last, kept } = fingerMoves(pd, of, pick);
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
  return (c) => applyMap(rename, maps.reduce((x, f) => applyMap(f, x), c));
}
