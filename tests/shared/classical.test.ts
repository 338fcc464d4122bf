// Classical invariants: Alexander (Conway-normalised), determinant, signature, Fox colourings,
// linking matrix. Published values name their source; most checks are theorems on random
// braid closures, which no choice of constants can satisfy by accident.
import fc from 'fast-check';
import { diagram, Diagram, fromBraid, fromDT, jones, Laurent, pretzelLink, rationalLink } from '@/shared/knot';
import { alexander } from '@/shared/knot/alexander';
import { determinant, integers } from '@/shared/knot/bareiss';
import { colourings, solutionsModN } from '@/shared/knot/colourings';
import { goeritzForms, linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { linkingMatrix } from '@/shared/knot/linking';
import { orient, writhe } from '@/shared/knot/pd';
import { signature } from '@/shared/knot/symmetric';
import { arbBraid } from './arbitraries';
import { determinantOf } from './roots';

const L = (pairs: [number, number][]) => Laurent.fromPairs(pairs);
const components = (d: Diagram) => orient(d.pd).components.length + d.unknots;
const mirrorBraid = (w: number[]) => w.map((k) => -k);

// Fox colourings by brute force: every labelling of the arcs by Z/n, checked at every crossing
// (2 over = in + out mod n; Fox 1962). Arcs are the classes of edges joined by the over-strands
// (b and d of X[a,b,c,d]); it checks the Smith-form count and the values from memory below.
function colouringsByEnumeration(d: Diagram, n: number): bigint {
  const parent = new Map(d.pd.flat().map((l) => [l, l]));
  const find = (l: number): number => (parent.get(l) === l ? l : find(parent.get(l)!));
  for (const [, b, , e] of d.pd) parent.set(find(b), find(e));
  const arcs = [...new Set(d.pd.flat().map(find))];
  const arcOf = (l: number) => arcs.indexOf(find(l));
  const relations = d.pd.map(([a, b, c]) => [arcOf(b), arcOf(a), arcOf(c)]);
  let count = 0n;
  for (let k = 0; k < n ** arcs.length; k++) {
    const colour = arcs.map((_, i) => Math.floor(k / n ** i) % n);
    if (relations.every(([over, into, out]) => (2 * colour[over] - colour[into] - colour[out]) % n === 0)) count++;
  }
  return count * BigInt(n) ** BigInt(d.unknots);
}

const trefoil = fromBraid([1, 1, 1]); // positive (right-handed) trefoil, docs/conventions.md
const figureEight = fromBraid([1, -2, 1, -2]);
const cinquefoil = fromBraid([1, 1, 1, 1, 1]); // 5_1 = T(2,5)
const threeTwist = fromDT([4, 8, 10, 2, 6]); // 5_2 (DT code from memory; confirmed by det 7 below)
const hopf = fromBraid([1, 1]);
const whitehead = fromBraid([1, -2, 1, -2, -2]); // the 5-crossing 2-component link, from memory
const borromean = fromBraid([1, -2, 1, -2, 1, -2]); // (s1 s2^-1)^3, Rolfsen 3.C (from memory)

describe('Alexander polynomial, Conway-normalised', () => {
  it('matches the tables for small knots', () => {
    // Rolfsen, Knots and Links, Appendix C (from memory): 3_1, 4_1, 5_1, 5_2.
    expect(alexander(trefoil).polynomial.equals(L([[-1, 1], [0, -1], [1, 1]]))).toBe(true);
    expect(alexander(figureEight).polynomial.equals(L([[-1, -1], [0, 3], [1, -1]]))).toBe(true);
    expect(alexander(cinquefoil).polynomial.equals(L([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]))).toBe(true);
    expect(alexander(threeTwist).polynomial.equals(L([[-1, 2], [0, -3], [1, 2]]))).toBe(true);
  });

  it('gives the Conway polynomial of links: Hopf z, T(2,4) 2z + z^3, Whitehead z^3, Borromean z^4', () => {
    // Conway polynomials from Lickorish, ch. 8 (from memory), with z = t^(1/2) - t^(-1/2).
    const z = L([[0.5, 1], [-0.5, -1]]);
    expect(alexander(hopf)).toEqual({ polynomial: z, conwaySign: true });
    expect(alexander(fromBraid([1, 1, 1, 1])).polynomial.equals(z.scale(2).add(z.pow(3)))).toBe(true);
    // lk = 0: Hoste's coefficient vanishes, so the sign is only our convention.
    expect(alexander(whitehead)).toEqual({ polynomial: z.pow(3), conwaySign: false });
    expect(alexander(borromean)).toEqual({ polynomial: z.pow(4), conwaySign: false });
    // The negative Hopf link has lk = -1, hence Conway polynomial -z (Hoste 1985).
    expect(alexander(fromBraid([-1, -1])).polynomial.equals(z.negate())).toBe(true);
  });

  it('is zero for split links and one for the unknot', () => {
    expect(alexander(fromBraid([1, -1])).polynomial.isZero()).toBe(true); // unlink of two
    expect(alexander(fromBraid([1, 1, 1], 3)).polynomial.isZero()).toBe(true); // trefoil + unknot
    expect(alexander(fromBraid([1, -1, 1])).polynomial.equals(Laurent.one)).toBe(true);
  });

  it('matches the torus-knot formula (Rolfsen 7.D): Delta (t^p - 1)(t^q - 1) = t^k (t^pq - 1)(t - 1)', () => {
    const xMinusOne = (e: number) => L([[e, 1], [0, -1]]);
    for (const [p, q] of [[2, 3], [2, 7], [3, 4], [3, 5], [4, 5]]) {
      const word = Array.from({ length: q }, () => Array.from({ length: p - 1 }, (_, i) => i + 1)).flat();
      const delta = alexander(fromBraid(word)).polynomial.shift(((p - 1) * (q - 1)) / 2);
      expect(delta.mul(xMinusOne(p)).mul(xMinusOne(q)).equals(xMinusOne(p * q).mul(xMinusOne(1)))).toBe(true);
    }
  });

  it('is symmetric, Delta(1/t) = (-1)^(c-1) Delta(t), with Delta(1) = 1 for knots (random braids)', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), (w) => {
        const d = fromBraid(w);
        const delta = alexander(d).polynomial;
        const c = components(d);
        expect(delta.substitute(-1).equals(c % 2 === 1 ? delta : delta.negate())).toBe(true);
        if (c === 1) expect(delta.evaluate(1)).toEqual({ num: 1n, den: 1n });
        // Mirroring sends Delta(t) to Delta(1/t) (Conway's skein relation with + and - swapped);
        // when the sign is only our convention, up to sign.
        const mirrored = alexander(fromBraid(mirrorBraid(w))).polynomial;
        const expected = delta.substitute(-1);
        if (alexander(d).conwaySign) expect(mirrored.equals(expected)).toBe(true);
        else expect(mirrored.equals(expected) || mirrored.equals(expected.negate())).toBe(true);
      }),
      { numRuns: 150 },
    );
  });
});

