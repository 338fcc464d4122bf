// The class of a band surface through the local algorithm (shared/knot/bands/class-local.ts)
// against the cube (class.ts). The two routes give coordinates in different bases of
// Kh^{0,chi}(K; F2), so they are compared by the linear relations among several classes of one
// code: the classes are the same elements of Kh exactly when some isomorphism carries the cube's
// vectors to the local ones, that is when both lists and their concatenation have one rank
// (linear algebra, common practice).
import { bandCertificate, bandStages, BandPresentation, compareSurfaces, Saddle, surfaceClass } from '@/shared/knot/bands';
import { classVector } from '@/shared/knot/bands/class';
import { localClasses } from '@/shared/knot/bands/class-local';
import { pretzelLink } from '@/shared/knot/families';
import { seededRng } from '@/shared/knot/moves';
import { PDCode } from '@/shared/knot/pd';
import { F2Echelon } from '@/shared/linalg/f2';
import { disks946, p33m3, ribbon, summed, trefoil } from './bands-fixtures';
import { moved946 } from './bands-moved';
import { scramble } from './scramble';

const rank = (vectors: number[][]): number => {
  const e = new F2Echelon();
  vectors.forEach((v) => e.add(v));
  return e.rank;
};

/** The cube's and the local route's classes of presentations on one code, and the three ranks. */
function ranks(pd: PDCode, bands: Saddle[][]): { cube: number; local: number; both: number } {
  const movies = bands.map((saddles) => ({ stages: bandStages({ pd, unknots: 0, saddles }), saddles }));
  const states = new Map<string, number>();
  const index = (key: string): number => states.get(key) ?? states.set(key, states.size).get(key)!;
  const cube = movies.map((m) => classVector(m.stages, m.saddles).support.map((s) => index(JSON.stringify(s))).sort((x, y) => x - y));
  const local = localClasses(pd, movies).map((v) => v.support);
  // The local coordinates placed after every cube coordinate.
  const both = cube.map((v, k) => [...v, ...local[k].map((i) => i + 1_000_000)]);
  return { cube: rank(cube), local: rank(local), both: rank(both) };
}

/** Every one-band presentation of the code certified ribbon (a < b). */
function ribbonBands(pd: PDCode): Saddle[][] {
  const labels = [...new Set(pd.flat())].sort((a, b) => a - b);
  return labels.flatMap((a) =>
    labels.filter((b) => b > a).flatMap((b) => {
      try {
        return bandCertificate({ pd, unknots: 0, saddles: [{ a, b }] }).ribbon ? [[{ a, b }]] : [];
      } catch {
        return []; // not an orientable saddle across a common face
      }
    }),
  );
}

describe('the local route and the cube give the same classes', () => {
  it.each(ribbon.map((r) => [r.name, r.presentation] as const))('%s: both nonzero', (_, p) => {
    expect(ranks(p.pd, [p.saddles])).toEqual({ cube: 1, local: 1, both: 1 });
  }, 60_000);

  it('the four band positions of 9_46: two classes, the same on both routes', () => {
    // Sundberg and Swann, arXiv 2103.01438: the two standard disks have different classes; a band
    // slid along its column is an isotopy of the surface, so the same class.
    const bands = [...disks946.first, ...disks946.second].map((p) => p.saddles);
    expect(ranks(p33m3.pd, bands)).toEqual({ cube: 2, local: 2, both: 2 });
  }, 60_000);

  it.each([
    ['8_20 = P(3,-3,2)', [3, -3, 2]],
    ['P(3,-3,4)', [3, -3, 4]],
    ['P(3,-3,6), 12 crossings', [3, -3, 6]],
  ])('random triples of one-band ribbon disks of %s: the same relations', (_, twists) => {
    const { pd } = pretzelLink(twists);
    const all = ribbonBands(pd);
    expect(all.length).toBeGreaterThan(3);
    const rng = seededRng(twists.length * 100 + twists[2]);
    for (let trial = 0; trial < 4; trial++) {
      const triple = [0, 1, 2].map(() => all[Math.floor(rng() * all.length)]);
      const r = ranks(pd, triple);
      expect(r.local).toBe(r.cube);
      expect(r.both).toBe(r.cube);
    }
  }, 120_000);

  it('two bands: the genus-1 surface of the positive trefoil has class 0 on both routes', () => {
    // Kh^{0,-1} of the positive trefoil is 0 (Bar-Natan 2002, arXiv math/0201043).
    const p: BandPresentation = { pd: trefoil.pd, unknots: 0, saddles: [{ a: 4, b: 6 }, { a: 2, b: 6 }] };
    expect(localClasses(p.pd, [{ stages: bandStages(p), saddles: p.saddles }])[0]).toEqual({ support: [], basisSize: 0 });
  });
});

