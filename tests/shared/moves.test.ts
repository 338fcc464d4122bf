import fc from 'fast-check';
import { fromBraid } from '@/shared/knot/braid';
import { bracket } from '@/shared/knot/bracket';
import { componentCount, Diagram } from '@/shared/knot/diagram';
import { jones } from '@/shared/knot/jones';
import { addBigon, addKink, applyR3, Braid, bigons, destabilise, faces, pushAcross, kinks, randomMarkovMove, randomMove, removeBigon, removeKink, seededRng, simplify, stabilise, triangles } from '@/shared/knot/moves';
import { orient, relabel, writhe } from '@/shared/knot/pd';
import { stateSumBracket } from '@/shared/knot/statesum';
import { Laurent } from '@/shared/poly/laurent';
import { arbBraid, arbDiagram } from './arbitraries';
import { pairwiseLinking } from './linking-numbers';
import { atOmega } from './roots';

const invariants = (d: Diagram) => ({ jones: jones(d).toJSON(), components: componentCount(d), linking: pairwiseLinking(d) });

describe('Reidemeister moves', () => {
  const trefoil = fromBraid([1, 1, 1]);

  it('R1 in all four forms, and its removal', () => {
    for (const sign of [1, -1] as const) {
      for (const overFirst of [true, false]) {
        const k = addKink(trefoil, 1, { sign, overFirst });
        expect(k.pd.length).toBe(4);
        expect(writhe(orient(k.pd))).toBe(3 + sign); // the kink's own sign
        expect(jones(k).equals(jones(trefoil))).toBe(true);
        // a kink of sign s multiplies the bracket by -A^(3s) (Kauffman 1987)
        expect(bracket(k).equals(bracket(trefoil).shift(3 * sign).negate())).toBe(true);
        expect(kinks(k)).toEqual([3]);
        expect(removeKink(k, 3).pd).toEqual(relabel(orient(trefoil.pd)));
      }
    }
    expect(() => removeKink(trefoil, 0)).toThrow('crossing 1 is not a kink');
    // A one-crossing kink alone is an unknot; removing it leaves a crossingless component.
    expect(removeKink({ pd: [[1, 1, 2, 2]], unknots: 0, framings: [3] }, 0)).toEqual({ pd: [], unknots: 1, framings: [3] });
  });

  it('R2 at every corner, and its removal', () => {
    for (let c = 0; c < 3; c++) {
      for (let p = 0; p < 4; p++) {
        for (const eOver of [true, false]) {
          const b = addBigon(trefoil, c, p, eOver);
          expect(b.pd.length).toBe(5);
          expect(writhe(orient(b.pd))).toBe(3);
          expect(bracket(b).equals(bracket(trefoil))).toBe(true); // the bracket is R2-invariant (Kauffman 1987)
          const all = bigons(b);
          expect(all.length).toBeGreaterThan(0);
          for (const bigon of all) expect(jones(removeBigon(b, bigon)).equals(jones(trefoil))).toBe(true);
        }
      }
    }
  });

  it('R2 across any two edges of a face', () => {
    const figureEight = fromBraid([1, -2, 1, -2]);
    let tried = 0;
    for (const face of faces(figureEight.pd)) {
      face.forEach((_, i) =>
        face.forEach((__, j) => {
          const [e, f] = [face[i], face[j]].map((c) => figureEight.pd[c.crossing][c.arrive]);
          if (e === f) return;
          for (const eOver of [true, false]) {
            const b = pushAcross(figureEight, face, i, j, eOver);
            expect(b.pd.length).toBe(6);
            expect(bracket(b).equals(bracket(figureEight))).toBe(true);
            tried++;
          }
        }),
      );
    }
    expect(tried).toBeGreaterThan(24); // more than the corners alone
  });

  it('R3 on the triangles of sigma_1 sigma_2 sigma_1 and a longer word', () => {
    for (const w of [[1, 2, 1], [1, -2, 1, 2, -1, 2, 2, -1], [-1, -2, -1, 3, 2]]) {
      const d = fromBraid(w);
      const ts = triangles(d);
      expect(ts.length).toBeGreaterThan(0);
      for (const t of ts) expect(bracket(applyR3(d, t)).equals(bracket(d))).toBe(true); // bracket is R3-invariant
    }
    // The alternating triangle of the trefoil is not an R3 triangle (each strand over once).
    expect(triangles(fromBraid([1, 1, 1]))).toEqual([]);
  });

  it('random moves leave the invariants unchanged (property)', () => {
    fc.assert(
      fc.property(arbBraid(8, 4), fc.integer(), (w, seed) => {
        const d = fromBraid(w);
        const before = invariants(d);
        const rng = seededRng(seed);
        let current = d;
        for (let i = 0; i < 8; i++) {
          current = randomMove(current, rng).diagram;
          expect(invariants(current)).toEqual(before);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('simplify removes what random R1/R2 moves added (property)', () => {
    fc.assert(
      fc.property(arbBraid(6, 3), fc.integer(), (w, seed) => {
        const d = fromBraid(w);
        const rng = seededRng(seed);
        let current = d;
        for (let i = 0; i < 4; i++) {
          const corners = current.pd.flatMap((x, c) => [0, 1, 2, 3].filter((p) => x[p] !== x[(p + 1) % 4]).map((p) => [c, p]));
          const [c, p] = corners[Math.floor(rng() * corners.length)];
          current = rng() < 0.5 ? addKink(current, current.pd[c][p], { sign: 1, overFirst: rng() < 0.5 }) : addBigon(current, c, p, rng() < 0.5);
        }
        const s = simplify(current);
        expect(s.pd.length).toBeLessThanOrEqual(simplify(d).pd.length);
        expect(kinks(s)).toEqual([]);
        expect(bigons(s)).toEqual([]);
        expect(jones(s).equals(jones(d))).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});

describe('Markov moves', () => {
  it('leave the Jones polynomial of the closure unchanged (property)', () => {
    fc.assert(
      fc.property(arbBraid(8, 4), fc.integer(), (w, seed) => {
        const strands = Math.max(...w.map(Math.abs)) + 1;
        let b: Braid = { word: w, strands };
        const v = jones(fromBraid(b.word, b.strands));
        const rng = seededRng(seed);
        for (let i = 0; i < 10; i++) {
          b = randomMarkovMove(b, rng);
          expect(jones(fromBraid(b.word, b.strands)).equals(v)).toBe(true);
        }
      }),
      { numRuns: 60 },
    );
    expect(destabilise(stabilise({ word: [1, 1, 1], strands: 2 }, -1))).toEqual({ word: [1, 1, 1], strands: 2 });
    expect(() => destabilise({ word: [1, 2, 2], strands: 3 })).toThrow(/only one on the last strand/);
  });
});

describe('bracket and Jones identities', () => {
  it('tangle contraction equals the state sum on generated diagrams up to 12 crossings (property)', () => {
    fc.assert(
      fc.property(arbDiagram(12), (d) => {
        expect(bracket(d).equals(stateSumBracket(d))).toBe(true);
      }),
      { numRuns: 80 },
    );
  });

  it('V(1) = (-2)^(c-1) and V(e^(2 pi i/3)) = 1 for knots (property)', () => {
    // V_L(1) = (-2)^(c-1) and V_K(e^(2 pi i/3)) = 1 for every knot K (Jones 1985, Bull. AMS 12;
    // also Lickorish, An Introduction to Knot Theory, ch. 3; from memory)
    fc.assert(
      fc.property(arbDiagram(14), (d) => {
        const v = jones(d);
        const c = componentCount(d);
        const s = v.substitute(2); // t^(1/2) -> s: integer exponents, V(1) unchanged
        expect(s.evaluate(1)).toEqual({ num: (-2n) ** BigInt(c - 1), den: 1n });
        if (c === 1) expect(atOmega(v)).toEqual([1n, 0n]);
      }),
      { numRuns: 80 },
    );
  });

  it('Jones of a split union with unknots carries the loop factor (docs/conventions.md)', () => {
    const d = fromBraid([1, 1, 1], 4); // two untouched strands: two crossingless unknots
    expect(d.unknots).toBe(2);
    const loop = Laurent.fromPairs([[0.5, -1], [-0.5, -1]]);
    expect(jones(d).equals(jones(fromBraid([1, 1, 1])).mul(loop).mul(loop))).toBe(true);
  });
});
