// Band presentations built by the knot core's generators. Where the band of a ribbon disk is not
// a local saddle of the generated diagram, one finger move (R2, moves/r2.ts pushAcross) first
// brings the two strands into one face; the saddle labels were then found by trying every
// orientable saddle of that diagram and keeping those certified ribbon, and are fixed here.
import { BandPresentation } from '@/shared/knot/bands';
import { fromBraid } from '@/shared/knot/braid';
import { diagram, Diagram } from '@/shared/knot/diagram';
import { connectedSum, mirror, pretzelLink, rationalLink } from '@/shared/knot/families';
import { faces, pushAcross } from '@/shared/knot/moves';
import { orient } from '@/shared/knot/pd';

export const trefoil = fromBraid([1, 1, 1], 2); // positive trefoil, PD [[4,2,5,1],[2,6,3,5],[6,4,1,3]]

const fingered = (d: Diagram, face: number, i: number, j: number, eOver: boolean): Diagram => pushAcross(d, faces(d.pd)[face], i, j, eOver);
const band = (d: Diagram, ...saddles: [number, number][]): BandPresentation => ({ pd: d.pd, unknots: d.unknots, saddles: saddles.map(([a, b]) => ({ a, b })) });

/** The square knot T # mirror(T) (T # -T for the invertible trefoil), one band after a finger move. */
export const squareKnot = fingered(connectedSum(trefoil, mirror(trefoil)), 0, 1, 4, true);
/** 6_1 from its rational code [4, 2] (shared/knot/names.ts), one band after a finger move. */
export const stevedore = fingered(rationalLink([4, 2]), 0, 0, 1, false);
/** The pretzel knots P(3, -3, 2) and P(3, 3, -3) (names in the tests). */
export const p33m2 = pretzelLink([3, -3, 2]);
export const p33m3 = pretzelLink([3, 3, -3]);

export const ribbon: { name: string; presentation: BandPresentation }[] = [
  { name: 'square knot', presentation: band(squareKnot, [2, 12]) },
  { name: '6_1', presentation: band(stevedore, [3, 7]) },
  // A saddle across the faces between the +3 and -3 columns.
  { name: '8_20 = P(3,-3,2)', presentation: band(p33m2, [2, 6]) },
  { name: '9_46 = P(3,3,-3), first disk', presentation: band(p33m3, [2, 12]) },
];

/**
 * The two standard ribbon disks of 9_46 = P(3,3,-3): a saddle across a bigon of the first +3
 * column (faces [12,2] and [3,11]) or of the second (faces [6,14] and [5,15]); the symmetry of
 * the pretzel exchanging the two +3 columns exchanges them. Two bigons of one column differ by
 * sliding the band along the column, an isotopy of the surface.
 */
export const disks946 = {
  first: [band(p33m3, [2, 12]), band(p33m3, [3, 11])],
  second: [band(p33m3, [6, 14]), band(p33m3, [5, 15])],
};

/**
 * The connected sum of band presentations of knots, with every summand's bands: connectedSum
 * keeps each summand's crossings in order and their slots, so a band's edge is found again at
 * its tail slot (the sum moves heads only). The sum of ribbon disks along a band is a ribbon disk (a boundary connected
 * sum); the tests check each sum's certificate rather than rely on it.
 */
export function summed(parts: readonly BandPresentation[]): BandPresentation {
  let d = diagram(parts[0].pd);
  const saddles: { a: number; b: number }[] = [];
  const before: number[] = [];
  for (const p of parts.slice(1)) {
    before.push(d.pd.length);
    d = connectedSum(d, diagram(p.pd));
  }
  parts.forEach((p, k) => {
    const tails = orient(p.pd).tail;
    const offset = k === 0 ? 0 : before[k - 1];
    const at = (l: number): number => d.pd[tails.get(l)!.crossing + offset][tails.get(l)!.position];
    saddles.push(...p.saddles.map(({ a, b }) => ({ a: at(a), b: at(b) })));
  });
  return { pd: d.pd, unknots: 0, saddles };
}