// A braid word, a letter position and the three words of a skein triple at that letter.
const arbSkein = arbBraid(10, 4).chain((w) =>
  fc.nat({ max: w.length - 1 }).map((i) => {
    const strands = Math.max(...w.map(Math.abs)) + 1;
    const at = (k: number) => [...w.slice(0, i), k, ...w.slice(i + 1)];
    const k = Math.abs(w[i]);
    return { strands, plus: at(k), minus: at(-k), zero: [...w.slice(0, i), ...w.slice(i + 1)] };
  }),
);

describe('skein relations at a crossing (random braids)', () => {
  it('Conway: Delta(L+) - Delta(L-) = (t^(1/2) - t^(-1/2)) Delta(L0) (Conway 1970; Lickorish, ch. 8)', () => {
    const z = L([[0.5, 1], [-0.5, -1]]);
    let checked = 0;
    fc.assert(
      fc.property(arbSkein, ({ strands, plus, minus, zero }) => {
        const [p, m, o] = [plus, minus, zero].map((w) => alexander(fromBraid(w, strands)));
        if (!p.conwaySign || !m.conwaySign || !o.conwaySign) return; // a sign we only chose
        checked++;
        expect(p.polynomial.sub(m.polynomial).equals(z.mul(o.polynomial))).toBe(true);
      }),
      { numRuns: 200 },
    );
    expect(checked).toBeGreaterThan(100);
  });

  it('signature: sigma(L+) <= sigma(L-) <= sigma(L+) + 2 and |sigma(L+-) - sigma(L0)| <= 1 (Murasugi 1965, from memory)', () => {
    fc.assert(
      fc.property(arbSkein, ({ strands, plus, minus, zero }) => {
        const [p, m, o] = [plus, minus, zero].map((w) => linkSignature(fromBraid(w, strands)));
        expect(m - p).toBeGreaterThanOrEqual(0);
        expect(m - p).toBeLessThanOrEqual(2);
        expect(Math.abs(p - o)).toBeLessThanOrEqual(1);
        expect(Math.abs(m - o)).toBeLessThanOrEqual(1);
      }),
      { numRuns: 200 },
    );
  });
});

