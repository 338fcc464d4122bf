// The bracket of braid closures in the Temperley-Lieb algebra: its tables obey the algebra's
// defining relations, and its brackets agree with the plain state sum, with the general
// tangle contraction, under Markov moves, and with themselves when doubles are trusted less.
import fc from 'fast-check';
import { fromBraid } from '@/shared/knot/braid';
import { bracketByContraction, loopFactor } from '@/shared/knot/bracket';
import { bracketOfBraid, sweep, sweepBracket } from '@/shared/knot/bracket-braid';
import { jonesFromBracket } from '@/shared/knot/jones';
import { Braid, randomMarkovMove } from '@/shared/knot/moves/markov';
import { seededRng } from '@/shared/knot/moves/random';
import { stateSumBracket } from '@/shared/knot/statesum';
import { catalan, standardModules } from '@/shared/knot/temperley-lieb';
import { Laurent } from '@/shared/poly/laurent';
import { arbBraid, wideWord } from './arbitraries';

describe('standard modules of the Temperley-Lieb algebra', () => {
  it('have the ballot numbers C(n, a) - C(n, a - 1) of link states, their squares adding up to Catalan(n)', () => {
    // The cell modules of TL_n and their dimensions; the sum of squares is dim TL_n (Goodman,
    // de la Harpe and Jones, "Coxeter graphs and towers of algebras", 1989, ch. 2; Catalan
    // numbers 1, 2, 5, 14, 42, 132, 429, 1430: common knowledge).
    const binomial = (n: number, k: number): number => (k < 0 ? 0 : k === 0 ? 1 : (binomial(n, k - 1) * (n - k + 1)) / k);
    for (let n = 1; n <= 10; n++) {
      const modules = standardModules(n);
      expect(modules.map((m) => m.through)).toEqual(Array.from({ length: Math.floor(n / 2) + 1 }, (_, i) => n - 2 * i));
      for (const m of modules) {
        const a = (n - m.through) / 2;
        expect(m.size).toBe(binomial(n, a) - binomial(n, a - 1));
      }
      expect(modules.reduce((sum, m) => sum + m.size ** 2, 0)).toBe(catalan(n));
    }
    expect([1, 2, 3, 4, 5, 6, 7, 8].map(catalan)).toEqual([1, 2, 5, 14, 42, 132, 429, 1430]);
  });

  it('obey e_k^2 = delta e_k, e_k e_(k+-1) e_k = e_k and far commutation on every link state of TL_7', () => {
    // The Temperley-Lieb relations (Kauffman, "State models and the Jones polynomial", 1987);
    // -1 stands for zero, which every e_k keeps.
    for (const { size, target } of standardModules(7)) {
      const e = (k: number, u: number) => (u < 0 ? -1 : target[k * size + u]);
      for (let u = 0; u < size; u++) {
        for (let k = 0; k < 6; k++) {
          expect(e(k, e(k, u))).toBe(e(k, u)); // the second e_k closes a loop
          if (k + 1 < 6) {
            expect(e(k, e(k + 1, e(k, u)))).toBe(e(k, u));
            expect(e(k + 1, e(k, e(k + 1, u)))).toBe(e(k + 1, u));
          }
          for (let j = k + 2; j < 6; j++) expect(e(j, e(k, u))).toBe(e(k, e(j, u)));
        }
      }
    }
  });

  it('trace the identity to n - 1 loops and one letter to a kink on n - 1 loops (the Markov trace of 1 and e_k)', () => {
    // <n circles> = delta^(n - 1) and <kink> = -A^3 (Kauffman 1987), delta = -A^2 - A^-2.
    for (let n = 1; n <= 8; n++) {
      expect(sweepBracket([], n).equals(loopFactor().pow(n - 1))).toBe(true);
      for (let k = 1; k < n; k++) expect(sweepBracket([k], n).equals(Laurent.monomial(-1, 3).mul(loopFactor().pow(n - 2)))).toBe(true);
    }
  });
});

