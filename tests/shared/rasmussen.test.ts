// The Rasmussen s-invariant over Q and F2: published values and theorems on generated knots,
// invariance under random moves, and the deformed complex at H = 0 against the Khovanov engine.
// Sign convention of docs/conventions.md: the positive trefoil has s = 2.

import { khovanov } from '@/shared/khovanov';
import { fromBraid } from '@/shared/knot/braid';
import { Diagram } from '@/shared/knot/diagram';
import { connectedSum, mirror, pretzelLink, rationalLink, torusLink } from '@/shared/knot/families';
import { linkSignature } from '@/shared/knot/goeritz';
import { Braid, randomMarkovMove, randomMoves, seededRng } from '@/shared/knot/moves';
import { orient, PDCode } from '@/shared/knot/pd';
import { deformedHomology, rasmussenS, S_FIELDS, SField } from '@/shared/rasmussen';
import { randomWord } from './khovanov-fixtures';

const isKnot = (d: Diagram): boolean => orient(d.pd).components.length + d.unknots === 1;
const s = (d: Diagram, field: SField = 'Q'): number => rasmussenS(d.pd, field, { unknots: d.unknots });
/** Alternating: along every edge an over-crossing follows an under-crossing (slots 0, 2 are under). */
const alternatingCode = (pd: PDCode): boolean => {
  const parities = new Map<number, number[]>();
  pd.forEach((x) => x.forEach((l, p) => parities.set(l, [...(parities.get(l) ?? []), p % 2])));
  return [...parities.values()].every(([a, b]) => a !== b);
};

const rnd = seededRng(20261202);
const knotsFromWords = (count: number, strands: number, length: number, alternating = false): Diagram[] =>
  Array.from({ length: 12 * count }, () => fromBraid(randomWord(rnd, strands, length, alternating)))
    .filter(isKnot)
    .slice(0, count);
const general = [...knotsFromWords(6, 3, 8), ...knotsFromWords(6, 4, 11)];

describe('published values', () => {
  it('the unknot has s = 0; a link of several components is refused', () => {
    expect(rasmussenS([], 'Q')).toBe(0);
    expect(s(fromBraid([1, -2, 1, -2]))).toBe(0); // figure-eight: alternating, signature 0 (Rasmussen 2010)
    expect(() => rasmussenS(torusLink(2, 4).pd, 'Q')).toThrow('s is defined for knots here');
  });

  // Rasmussen, "Khovanov homology and the slice genus", 2010, arXiv math/0402131: s(T(p,q)) = (p-1)(q-1) for p, q > 0.
  it.each([
    [2, 3],
    [2, 5],
    [3, 4],
    [2, 9],
    [3, 5],
    [3, 7],
    [4, 5],
  ])('T(%i,%i): s = (p-1)(q-1) over Q and F2, and -(p-1)(q-1) for the mirror', (p, q) => {
    const d = torusLink(p, q);
    for (const field of S_FIELDS) {
      expect([field, s(d, field)]).toEqual([field, (p - 1) * (q - 1)]);
      expect([field, s(mirror(d), field)]).toEqual([field, -(p - 1) * (q - 1)]);
    }
  });
});

