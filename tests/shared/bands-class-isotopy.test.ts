// The surface class read with the isotopy made explicit: births of the c unlink components,
// the R1 and R2 chain maps (shared/knot/bands/reidemeister-maps.ts) from the crossingless unlink
// to the after-bands diagram D', then the bands backwards. class.ts and class-z.ts skip the
// isotopy, taking any generator of Kh^{0,c}(D') (F2, or Z up to sign, since Kh^{0,c} of the
// c-component unlink is F2 or Z at (0, c): Khovanov 2000, arXiv math/9908171); the Reidemeister
// maps are isomorphisms on Kh of bidegree (0, 0) (Bar-Natan, "Khovanov's homology for tangles
// and cobordisms", 2005, arXiv math/0410495), so both routes must give the same class over F2
// and the same up to sign over Z.
import { bandStages, BandPresentation } from '@/shared/knot/bands';
import { backwards, classVector, f2NormalForm, odd, unlinkStart } from '@/shared/knot/bands/class';
import { classVectorZ } from '@/shared/knot/bands/class-z';
import { differential, enhancedState, level } from '@/shared/knot/bands/cube-levels';
import { CubeGenerator, reidemeisterMaps } from '@/shared/knot/bands/reidemeister-maps';
import { diagram, Diagram } from '@/shared/knot/diagram';
import { simplifySteps } from '@/shared/knot/moves';
import { combine, ZEchelon } from '@/shared/linalg/lattice';
import { ribbon } from './bands-fixtures';
import { chainMapFailures, cubeComplex } from './kh-cube';

/** The removals of shared/knot/moves/simplify.ts from D' to a crossingless diagram, each as (small, big, moved). */
function simplification(d: Diagram): { small: Diagram; big: Diagram; moved: number[] }[] {
  const steps = simplifySteps(d);
  if (steps.length === 0 || steps[steps.length - 1].diagram.pd.length > 0) throw new Error('R1 and R2 removals leave crossings');
  return steps.map(({ diagram: small, removed }, k) => ({ small, big: k === 0 ? d : steps[k - 1].diagram, moved: removed }));
}

/** 1 x ... x 1 on the crossingless unlink carried up the simplification to C(D'). */
function isotopyImage(d: Diagram): Map<string, [CubeGenerator, number]> {
  let chain = new Map<string, [CubeGenerator, number]>([['0:0', [{ state: 0, mask: 0 }, 1]]]);
  for (const { small, big, moved } of simplification(d).reverse()) {
    const up = reidemeisterMaps(small.pd, big.pd, moved).up;
    const next = new Map<string, [CubeGenerator, number]>();
    for (const [g, c] of chain.values()) {
      for (const [h, x] of up(g)) {
        const key = `${h.state}:${h.mask}`;
        const s = (next.get(key)?.[1] ?? 0) + c * x;
        if (s === 0) next.delete(key);
        else next.set(key, [h, s]);
      }
    }
    chain = next;
  }
  return chain;
}

// Presentations whose after-bands diagram R1 and R2 removals alone make crossingless.
const cases = ribbon.filter(({ name }) => name.startsWith('8_20') || name.startsWith('9_46')).map(({ name, presentation }) => [name, presentation] as const);

describe('the class through explicit Reidemeister maps from the crossingless unlink', () => {
  // A move that joins crossingless circles to the code is a birth of each (q + 1) and then the move.
  it.each(cases)('%s: every step up is a chain map, also those joining crossingless circles', (_, p: BandPresentation) => {
    const stages = bandStages(p);
    const steps = simplification(diagram(stages[stages.length - 1].pd));
    let joining = 0;
    for (const { small, big, moved } of steps) {
      const freed = small.unknots - big.unknots;
      joining += freed > 0 ? 1 : 0;
      expect(chainMapFailures(reidemeisterMaps(small.pd, big.pd, moved).up, cubeComplex(small.pd), cubeComplex(big.pd), freed)).toEqual([]);
    }
    expect(joining).toBeGreaterThan(0);
  }, 120_000);

  it.each(cases)('%s: the same class over F2, and over Z up to sign', (_, p: BandPresentation) => {
    const stages = bandStages(p);
    const { m, nMinus, last, c, zeroLevel } = unlinkStart(stages);
    const after = diagram(stages[last].pd);
    const z = new Map([...isotopyImage(after).values()].map(([g, x]) => [zeroLevel.index[zeroLevel.stateAt.get(g.state)!].get(g.mask)!, x]));
    expect([...z.keys()].every((i) => i !== undefined)).toBe(true);

    const image = backwards(m, stages, p.saddles, c, zeroLevel, z);
    const q = c - last;
    expect(f2NormalForm(m, stages[0], image.at, q, odd(image.chain))).toEqual(classVector(stages, p.saddles));

    // Over Z: the explicit chain minus or plus the code's normal form is a boundary of C^{0,chi}(K).
    const cube = m.cubeOf(stages[0]);
    const boundaries = new ZEchelon();
    if (nMinus > 0) {
      const below = level(cube, nMinus - 1, q);
      const d = differential(cube, below, image.at);
      below.gens.forEach((_, i) => boundaries.add(new Map(d(i).reduce((row, [j, s]) => row.set(j, (row.get(j) ?? 0) + s), new Map<number, number>()))));
    }
    const key = (s: { smoothing: string; x: number[] }): string => JSON.stringify(s);
    const index = new Map(image.at.gens.map((_, i) => [key(enhancedState(m, image.at, i)), i]));
    const found = classVectorZ(stages, p.saddles);
    const code = new Map(found.support.map((s, k) => [index.get(key(s))!, found.coefficients[k]]));
    const zero = [1, -1].filter((sign) => boundaries.reduce(combine(1, image.chain, -sign, code)).size === 0);
    expect(zero.length).toBe(1);
  }, 120_000);
});