describe('past the cube: surfaceClass and compareSurfaces take the local route', () => {
  it('9_46 with Reidemeister moves away from the bands, past 14 crossings: the disks still differ, a slid band gives the same class', () => {
    // Moves away from the bands are isotopies of the surfaces' boundary: the classes move by the
    // isomorphism they induce (Jacobsson 2004, arXiv math/0206303; Bar-Natan 2005, arXiv
    // math/0410495), so differing and agreeing are kept (Sundberg and Swann, arXiv 2103.01438).
    const rng = seededRng(1946);
    for (let trial = 0; trial < 3; trial++) {
      const { pd, bands } = moved946(rng);
      expect(pd.length).toBeGreaterThan(14);
      const differ = compareSurfaces(pd, 0, bands[0], bands[1]);
      expect(differ).toMatchObject({ verdict: 'differ', a: { basis: 'local', q: 1, zero: false }, b: { basis: 'local', q: 1, zero: false } });
      expect(compareSurfaces(pd, 0, bands[0], bands[2]).verdict).toBe('equal: no conclusion');
    }
  }, 120_000);

  it.each([
    [[5, -5, 6], 16],
    [[7, -7, 6], 20],
  ])('a ribbon disk of P(%j) (%i crossings): nonzero at (0, 1)', (twists, n) => {
    // Levine and Zemke, "Khovanov homology and ribbon concordances", 2019, arXiv 1903.01546: a
    // ribbon disk's class is nonzero, at q = chi = 1.
    const { pd } = pretzelLink(twists);
    expect(pd).toHaveLength(n);
    const [saddles] = ribbonBands(pd);
    expect(surfaceClass({ pd, unknots: 0, saddles })).toMatchObject({ basis: 'local', h: 0, q: 1, zero: false });
  }, 120_000);

  it('the verdicts do not depend on the labels or the order of the crossings', () => {
    for (const seed of [7, 8]) {
      const { pd, rename } = scramble(p33m3.pd, seededRng(seed));
      const move = (p: BandPresentation) => p.saddles.map(({ a, b }) => ({ a: rename.get(a)!, b: rename.get(b)! }));
      const local = { maxCrossings: 0 };
      expect(compareSurfaces(pd, 0, move(disks946.first[0]), move(disks946.second[0]), local).verdict).toBe('differ');
      expect(compareSurfaces(pd, 0, move(disks946.second[0]), move(disks946.second[1]), local).verdict).toBe('equal: no conclusion');
    }
  }, 60_000);

  it('with the local route off, and past both limits, refuses before any work with the reason', () => {
    const { pd } = pretzelLink([5, -5, 6]);
    const p = { pd, unknots: 0, saddles: [{ a: 1, b: 2 }] };
    expect(() => surfaceClass(p, { ring: 'Z', localCrossings: 0 })).toThrow('the class is computed on the cube of resolutions, up to 14 crossings; this diagram has 16');
    expect(() => surfaceClass(p, { localCrossings: 15 })).toThrow('the class is computed on the cube of resolutions, up to 14 crossings and by the local algorithm up to 15; this diagram has 16');
    const four = summed(new Array<BandPresentation>(4).fill(ribbon[3].presentation));
    expect(() => surfaceClass(four)).toThrow('the class is computed on the cube of resolutions, up to 14 crossings and by the local algorithm up to 30; this diagram has 36');
    expect(() => surfaceClass(four, { localCrossings: 40 })).toThrow('past 14 crossings the class is computed by the local algorithm with the bands\' edges cut open, up to 6 edges; these bands touch 8');
  });

  it('a connected sum of ribbon disks, one band each, is a ribbon disk with a nonzero class', () => {
    // A boundary connected sum of disks is a disk; its class is nonzero at q = 1 (Levine and
    // Zemke, arXiv 1903.01546). 9_46 # 9_46 # 9_46: 27 crossings, three bands on six edges.
    const p = summed([ribbon[3].presentation, ribbon[3].presentation, ribbon[3].presentation]);
    expect(bandCertificate(p)).toMatchObject({ ribbon: true, bands: 3 });
    expect(surfaceClass(p)).toMatchObject({ basis: 'local', h: 0, q: 1, zero: false });
  }, 120_000);
});