describe('theorems on generated knots', () => {
  // Lee, "An endomorphism of the Khovanov invariant", 2005, arXiv math/0210213, with Rasmussen 2010
  // (Theorem 3): s = -signature for alternating knots, with our signs (docs/conventions.md).
  it('alternating knots: s = -signature', () => {
    const alternating = [
      ...knotsFromWords(6, 3, 10, true),
      ...knotsFromWords(4, 4, 11, true),
      ...[[3, 1, 2], [2, 2, 3], [5, 2], [1, 3, 1, 2], [4, 1, 3]].map((f) => rationalLink(f)).filter(isKnot),
      ...[[3, 3, 3], [3, 5, 1], [-3, -3, -5]].map((a) => pretzelLink(a)).filter(isKnot),
    ];
    expect(alternating.length).toBeGreaterThanOrEqual(12);
    for (const d of alternating) {
      expect(alternatingCode(d.pd)).toBe(true);
      expect([d.pd.length, s(d) + linkSignature(d)]).toEqual([d.pd.length, 0]);
    }
  });

  // Rasmussen 2010 (positive knots): the closure of a positive braid with c crossings on n strands has s = c - n + 1.
  it('positive braid closures that are knots: s = c - n + 1', () => {
    const positive = [3, 4, 5].flatMap((n) =>
      Array.from({ length: 40 }, () => randomWord(rnd, n, n + 3 + Math.floor(rnd() * 6)).map(Math.abs))
        .filter((w) => isKnot(fromBraid(w)))
        .slice(0, 3),
    );
    expect(positive.length).toBe(9);
    for (const w of positive) {
      const n = Math.max(...w) + 1;
      expect([w.join(' '), s(fromBraid(w))]).toEqual([w.join(' '), w.length - n + 1]);
    }
  });

  // Rasmussen 2010: s(mirror K) = -s(K), and s is additive under connected sum.
  it('mirror: -s; connected sum: s(K1 # K2) = s(K1) + s(K2)', () => {
    const values = general.map((d) => s(d));
    general.forEach((d, k) => expect(s(mirror(d)) + values[k]).toBe(0));
    for (let k = 0; k + 1 < 8; k += 2) {
      expect(s(connectedSum(general[k], general[k + 1]))).toBe(values[k] + values[k + 1]);
      expect(s(connectedSum(general[k], mirror(general[k + 1])))).toBe(values[k] - values[k + 1]);
    }
  });

  // Common practice: s over Q and over F2 are known to differ only on rare knots far larger than these.
  it('Q and F2 agree on the knots tested (up to 12 crossings)', () => {
    const knots = [...general, ...[[2, 1, 1, 2], [3, 2, 2]].map((f) => rationalLink(f)).filter(isKnot), pretzelLink([-2, 3, 7])];
    for (const d of knots) {
      expect(d.pd.length).toBeLessThanOrEqual(12);
      expect([d.pd.length, s(d, 'F2')]).toEqual([d.pd.length, s(d, 'Q')]);
    }
  });
});

describe('invariance', () => {
  it('s is unchanged by random Reidemeister moves (over Q and F2)', () => {
    general.slice(0, 6).forEach((d, k) => {
      const moved = randomMoves(d, 4 + (k % 4), 700 + k);
      for (const field of S_FIELDS) expect([k, field, s(moved, field)]).toEqual([k, field, s(d, field)]);
    });
  });

  it('s is unchanged by random Markov moves on braid words (over Q and F2)', () => {
    const rng = seededRng(11);
    const words = Array.from({ length: 40 }, () => randomWord(rnd, 3, 8))
      .filter((w) => isKnot(fromBraid(w)))
      .slice(0, 4);
    expect(words.length).toBe(4);
    for (const word of words) {
      let b: Braid = { word, strands: 3 };
      for (let m = 0; m < 5; m++) b = randomMarkovMove(b, rng);
      for (const field of S_FIELDS) {
        expect([word.join(' '), field, s(fromBraid(b.word, b.strands), field)]).toEqual([word.join(' '), field, s(fromBraid(word), field)]);
      }
    }
  });
});

describe('the deformed complex at H = 0', () => {
  // Setting H = 0 gives Khovanov's theory (Bar-Natan 2005, arXiv math/0410495), and the
  // simplified complex has no differential left at H = 0, so its generators are Khovanov homology over k.
  it('is Khovanov homology over the same field, for knots and links', () => {
    const links = [...general.slice(0, 5).map((d) => d.pd), torusLink(2, 4).pd, torusLink(3, 3).pd, fromBraid([1, -2, 1, -2, 1, -2]).pd];
    for (const pd of links) {
      for (const field of S_FIELDS) {
        const counts = new Map<string, number>();
        for (const g of deformedHomology(pd, field).atZero) counts.set(`${g.i},${g.j}`, (counts.get(`${g.i},${g.j}`) ?? 0) + 1);
        const kh = khovanov(pd, { ring: field, eulerCheck: false }).groups.map((g): [string, number] => [`${g.i},${g.j}`, g.free]);
        expect([field, [...counts].sort()]).toEqual([field, kh.sort()]);
      }
    }
  });

  it('the free part has rank 2^components (Lee 2005; Bar-Natan and Morrison, arXiv math/0606542)', () => {
    for (const pd of [torusLink(2, 4).pd, torusLink(3, 3).pd, fromBraid([1, -2, 1, -2, 1, -2]).pd, torusLink(2, 5).pd]) {
      for (const field of S_FIELDS) expect(deformedHomology(pd, field).free.length).toBe(2 ** orient(pd).components.length);
    }
  });
});
