// Braid closures recognised in PD codes: every closure of a braid word is found again, with its
// strands and a word whose closure is the same code (canonical forms) and the same bracket as
// the plain state sum; relabelled codes, codes with components reversed and the standard
// drawing read back are found as well; after random Reidemeister moves a
// code is found with the right bracket or refused, never given a wrong word; codes that are not
// in braid form are refused; bracketOfPD, which now sends recognised codes to the
// Temperley-Lieb sweep, still equals the state sum.
import fc from 'fast-check';
import { analyse } from '@/shared/drawing/analyse';
import { fromBraid } from '@/shared/knot/braid';
import { braidClosure } from '@/shared/knot/braid-closure';
import { bracketByContraction, bracketOfPD, greedyOrder } from '@/shared/knot/bracket';
import { sweepBracket } from '@/shared/knot/bracket-braid';
import { canonicalPD } from '@/shared/knot/canonical';
import { scoreOrder } from '@/shared/knot/contraction-order';
import { diagram } from '@/shared/knot/diagram';
import { connectedSum, disjointUnion, pretzelLink, reverseComponent } from '@/shared/knot/families';
import { jonesFromBracket } from '@/shared/knot/jones';
import { randomMoves, seededRng } from '@/shared/knot/moves';
import { orient, PDCode, writhe } from '@/shared/knot/pd';
import { stateSumBracket } from '@/shared/knot/statesum';
import { closedBraidSketch } from '@/shared/layout';
import { arbDiagram, wideWord } from './arbitraries';
import { scramble } from './scramble';

/** Braid words on 2..maxStrands strands using every generator (so the closure is one piece). */
const arbFullBraid = (maxLength: number, maxStrands: number) =>
  fc.integer({ min: 2, max: maxStrands }).chain((n) =>
    fc
      .array(fc.integer({ min: 1, max: n - 1 }).chain((k) => fc.constantFrom(k, -k)), { minLength: n - 1, maxLength })
      .filter((w) => new Set(w.map(Math.abs)).size === n - 1)
      .map((word) => ({ word, strands: n })),
  );

/** The bracket of the recognised braid's closure, checked against the state sum of the code itself. */
const recognisedRight = (pd: PDCode): boolean | undefined => {
  const b = braidClosure(pd);
  return b && sweepBracket(b.word, b.strands).equals(stateSumBracket(diagram(pd)));
};

const key = (pd: PDCode) => JSON.stringify(canonicalPD(pd));

