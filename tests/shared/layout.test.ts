// PD code -> planar picture -> Sketch -> PD code read back through the drawing analysis: the
// picture has exactly the diagram's crossings (no extra ones, no degeneracy) and the code read
// back has the same crossing count, components, writhe, linking matrix and Jones polynomial.

import { analyse } from '@/shared/drawing/analyse';
import { layoutPD } from '@/shared/layout/layout';
import { layoutToSketch } from '@/shared/layout/to-sketch';
import { fromBraid } from '@/shared/knot/braid';
import { Diagram } from '@/shared/knot/diagram';
import { cable, connectedSum, disjointUnion, mirror, pretzelLink, rationalLink, torusLink, twistKnot } from '@/shared/knot/families';
import { jones } from '@/shared/knot/jones';
import { randomMoves, seededRng } from '@/shared/knot/moves';
import { orient, PDCode, writhe } from '@/shared/knot/pd';
import { pairwiseLinking } from './linking-numbers';

function readBack(d: Diagram): Diagram {
  const layout = layoutPD(d.pd, d.unknots);
  expect(layout.faithful).toBe(true);
  const a = analyse(layoutToSketch(layout, d.framings));
  expect(a.markers).toEqual([]);
  expect(a.crossings).toHaveLength(d.pd.length);
  return a.diagram!.diagram;
}

function expectSameDiagram(d: Diagram): void {
  const back = readBack(d);
  expect(back.pd).toHaveLength(d.pd.length);
  expect(orient(back.pd).components.length + back.unknots).toBe(orient(d.pd).components.length + d.unknots);
  expect(writhe(orient(back.pd))).toBe(writhe(orient(d.pd)));
  expect(pairwiseLinking(back)).toEqual(pairwiseLinking(d));
  expect(jones(back).equals(jones(d))).toBe(true);
}

const pd = (code: number[][]): Diagram => ({ pd: code as unknown as PDCode, unknots: 0, framings: orient(code as unknown as PDCode).components.map(() => null) });

describe('hand-written PD codes', () => {
  test.each([
    ['trefoil', [[1, 5, 2, 4], [3, 1, 4, 6], [5, 3, 6, 2]]], // the usual 3_1 code (from memory)
    ['figure-eight', [[4, 2, 5, 1], [8, 6, 1, 5], [6, 3, 7, 4], [2, 7, 3, 8]]], // 4_1 (from memory)
    ['Hopf link', [[4, 1, 3, 2], [2, 3, 1, 4]]], // (from memory)
    ['a kink', [[1, 1, 2, 2]]], // one R1 curl: an unknot (common practice)
    ['two kinks', [[1, 4, 2, 1], [2, 4, 3, 3]]], // two curls on one unknot
  ])('%s', (_, code) => expectSameDiagram(pd(code as number[][])));

  test('no crossings: unknots only', () => {
    expectSameDiagram({ pd: [], unknots: 1, framings: [null] });
    expectSameDiagram({ pd: [], unknots: 3, framings: [null, null, null] });
  });
});

describe('families', () => {
  const trefoil = torusLink(2, 3);
  test.each<[string, () => Diagram]>([
    ['T(2,5)', () => torusLink(2, 5)],
    ['T(3,4)', () => torusLink(3, 4)],
    ['T(2,-6)', () => torusLink(2, -6)],
    ['T(4,3)', () => torusLink(4, 3)],
    ['T(3,3) (three components)', () => torusLink(3, 3)],
    ['twist knot 5', () => twistKnot(5)],
    ['pretzel (3,-2,3)', () => pretzelLink([3, -2, 3])],
    ['pretzel (2,2,2,2)', () => pretzelLink([2, 2, 2, 2])],
    ['rational [3,1,2]', () => rationalLink([3, 1, 2])],
    ['trefoil # figure-eight', () => connectedSum(trefoil, twistKnot(2))],
    ['trefoil # mirror trefoil', () => connectedSum(trefoil, mirror(trefoil))],
    ['trefoil + figure-eight (split)', () => disjointUnion(trefoil, twistKnot(2))],
    ['(2,0)-cable of the trefoil', () => cable(trefoil, 0, 2, 0)],
    ['(1,1)-cable of the figure-eight', () => cable(twistKnot(2), 0, 1, 1)],
  ])('%s', (_, make) => expectSameDiagram(make()));

  test('framings and crossingless unknots survive the round trip', () => {
    const d: Diagram = { ...torusLink(2, 4), unknots: 2, framings: [3, null, -1, null] };
    const back = readBack(d);
    expect(back.unknots).toBe(2);
    expect([...back.framings].sort()).toEqual([...d.framings].sort());
  });
});

describe('random braid closures up to 30 crossings', () => {
  const rnd = seededRng(2026);
  // Braid words on up to 6 strands: many letters occur once, giving nugatory crossings and
  // crossingless strands, the hardest cases for a Tutte embedding.
  const cases = Array.from({ length: 24 }, (_, i) => {
    const strands = 2 + Math.floor(rnd() * 4);
    const length = 1 + Math.floor(rnd() * 30);
    const word = Array.from({ length }, () => (1 + Math.floor(rnd() * (strands - 1))) * (rnd() < 0.5 ? -1 : 1));
    return [i, strands, word] as const;
  });
  test.each(cases)('case %i: %i strands, %j', (_, strands, word) => expectSameDiagram(fromBraid(word, strands)));
});

describe('diagrams from random Reidemeister moves (kinks, bigons, R3 triangles)', () => {
  const starts: [string, Diagram][] = [
    ['trefoil', torusLink(2, 3)],
    ['figure-eight', twistKnot(2)],
    ['Hopf link', torusLink(2, 2)],
    ['T(3,4)', torusLink(3, 4)],
  ];
  const cases = starts.flatMap(([name, d]) => [4, 9, 14].map((moves) => [name, moves, d] as const));
  test.each(cases)('%s after %i random moves', (_, moves, d) => {
    const moved = randomMoves(d, moves, 1000 + moves);
    expect(moved.pd.length).toBeLessThanOrEqual(30);
    expectSameDiagram(moved);
    // Reidemeister moves change no Jones polynomial (Jones 1985): the picture still shows d.
    expect(jones(readBack(moved)).equals(jones(d))).toBe(true);
  });
});

describe('never a wrong picture', () => {
  // A layout either says it is not faithful, or its picture reads back as the same diagram.
  const rnd = seededRng(77);
  test('40 random braid closures on 2 to 6 strands', () => {
    let faithful = 0;
    for (let i = 0; i < 40; i++) {
      const strands = 2 + Math.floor(rnd() * 5);
      const word = Array.from({ length: 1 + Math.floor(rnd() * 30) }, () => (1 + Math.floor(rnd() * (strands - 1))) * (rnd() < 0.5 ? -1 : 1));
      const d = fromBraid(word, strands);
      const layout = layoutPD(d.pd, d.unknots);
      if (!layout.faithful) continue;
      faithful++;
      const a = analyse(layoutToSketch(layout));
      expect(a.markers).toEqual([]);
      expect(a.crossings).toHaveLength(d.pd.length);
      expect(writhe(orient(a.diagram!.diagram.pd))).toBe(writhe(orient(d.pd)));
      expect(jones(a.diagram!.diagram).equals(jones(d))).toBe(true);
    }
    expect(faithful).toBeGreaterThan(32);
  });
});