describe('bracket of a braid closure by the Temperley-Lieb sweep', () => {
  it('is that of the positive trefoil for sigma_1^3', () => {
    // <positive trefoil> = -A^5 - A^-3 + A^-7 (from V = t + t^3 - t^4, docs/conventions.md).
    expect(sweepBracket([1, 1, 1]).equals(Laurent.fromPairs([[5, -1], [-3, -1], [-7, 1]]))).toBe(true);
  });

  it('equals the state sum on random braids (property)', () => {
    fc.assert(
      fc.property(arbBraid(14, 6), fc.integer({ min: 0, max: 2 }), (w, extra) => {
        const strands = Math.max(...w.map((k) => Math.abs(k))) + 1 + extra; // unused strands are unknots
        expect(sweepBracket(w, strands).equals(stateSumBracket(fromBraid(w, strands)))).toBe(true);
      }),
      { numRuns: 60 },
    );
  });

  it('equals the general tangle contraction on random 6- to 10-strand braids of 30 to 60 crossings (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 6, max: 10 }), fc.integer({ min: 30, max: 60 }), fc.integer(), (strands, crossings, seed) => {
        const w = wideWord(strands, crossings, seed);
        const b = bracketByContraction(fromBraid(w, strands).pd);
        expect(sweepBracket(w, strands).equals(b)).toBe(true);
        expect(bracketOfBraid(w, strands).equals(b)).toBe(true); // whichever route it takes
      }),
      { numRuns: 10 },
    );
  }, 120_000);

  it('equals the general tangle contraction on long positive and negative runs (property)', () => {
    // Runs of one sign push a row's exponents one way letter after letter, so its entries must
    // move within their block (and the blocks widen) many times before the closure is taken.
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 7 }), fc.integer({ min: 20, max: 80 }), fc.integer(), (strands, crossings, seed) => {
        const rng = seededRng(seed);
        const sign = rng() < 0.5 ? 1 : -1;
        const w = Array.from({ length: crossings }, (_, i) => ((i % (strands - 1)) + 1) * (rng() < 0.9 ? sign : -sign));
        expect(sweepBracket(w, strands).equals(bracketByContraction(fromBraid(w, strands).pd))).toBe(true);
      }),
      { numRuns: 20 },
    );
  }, 60_000);

  it('gives a Jones polynomial unchanged by random Markov moves (property)', () => {
    // Markov's theorem (Birman, "Braids, links and mapping class groups", 1974): conjugation,
    // (de)stabilisation and braid relations keep the closure's link type, hence V.
    const jonesOf = (b: Braid) => jonesFromBracket(fromBraid(b.word, b.strands), sweepBracket(b.word, b.strands));
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 6 }), fc.integer({ min: 10, max: 30 }), fc.integer({ min: 1, max: 25 }), fc.integer(), (strands, crossings, moves, seed) => {
        let b: Braid = { word: wideWord(strands, crossings, seed), strands };
        const v = jonesOf(b);
        const rng = seededRng(seed ^ 0x5bd1e995);
        for (let i = 0; i < moves; i++) b = randomMarkovMove(b, rng);
        expect(jonesOf(b).equals(v)).toBe(true);
      }),
      { numRuns: 25 },
    );
  }, 60_000);
});

describe('bracketOfBraid', () => {
  it("gives the state sum's bracket for a short word on many strands and for the empty word", () => {
    // Few letters on many strands: the greedy order's cut stays below 16 ends.
    const w = [1, 3, 5, 7, -2, 6];
    expect(bracketOfBraid(w, 8).equals(stateSumBracket(fromBraid(w, 8)))).toBe(true);
    expect(bracketOfBraid([], 3).equals(Laurent.fromPairs([[4, 1], [0, 2], [-4, 1]]))).toBe(true); // 3 circles: (-A^2 - A^-2)^2
  });
});

describe('exact sums of the braid sweep', () => {
  it('give the same bracket when doubles are trusted only to 2^12 in limbs of 2 bits (property)', () => {
    let carried = 0;
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 7 }), fc.integer({ min: 20, max: 50 }), fc.integer(), (strands, crossings, seed) => {
        const w = wideWord(strands, crossings, seed);
        const small = { exactBits: 12, limbBits: 2 };
        expect(sweepBracket(w, strands, small).equals(sweepBracket(w, strands))).toBe(true);
        if (sweep(w, strands, small).some((b) => b.limbs.length > 1)) carried++;
      }),
      { numRuns: 25 },
    );
    expect(carried).toBeGreaterThan(0); // the carries were exercised, not only the one-limb path
  }, 60_000);

  it('carry a 200-crossing closure through several limbs to the bracket of the general contraction', () => {
    const w = wideWord(6, 200, 7);
    const narrow = { exactBits: 40, limbBits: 12 };
    const limbs = (precision?: typeof narrow) => Math.max(...sweep(w, 6, precision).map((b) => b.limbs.length));
    expect(limbs(narrow)).toBeGreaterThan(limbs());
    const b = bracketByContraction(fromBraid(w, 6).pd);
    expect(sweepBracket(w, 6, narrow).equals(b)).toBe(true);
    expect(sweepBracket(w, 6).equals(b)).toBe(true);
  }, 60_000);
});
