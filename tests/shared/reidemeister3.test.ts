// The chain map of R3 (shared/knot/bands/reidemeister3.ts): a chain map of bidegree (0, 0)
// (Bar-Natan, "Khovanov's homology for tangles and cobordisms", 2005, arXiv math/0410495,
// section 4.3), and R3 there and back, a movie returning to its start, induces +-1 on Kh over Z
// and 1 over F2 (Jacobsson, "An invariant of link cobordisms from Khovanov homology", 2004,
// arXiv math/0206303).
import { reidemeister3Map } from '@/shared/knot/bands/reidemeister3';
import { renaming } from '@/shared/knot/bands/renaming';
import { fromBraid } from '@/shared/knot/braid';
import { Diagram } from '@/shared/knot/diagram';
import { rationalLink } from '@/shared/knot/families';
import { applyR3, Corner, faces, pushAcross, seededRng, triangles } from '@/shared/knot/moves';
import { chainMapFailures, compose, cubeComplex, identityOnF2, identityOnZ } from './kh-cube';

/**
 * Triangles where R3 applies: a finger (R2) on the trefoil, figure-eight and Hopf link diagrams
 * often makes one. Kept when a crossing lies outside the triangle and smoothing it leaves no
 * circle without crossings (the map's limits).
 */
function positions(): { d: Diagram; triangle: Corner[] }[] {
  const out: { d: Diagram; triangle: Corner[] }[] = [];
  for (const d0 of [fromBraid([1, 1, 1], 2), rationalLink([2, 2]), fromBraid([1, 1], 2)]) {
    for (let seed = 0; seed < 24; seed++) {
      const rng = seededRng(seed);
      const fs = faces(d0.pd);
      const f = fs[Math.floor(rng() * fs.length)];
      const i = Math.floor(rng() * f.length);
      const d = pushAcross(d0, f, i, (i + 1 + Math.floor(rng() * (f.length - 1))) % f.length, rng() < 0.5);
      for (const triangle of triangles(d)) {
        try {
          reidemeister3Map(d.pd, applyR3(d, triangle).pd, triangle);
          out.push({ d, triangle });
        } catch (e) {
          if (!(e instanceof RangeError)) throw e;
        }
      }
    }
  }
  return out;
}

const cases = positions();

describe('R3', () => {
  it('has positions to test', () => expect(cases.length).toBeGreaterThanOrEqual(10));

  it.each(cases.map((c, k) => [k, c] as const))('position %d: a chain map of bidegree (0, 0)', (_, { d, triangle }) => {
    const after = applyR3(d, triangle);
    expect(chainMapFailures(reidemeister3Map(d.pd, after.pd, triangle), cubeComplex(d.pd), cubeComplex(after.pd))).toEqual([]);
  });

  // The check can fail: without the terms that change the smoothing of c (the correction
  // through the homotopy), or with the images of the c = 1 layer negated.
  it.each(cases.slice(0, 6).map((c, k) => [k, c] as const))('position %d: spoiled maps are caught', (_, { d, triangle }) => {
    const after = applyR3(d, triangle);
    // c: the corner after the two where one strand passes over.
    const k = triangle.findIndex((x, i) => (x.arrive + 1) % 2 === 1 && triangle[(i + 1) % 3].arrive % 2 === 1);
    const c = triangle[(k + 2) % 3].crossing;
    const r = reidemeister3Map(d.pd, after.pd, triangle);
    const bit = (state: number): number => (state >> c) & 1;
    const [from, to] = [cubeComplex(d.pd), cubeComplex(after.pd)];
    const negated = chainMapFailures((g) => r(g).map(([h, x]) => [h, bit(g.state) ? -x : x] as const), from, to);
    expect(negated.length).toBeGreaterThan(0);
    const flat = chainMapFailures((g) => r(g).filter(([h]) => bit(h.state) === bit(g.state)), from, to);
    expect(flat.length).toBeGreaterThan(0);
  });

  it.each(cases.slice(0, 8).map((c, k) => [k, c] as const))('position %d: there and back induces +-1 over Z, 1 over F2', (_, { d, triangle }) => {
    const after = applyR3(d, triangle);
    const inner = new Set(triangle.map((c) => c.crossing));
    const back = triangles(after).find((t) => t.every((c) => inner.has(c.crossing)))!;
    const again = applyR3(after, back);
    // The half-turn twice: the start, relabelled, every crossing in its place.
    const j = d.pd.findIndex((_, i) => !inner.has(i));
    const [c0, c1, c2] = [d, after, again].map((x) => cubeComplex(x.pd));
    const loop = compose([reidemeister3Map(d.pd, after.pd, triangle), reidemeister3Map(after.pd, again.pd, back), renaming(again.pd, d.pd, [j, j])], [c0, c1, c2, c0]);
    const z = identityOnZ(c0, loop);
    expect(z.nontrivial).toBeGreaterThan(0);
    expect(z.signs.length).toBeGreaterThan(0);
    expect(identityOnF2(c0, loop).identity).toBe(true);
  }, 60_000);
});
