// The class over Z on the local route (shared/knot/bands/class-local-z.ts) against the cube's
// (class-z.ts). The routes' bases differ, so they are compared by what an isomorphism of
// Kh^{0,chi}(K; Z) keeps (linear algebra, common practice): which classes agree up to sign,
// which are zero, the divisibility of each, and the relations among the classes mod 2.
import { bandStages, compareSurfaces, Saddle, surfaceClass } from '@/shared/knot/bands';
import { classVectorZ } from '@/shared/knot/bands/class-z';
import { localClassesZ } from '@/shared/knot/bands/class-local-z';
import { pretzelLink } from '@/shared/knot/families';
import { seededRng } from '@/shared/knot/moves';
import { PDCode } from '@/shared/knot/pd';
import { F2Echelon } from '@/shared/linalg/f2';
import { disks946, p33m3, ribbon, trefoil } from './bands-fixtures';
import { moved946 } from './bands-moved';

const rank = (vectors: number[][]): number => {
  const e = new F2Echelon();
  vectors.forEach((v) => e.add(v));
  return e.rank;
};

/** What an isomorphism keeps, on each route, for presentations of one code. */
function invariants(pd: PDCode, bands: Saddle[][]) {
  const movies = bands.map((saddles) => ({ stages: bandStages({ pd, unknots: 0, saddles }), saddles }));
  const cube = movies.map((m) => classVectorZ(m.stages, m.saddles));
  const local = localClassesZ(pd, movies);
  const key = (v: { support: unknown[]; coefficients: number[] }) => JSON.stringify([v.support, v.coefficients]);
  const pattern = (vs: { support: unknown[]; coefficients: number[]; divisibility: number }[]) => ({
    zero: vs.map((v) => v.support.length === 0),
    divisibility: vs.map((v) => v.divisibility),
    equal: vs.map((u) => vs.map((v) => key(u) === key(v))),
  });
  const states = new Map<string, number>();
  const index = (s: unknown): number => states.get(JSON.stringify(s)) ?? states.set(JSON.stringify(s), states.size).get(JSON.stringify(s))!;
  const cubeMod2 = cube.map((v) => v.mod2.support.map(index).sort((x, y) => x - y));
  const localMod2 = local.map((v) => v.mod2.support.map((i) => i + 1_000_000));
  return {
    cube: pattern(cube),
    local: pattern(local),
    mod2: { cube: rank(cubeMod2), local: rank(localMod2), both: rank(cubeMod2.map((v, k) => [...v, ...localMod2[k]])) },
  };
}

/** Every one-band presentation of the code certified ribbon, by surfaceClass not refusing it. */
function ribbonBands(pd: PDCode, limit: number): Saddle[][] {
  const labels = [...new Set(pd.flat())].sort((a, b) => a - b);
  const out: Saddle[][] = [];
  for (const a of labels) {
    for (const b of labels.filter((l) => l > a)) {
      try {
        if (surfaceClass({ pd, unknots: 0, saddles: [{ a, b }] }).q === 1) out.push([{ a, b }]);
      } catch {
        // not an orientable saddle across a common face, or not ending at an unlink
      }
      if (out.length >= limit) return out;
    }
  }
  return out;
}

describe('over Z the local route and the cube agree up to isomorphism', () => {
  it.each(ribbon.map((r) => [r.name, r.presentation] as const))('%s', (_, p) => {
    const r = invariants(p.pd, [p.saddles]);
    expect(r.local).toEqual(r.cube);
    expect(r.mod2).toEqual({ cube: 1, local: 1, both: 1 });
  }, 60_000);

  it('the four band positions of 9_46: the same pattern of classes', () => {
    // Sundberg and Swann, arXiv 2103.01438: the two standard disks have different classes.
    const r = invariants(p33m3.pd, [...disks946.first, ...disks946.second].map((p) => p.saddles));
    expect(r.local).toEqual(r.cube);
    expect(r.cube.equal[0][2]).toBe(false);
    expect(r.mod2.local).toBe(r.mod2.cube);
    expect(r.mod2.both).toBe(r.mod2.cube);
  }, 60_000);

  it.each([
    ['P(3,-3,4)', [3, -3, 4]],
    ['P(3,-3,6), 12 crossings', [3, -3, 6]],
  ])('ribbon disks of %s: the same pattern of classes', (_, twists) => {
    const { pd } = pretzelLink(twists);
    const all = ribbonBands(pd, 5);
    expect(all.length).toBeGreaterThan(2);
    const r = invariants(pd, all);
    expect(r.local).toEqual(r.cube);
    expect(r.mod2.both).toBe(r.mod2.cube);
  }, 120_000);

  it('two bands: the genus-1 surface of the positive trefoil has class 0', () => {
    // Kh^{0,-1} of the positive trefoil is 0 (Bar-Natan 2002, arXiv math/0201043).
    const saddles = [{ a: 4, b: 6 }, { a: 2, b: 6 }];
    expect(localClassesZ(trefoil.pd, [{ stages: bandStages({ pd: trefoil.pd, unknots: 0, saddles }), saddles }])[0]).toMatchObject({ support: [], basisSize: 0 });
  });
});

describe('over Z past the cube', () => {
  it('9_46 with Reidemeister moves away from the bands: the disks differ, a slid band is equal up to sign', () => {
    // Isotopies of the boundary move the classes by an isomorphism (Jacobsson 2004, arXiv
    // math/0206303); Sundberg and Swann, arXiv 2103.01438, for the two disks.
    const rng = seededRng(2946);
    for (let trial = 0; trial < 2; trial++) {
      const { pd, bands } = moved946(rng);
      expect(pd.length).toBeGreaterThan(14);
      const z = { ring: 'Z' as const };
      expect(compareSurfaces(pd, 0, bands[0], bands[1], z)).toMatchObject({ verdict: 'differ', a: { ring: 'Z', basis: 'local', q: 1, zero: false } });
      expect(compareSurfaces(pd, 0, bands[0], bands[2], z).verdict).toBe('equal up to sign: no conclusion');
    }
  }, 120_000);

  it('a ribbon disk of P(5,-5,6) (16 crossings): nonzero at (0, 1) and primitive', () => {
    // Levine and Zemke, arXiv 1903.01546: a ribbon concordance C from the unknot has a left
    // inverse on Kh (the reversed concordance), so C sends the generator 1 of Kh^{0,1}(U; Z) = Z
    // to an element no multiple of anything but itself: divisibility 1.
    const { pd } = pretzelLink([5, -5, 6]);
    const [saddles] = ribbonBands(pd, 1);
    expect(surfaceClass({ pd, unknots: 0, saddles }, { ring: 'Z' })).toMatchObject({ ring: 'Z', basis: 'local', h: 0, q: 1, zero: false, divisibility: 1 });
  }, 120_000);
});