describe('determinant and signature', () => {
  it('match the tables for small knots and links', () => {
    // Rolfsen, Appendix C, and Lickorish, ch. 8 (from memory); signature convention: the
    // positive trefoil has sigma = -2 (signature of V + V^T). Whitehead and Borromean values
    // from memory; their determinants also follow from |V(-1)| of jones.test.ts's polynomials.
    const cases: [Diagram, bigint, number][] = [
      [trefoil, 3n, -2],
      [fromBraid([-1, -1, -1]), 3n, 2],
      [figureEight, 5n, 0],
      [cinquefoil, 5n, -4],
      [hopf, 2n, -1],
      [whitehead, 8n, 1],
      [borromean, 16n, 0],
      [fromBraid([1, 2, 1, 2, 1, 2, 1, 2]), 3n, -6], // T(3,4) = 8_19: det 3, sigma -6 (from memory)
    ];
    for (const [d, det, sigma] of cases) {
      expect(linkDeterminant(d)).toBe(det);
      expect(linkSignature(d)).toBe(sigma);
    }
    expect(linkDeterminant(threeTwist)).toBe(7n);
    expect(Math.abs(linkSignature(threeTwist))).toBe(2);
  });

  it('T(2,n) has signature -(n-1) (Rolfsen 6.D, from memory) and determinant n, as its Seifert matrix says', () => {
    for (let n = 2; n <= 9; n++) {
      const d = fromBraid(new Array(n).fill(1));
      expect(linkSignature(d)).toBe(1 - n);
      // Independently of the Goeritz route: the Seifert surface of the closed 2-braid (two discs,
      // n bands) has Seifert matrix -1 on the diagonal and 1 just below it, (n-1) x (n-1), the
      // trefoil's being [[-1, 0], [1, -1]] (from memory; Lickorish, ch. 6).
      const v = Array.from({ length: n - 1 }, (_, i) => Array.from({ length: n - 1 }, (_, j) => (i === j ? -1n : i === j + 1 ? 1n : 0n)));
      const sym = v.map((row, i) => row.map((x, j) => x + v[j][i]));
      expect(signature(sym)).toBe(1 - n);
      const det = determinant(integers, sym);
      expect(linkDeterminant(d)).toBe(det < 0n ? -det : det);
      expect(det < 0n ? -det : det).toBe(BigInt(n));
    }
  });

  it('|V(-1)| = det = |Delta(-1)| (from memory: both equal |det| of a Goeritz matrix; Lickorish, ch. 9), random braids', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), (w) => {
        const d = fromBraid(w);
        const det = linkDeterminant(d);
        expect(determinantOf(jones(d))).toBe(det);
        expect(determinantOf(alexander(d).polynomial)).toBe(det);
      }),
      { numRuns: 150 },
    );
  });

  it('|V(-1)| = det = |Delta(-1)| and the shading does not matter, on pretzel and rational links too', () => {
    const nonzero = fc.integer({ min: -4, max: 4 }).filter((a) => a !== 0);
    const arbFamily = fc.oneof(
      fc.array(nonzero, { minLength: 1, maxLength: 4 }).map((a) => pretzelLink(a)),
      fc.array(fc.integer({ min: 1, max: 4 }), { minLength: 1, maxLength: 4 }).map((a) => rationalLink(a)),
    );
    fc.assert(
      fc.property(arbFamily, (d) => {
        const det = linkDeterminant(d);
        expect(determinantOf(jones(d))).toBe(det);
        expect(determinantOf(alexander(d).polynomial)).toBe(det);
        expect(linkSignature(d, 1)).toBe(linkSignature(d, 0));
      }),
      { numRuns: 150 },
    );
  });

  it('does not depend on the choice of shading (Gordon-Litherland 1978, Theorem 6)', () => {
    fc.assert(
      fc.property(arbBraid(12, 5), (w) => {
        const d = fromBraid(w);
        expect(linkSignature(d, 1)).toBe(linkSignature(d, 0));
      }),
      { numRuns: 150 },
    );
  });

  it('changes sign under mirroring, and for knots sign(Delta(-1)) = (-1)^(sigma/2) (Levine 1969, from memory)', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), (w) => {
        const d = fromBraid(w);
        const sigma = linkSignature(d);
        expect(linkSignature(fromBraid(mirrorBraid(w))) + sigma).toBe(0);
        if (components(d) !== 1) return;
        expect(Math.abs(sigma) % 2).toBe(0);
        const value = alexander(d).polynomial.evaluate(-1).num;
        expect(value > 0n ? 1 : -1).toBe((sigma / 2) % 2 === 0 ? 1 : -1);
      }),
      { numRuns: 150 },
    );
  });

  it('is bounded by the crossings, and sigma = c - 1 mod 2 when det != 0 (Murasugi 1965, from memory)', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), (w) => {
        const d = fromBraid(w);
        const sigma = linkSignature(d);
        expect(Math.abs(sigma)).toBeLessThanOrEqual(d.pd.length);
        if (linkDeterminant(d) !== 0n) expect(Math.abs(sigma + components(d) - 1) % 2).toBe(0);
      }),
      { numRuns: 150 },
    );
  });
});

