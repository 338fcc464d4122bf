// The crossing count a cable sweep is checked against before anything is built
// (server/runs/cables.ts: cableCrossings, a formula on the base diagram) against the cables
// themselves: on random framed links and cells it must equal the built cable's crossing count.
import { fromBraid } from '@/shared/knot/braid';
import { diagram, type Diagram } from '@/shared/knot/diagram';
import { disjointUnion, torusLink } from '@/shared/knot/families';
import { randomMoves, seededRng } from '@/shared/knot/moves';
import { orient } from '@/shared/knot/pd';
import { cableCrossings, cableOf, sweepCells } from '@/server/runs/cables';

const components = (d: Diagram) => orient(d.pd).components.length + d.unknots;

/** `d` with random framings in [-4, 4] or null, one per component. */
function framed(d: Diagram, seed: number): Diagram {
  const rng = seededRng(seed);
  const framings = Array.from({ length: components(d) }, () => (rng() < 0.25 ? null : Math.floor(rng() * 9) - 4));
  return diagram(d.pd, { unknots: d.unknots, framings });
}

describe('cableCrossings', () => {
  const bases: [string, Diagram][] = [
    ['trefoil', fromBraid([1, 1, 1])],
    ['figure-eight', fromBraid([1, -2, 1, -2])],
    ['Hopf link', torusLink(2, 2)],
    ['T(3,3), three components', torusLink(3, 3)],
    ['trefoil and a split unknot', disjointUnion(fromBraid([1, 1, 1]), { pd: [], unknots: 1, framings: [null] })],
  ];
  it.each(bases)('equals the crossings of the built cable of the %s, after random moves and framings', (_, base) => {
    for (let seed = 1; seed <= 3; seed++) {
      const d = framed(randomMoves(base, 6, seed), seed);
      const cells = sweepCells(components(d), components(d) > 2 ? 2 : 3);
      for (const cell of cells) expect(cableCrossings(d, cell)).toBe(cableOf(d, cell).pd.length);
    }
  });

  it('grows with the framing as the twists do: r(r-1) crossings per full twist of r strands', () => {
    // The trefoil's writhe is 3 (docs/conventions.md), so framing 3 + t adds t full twists.
    const at = (f: number) => cableCrossings(diagram(fromBraid([1, 1, 1]).pd, { framings: [f] }), [[3, 0]]);
    expect(at(3)).toBe(27); // each of the 3 crossings becomes 3 x 3
    expect(at(13) - at(3)).toBe(10 * 3 * 2);
    expect(at(-7) - at(3)).toBe(10 * 3 * 2);
  });
});
