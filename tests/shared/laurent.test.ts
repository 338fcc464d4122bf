import fc from 'fast-check';
import { Laurent } from '@/shared/poly/laurent';

const L = (pairs: [number, number][]) => Laurent.fromPairs(pairs);
const arbPoly = fc
  .array(fc.tuple(fc.integer({ min: -8, max: 8 }).map((e) => e / 2), fc.integer({ min: -20, max: 20 })), { maxLength: 6 })
  .map((pairs) => Laurent.fromPairs(pairs));

describe('Laurent polynomials', () => {
  it('normalises: sums repeated exponents, drops zeros, sorts', () => {
    const p = L([[3, 1], [1, 2], [3, -1], [0.5, 4], [1, 1]]);
    expect(p.toPairs()).toEqual([[0.5, 4n], [1, 3n]]);
    expect(L([[2, 0]]).isZero()).toBe(true);
  });

  it('ring laws hold (property test)', () => {
    fc.assert(
      fc.property(arbPoly, arbPoly, arbPoly, (p, q, r) => {
        expect(p.add(q).equals(q.add(p))).toBe(true);
        expect(p.mul(q).equals(q.mul(p))).toBe(true);
        expect(p.mul(q.add(r)).equals(p.mul(q).add(p.mul(r)))).toBe(true);
        expect(p.sub(p).isZero()).toBe(true);
        expect(p.mul(Laurent.one).equals(p)).toBe(true);
        expect(p.pow(3).equals(p.mul(p).mul(p))).toBe(true);
      }),
    );
  });

  it('multiplies exactly beyond 2^53 (BigInt)', () => {
    const p = Laurent.fromPairs([[0, 1n], [1, 1n]]).pow(80); // (1+x)^80, binomial coefficients
    expect(p.coefficient(40)).toBe(107507208733336176461620n); // C(80,40), common practice (Pascal)
    const json = p.toJSON();
    expect(json[0]).toEqual([0, 1]);
    expect(json[40]).toEqual([40, '107507208733336176461620']);
    expect(Laurent.fromJSON(json).equals(p)).toBe(true);
  });

  it('inverts monomials only', () => {
    expect(L([[3, -1]]).pow(-2).toPairs()).toEqual([[-6, 1n]]);
    expect(L([[1, -1]]).pow(-3).toPairs()).toEqual([[-3, -1n]]);
    expect(() => L([[1, 1], [0, 1]]).pow(-1)).toThrow(/negative power/);
  });

  it('substitutes x -> c x^k', () => {
    // A -> t^(-1/4) on A^-4 + A^2
    expect(L([[-4, 1], [2, 1]]).substitute(-0.25).toPairs()).toEqual([[-0.5, 1n], [1, 1n]]);
    // x -> -x^2 on 1 + 2x + 3x^3: 1 - 2x^2 - 3x^6
    expect(L([[0, 1], [1, 2], [3, 3]]).substitute(2, -1).toPairs()).toEqual([[0, 1n], [2, -2n], [6, -3n]]);
    expect(() => L([[0.5, 1]]).substitute(1, 2)).toThrow(/fractional/);
  });

  it('evaluates at integers exactly', () => {
    expect(L([[1, 1], [3, 1], [4, -1]]).evaluate(1)).toEqual({ num: 1n, den: 1n });
    expect(L([[-1, 1], [0, 1]]).evaluate(2)).toEqual({ num: 3n, den: 2n });
    expect(L([[-2, 3], [0, 1]]).evaluate(-3)).toEqual({ num: 4n, den: 3n });
    expect(() => L([[0.5, 1]]).evaluate(4)).toThrow(/fractional/);
    expect(() => L([[1 / 3, 1]])).toThrow('exponent 0.3333333333333333 is not a multiple of 1/1024');
  });

  it('prints in three styles', () => {
    const v = L([[1, 1], [3, 1], [4, -1]]);
    expect(v.format('t')).toBe('t + t^3 - t^4');
    expect(v.format('t', 'unicode')).toBe('t + t³ − t⁴');
    expect(v.format('t', 'latex')).toBe('t + t^{3} - t^{4}');
    const h = L([[-2.5, -2], [-0.5, 1], [0, 3]]);
    expect(h.format('t')).toBe('-2t^(-5/2) + t^(-1/2) + 3');
    expect(h.format('t', 'unicode')).toBe('−2t⁻⁵ᐟ² + t⁻¹ᐟ² + 3');
    expect(h.format('t', 'latex')).toBe('-2t^{-5/2} + t^{-1/2} + 3');
    expect(Laurent.zero.format()).toBe('0');
    expect(L([[0, -1]]).format()).toBe('-1');
  });
});