describe('Fox colourings', () => {
  it('counts the colourings of small knots', () => {
    // Lickorish, ch. 3 / Fox 1962 (from memory): the trefoil has 9 three-colourings (3 constant),
    // the figure-eight only the 3 constant ones but 25 five-colourings.
    expect(colourings(trefoil, 3)).toBe(9n);
    expect(colourings(figureEight, 3)).toBe(3n);
    expect(colourings(figureEight, 5)).toBe(25n);
    expect(colourings(fromBraid([1, -1]), 3)).toBe(9n); // two-component unlink: 3^2
    expect(colourings(fromBraid([1, 1, 1], 3), 3)).toBe(27n); // trefoil + a free unknot
    // Mod 2 the relation says in = out: one colour per component, 2^c colourings (common practice).
    expect(colourings(borromean, 2)).toBe(8n);
    // The same counts by enumerating all labellings, independently of the values above.
    for (const [d, n, count] of [[trefoil, 3, 9n], [figureEight, 3, 3n], [figureEight, 5, 25n], [borromean, 2, 8n]] as const) {
      expect(colouringsByEnumeration(d, n)).toBe(count);
    }
  });

  it('the Smith-form count equals enumeration of all labellings (random braids)', () => {
    fc.assert(
      fc.property(arbBraid(7, 3), fc.constantFrom(2, 3, 4, 5), (w, n) => {
        const d = fromBraid(w);
        expect(colourings(d, n)).toBe(colouringsByEnumeration(d, n));
      }),
      { numRuns: 60 },
    );
  });

  it('equal n * |Hom(coker Goeritz, Z/n)| (the Goeritz matrix presents H_1 of the double branched cover; Lickorish ch. 9)', () => {
    fc.assert(
      fc.property(arbBraid(10, 4), fc.integer({ min: 2, max: 12 }), (w, n) => {
        const d = fromBraid(w);
        const forms = goeritzForms(orient(d.pd));
        if (forms.length !== 1 || d.unknots > 0) return;
        const g = forms[0].matrix;
        const entries = g.flatMap((row, i) => row.map((v, j) => [i, j, v] as const));
        expect(colourings(d, n)).toBe(BigInt(n) * solutionsModN(g.length, g.length, entries, n));
      }),
      { numRuns: 150 },
    );
  });
});

describe('linking matrix', () => {
  it('gives the published linking numbers', () => {
    // Rolfsen 5.D (from memory): Hopf +-1, Whitehead 0, Borromean 0 pairwise, T(2,4) 2.
    expect(linkingMatrix(hopf)).toEqual([[0, 1], [1, 0]]);
    expect(linkingMatrix(fromBraid([-1, -1]))).toEqual([[0, -1], [-1, 0]]);
    expect(linkingMatrix(whitehead)[0][1]).toBe(0);
    const b = linkingMatrix(borromean);
    expect([b[0][1], b[0][2], b[1][2]]).toEqual([0, 0, 0]);
    expect(linkingMatrix(fromBraid([1, 1, 1, 1]))[0][1]).toBe(2);
    expect(linkingMatrix(trefoil)).toEqual([[3]]); // diagonal: blackboard framing = self-writhe
  });

  it('carries set framings on the diagonal, blackboard framings where none is set', () => {
    const t4 = fromBraid([1, 1, 1, 1]);
    expect(linkingMatrix(diagram(t4.pd, { framings: [-3, null] }))).toEqual([[-3, 2], [2, 0]]);
    const kinked = diagram([[1, 1, 2, 2]]); // a positive kink: blackboard framing +1
    expect(linkingMatrix(kinked)).toEqual([[1]]);
    expect(linkingMatrix(diagram([[1, 1, 2, 2]], { framings: [0] }))).toEqual([[0]]);
  });

  it('is symmetric, integral, and its entries add up to the writhe (common practice)', () => {
    fc.assert(
      fc.property(arbBraid(12, 5), (w) => {
        const d = fromBraid(w);
        const m = linkingMatrix(d);
        let total = 0;
        m.forEach((row, i) =>
          row.forEach((v, j) => {
            expect(Number.isInteger(v)).toBe(true);
            expect(m[j][i]).toBe(v);
            total += v; // each pair (i, j) and (j, i): 2 lk = the signs between them
          }),
        );
        expect(total).toBe(writhe(orient(d.pd)));
      }),
      { numRuns: 150 },
    );
  });
});