describe('braid closures recognised in PD codes', () => {
  it('finds the closure of every braid word on its strands: the same code, writhe, bracket and Jones as the state sum (property)', () => {
    // A closed braid's Seifert circles are its strands (Yamada, Invent. Math. 89, 1987); the
    // bracket and Jones of the same diagram agree by definition (Kauffman, Topology 26, 1987).
    fc.assert(
      fc.property(arbFullBraid(12, 6), ({ word, strands }) => {
        const d = fromBraid(word, strands);
        const b = braidClosure(d.pd)!;
        expect(b.strands).toBe(strands);
        expect(key(fromBraid(b.word, b.strands).pd)).toBe(key(d.pd));
        expect(b.word.reduce((s, k) => s + Math.sign(k), 0)).toBe(writhe(orient(d.pd)));
        const slow = stateSumBracket(d);
        const fast = sweepBracket(b.word, b.strands);
        expect(fast.equals(slow)).toBe(true);
        expect(jonesFromBracket(d, fast).equals(jonesFromBracket(d, slow))).toBe(true);
      }),
      { numRuns: 80 },
    );
  });

  it('maps the letters one to one onto the crossings, signs kept up to the reversed components (property)', () => {
    // Reversing one strand of a crossing changes its sign, reversing both does not (the sign
    // convention of docs/conventions.md), so on the crossings of two given components the
    // letter's sign is the code's times one same factor, which is 1 for a component with itself.
    fc.assert(
      fc.property(arbFullBraid(20, 8), fc.integer(), ({ word, strands }, seed) => {
        const pd = scramble(fromBraid(word, strands).pd, seededRng(seed)).pd;
        const b = braidClosure(pd)!;
        const o = orient(pd);
        expect([...b.crossings].sort((p, q) => p - q)).toEqual(pd.map((_, i) => i));
        const factor = new Map<string, number>();
        b.word.forEach((k, t) => {
          const i = b.crossings[t];
          const [u, v] = [o.componentOf.get(pd[i][0])!, o.componentOf.get(pd[i][1])!].sort((p, q) => p - q);
          const f = Math.sign(k) * o.signs[i];
          expect(factor.get(`${u} ${v}`) ?? (u === v ? 1 : f)).toBe(f);
          factor.set(`${u} ${v}`, f);
        });
      }),
      { numRuns: 60 },
    );
  });

  it('finds relabelled, reordered codes too, with the same strands and bracket (property)', () => {
    // Relabelling changes nothing of the diagram (a two-edge loop passing only over may come
    // back reversed, as its labels orient it: docs/conventions.md).
    fc.assert(
      fc.property(arbFullBraid(14, 5), fc.integer(), ({ word, strands }, seed) => {
        const pd = scramble(fromBraid(word, strands).pd, seededRng(seed)).pd;
        expect(braidClosure(pd)?.strands).toBe(strands);
        expect(recognisedRight(pd)).toBe(true);
      }),
      { numRuns: 80 },
    );
  });

  it('finds closures with some components reversed, as a drawing may run them (property)', () => {
    // The bracket does not depend on the orientation (Kauffman, Topology 26, 1987).
    fc.assert(
      fc.property(arbFullBraid(14, 5), fc.integer(), ({ word, strands }, seed) => {
        const rng = seededRng(seed);
        let d = fromBraid(word, strands);
        for (let c = 0; c < orient(d.pd).components.length; c++) if (rng() < 0.5) d = reverseComponent(d, c);
        expect(braidClosure(d.pd)?.strands).toBe(strands);
        expect(recognisedRight(d.pd)).toBe(true);
      }),
      { numRuns: 80 },
    );
  });

  it('finds the closed braid in its standard drawing read back, whichever way each stroke runs (property)', () => {
    fc.assert(
      fc.property(arbFullBraid(10, 4), fc.integer(), ({ word, strands }, seed) => {
        const sketch = closedBraidSketch(word, strands);
        fc.pre(sketch !== null);
        const rng = seededRng(seed);
        const turned = { ...sketch!, components: sketch!.components.map((c) => ({ ...c, reversed: rng() < 0.5 })) };
        const read = analyse(turned).diagram!.diagram;
        expect(braidClosure(read.pd)?.strands).toBe(strands);
        expect(recognisedRight(read.pd)).toBe(true);
      }),
      { numRuns: 15 },
    );
  }, 60_000);

  it("after random Reidemeister moves finds a braid with the code's own bracket, or refuses (property)", () => {
    // Never a wrong word: the bracket of the word's closure is compared with the state sum of
    // the moved code itself (not of the original, as R1 changes the bracket by -A^(+-3)).
    let found = 0;
    let refused = 0;
    fc.assert(
      fc.property(arbFullBraid(8, 4), fc.integer({ min: 1, max: 8 }), fc.integer(), ({ word, strands }, moves, seed) => {
        const d = randomMoves(fromBraid(word, strands), moves, seed);
        fc.pre(d.pd.length > 0 && d.pd.length <= 14);
        const right = recognisedRight(d.pd);
        if (right === undefined) refused++;
        else {
          found++;
          expect(right).toBe(true);
        }
      }),
      { numRuns: 80 },
    );
    expect(found).toBeGreaterThan(0); // moves that keep a braid form (R1 at an end: stabilisation) were met
    expect(refused).toBeGreaterThan(0);
  }, 60_000);

  it('refuses codes not in braid form', () => {
    const trefoil = fromBraid([1, 1, 1]);
    // Two pieces: the Seifert graph is not connected.
    expect(braidClosure(disjointUnion(trefoil, trefoil).pd)).toBeUndefined();
    // The sum side by side (families/sum.ts): the band joins one circle of each trefoil, so the
    // Seifert graph is the path of the two others through the joined one, but those two lie
    // side by side, on one side of it, where the strands of a closed braid would be nested.
    expect(braidClosure(connectedSum(trefoil, trefoil).pd)).toBeUndefined();
    // P(3,3,3): with all columns odd the two strands of each column run opposite ways (its
    // genus-1 surface is two disks and three twisted bands; common practice), so each column
    // is a chain of Seifert circles between the top and bottom ones, which meet three chains.
    expect(braidClosure(pretzelLink([3, 3, 3]).pd)).toBeUndefined();
    // Not even oriented: edge 1 enters both crossings as their incoming under-strand.
    expect(() => orient([[1, 2, 3, 4], [1, 4, 3, 2]])).toThrow();
    expect(braidClosure([[1, 2, 3, 4], [1, 4, 3, 2]])).toBeUndefined();
  });
});

describe('bracketOfPD with braid closures recognised', () => {
  it('equals the state sum on relabelled braid closures wide enough for the sweep (property)', () => {
    let swept = 0;
    fc.assert(
      fc.property(arbFullBraid(14, 6), fc.integer(), fc.integer({ min: 0, max: 2 }), ({ word, strands }, seed, unknots) => {
        const pd = scramble(fromBraid(word, strands).pd, seededRng(seed)).pd;
        if (braidClosure(pd) && scoreOrder(pd, greedyOrder(pd)).widest >= 2 * strands) swept++;
        expect(bracketOfPD(pd, unknots).equals(stateSumBracket(diagram(pd, { unknots })))).toBe(true);
      }),
      { numRuns: 80 },
    );
    expect(swept).toBeGreaterThan(0); // the sweep route was taken, not only the contraction
  });

  it('equals the tangle contraction on relabelled 5- to 8-strand closures of 30 to 60 crossings (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 5, max: 8 }), fc.integer({ min: 30, max: 60 }), fc.integer(), (strands, crossings, seed) => {
        const pd = scramble(fromBraid(wideWord(strands, crossings, seed), strands).pd, seededRng(seed)).pd;
        expect(braidClosure(pd)?.strands).toBe(strands);
        expect(bracketOfPD(pd).equals(bracketByContraction(pd))).toBe(true);
      }),
      { numRuns: 8 },
    );
  }, 60_000);

  it('equals the state sum on random diagrams (property)', () => {
    fc.assert(
      fc.property(arbDiagram(12), (d) => {
        expect(bracketOfPD(d.pd, d.unknots).equals(stateSumBracket(d))).toBe(true);
      }),
      { numRuns: 80 },
    );
  });
});
