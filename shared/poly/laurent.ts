// Laurent polynomials in one variable with exact BigInt coefficients. Exponents are JS numbers
// and may be fractions with a power-of-two denominator up to 1024 (halves for the Jones
// polynomial of links with an even number of components, quarters in passing when
// A = t^(-1/4)); those are exact in floating point, so exponents can be compared with ===.

export type Coefficient = bigint | number;
/** [exponent, coefficient] as it travels in JSON: a number, or a decimal string beyond 2^53. */
export type JsonTerm = [number, number | string];

export interface Fraction {
  readonly num: bigint;
  /** Always positive; the fraction is in lowest terms. */
  readonly den: bigint;
}

export type Style = 'plain' | 'unicode' | 'latex';

const toBig = (c: Coefficient): bigint => {
  if (typeof c === 'bigint') return c;
  if (!Number.isSafeInteger(c)) throw new RangeError(`coefficient ${c} is not a safe integer; pass a BigInt`);
  return BigInt(c);
};

const checkExponent = (e: number): number => {
  if (!Number.isFinite(e) || !Number.isInteger(e * 1024)) throw new RangeError(`exponent ${e} is not a multiple of 1/1024`);
  return e === 0 ? 0 : e; // fold -0 into 0
};

export class Laurent {
  /** Terms sorted by increasing exponent, no zero coefficients, no repeated exponents. */
  private constructor(private readonly terms: readonly (readonly [number, bigint])[]) {}

  static readonly zero = new Laurent([]);
  static readonly one = new Laurent([[0, 1n]]);

  /** Builds from [exponent, coefficient] pairs in any order; repeated exponents are summed. */
  static fromPairs(pairs: Iterable<readonly [number, Coefficient | string]>): Laurent {
    const sums = new Map<number, bigint>();
    for (const [e, c] of pairs) {
      const exp = checkExponent(e);
      sums.set(exp, (sums.get(exp) ?? 0n) + (typeof c === 'string' ? BigInt(c) : toBig(c)));
    }
    return Laurent.fromMap(sums);
  }

  /** c * x^e. */
  static monomial(c: Coefficient, e = 0): Laurent {
    return Laurent.fromPairs([[e, c]]);
  }

  /** Dense coefficients: coeffs[i] is the coefficient of x^(offset + i), offset an integer. */
  static fromDense(coeffs: readonly bigint[], offset: number): Laurent {
    const terms: [number, bigint][] = [];
    coeffs.forEach((c, i) => {
      if (c !== 0n) terms.push([checkExponent(offset + i), c]);
    });
    return new Laurent(terms);
  }

  private static fromMap(sums: Map<number, bigint>): Laurent {
    const terms = [...sums].filter(([, c]) => c !== 0n).sort((p, q) => p[0] - q[0]);
    return new Laurent(terms);
  }

  isZero(): boolean {
    return this.terms.length === 0;
  }

  /** Lowest and highest exponent; undefined for the zero polynomial. */
  span(): { min: number; max: number } | undefined {
    if (this.isZero()) return undefined;
    return { min: this.terms[0][0], max: this.terms[this.terms.length - 1][0] };
  }

  coefficient(e: number): bigint {
    return this.terms.find(([x]) => x === e)?.[1] ?? 0n;
  }

  toPairs(): [number, bigint][] {
    return this.terms.map(([e, c]) => [e, c]);
  }

  /** Coefficients as JSON numbers, or decimal strings when beyond 2^53. */
  toJSON(): JsonTerm[] {
    return this.terms.map(([e, c]) => {
      const n = Number(c);
      return [e, Number.isSafeInteger(n) ? n : c.toString()];
    });
  }

  static fromJSON(json: readonly (readonly [number, number | string])[]): Laurent {
    return Laurent.fromPairs(json);
  }

  add(q: Laurent): Laurent {
    return Laurent.fromPairs([...this.terms, ...q.terms]);
  }

  negate(): Laurent {
    return new Laurent(this.terms.map(([e, c]) => [e, -c]));
  }

  sub(q: Laurent): Laurent {
    return this.add(q.negate());
  }

  scale(k: Coefficient): Laurent {
    const b = toBig(k);
    return b === 0n ? Laurent.zero : new Laurent(this.terms.map(([e, c]) => [e, c * b]));
  }

  /** Multiplies by x^s. */
  shift(s: number): Laurent {
    return new Laurent(this.terms.map(([e, c]) => [checkExponent(e + s), c]));
  }

  mul(q: Laurent): Laurent {
    const sums = new Map<number, bigint>();
    for (const [e1, c1] of this.terms) {
      for (const [e2, c2] of q.terms) {
        const e = checkExponent(e1 + e2);
        sums.set(e, (sums.get(e) ?? 0n) + c1 * c2);
      }
    }
    return Laurent.fromMap(sums);
  }

  /** this^n; n may be negative only for a monomial (the only invertible elements). */
  pow(n: number): Laurent {
    if (!Number.isInteger(n)) throw new RangeError(`power ${n} is not an integer`);
    if (n < 0) {
      if (this.terms.length !== 1 || (this.terms[0][1] !== 1n && this.terms[0][1] !== -1n)) {
        throw new RangeError('only ±x^e can be raised to a negative power');
      }
      const [e, c] = this.terms[0];
      return new Laurent([[checkExponent(e * n), n % 2 === 0 ? 1n : c]]);
    }
    let result: Laurent = Laurent.one;
    let base: Laurent = this.mul(Laurent.one);
    for (let k = n; k > 0; k >>= 1) {
      if (k & 1) result = result.mul(base);
      if (k > 1) base = base.mul(base);
    }
    return result;
  }

  /** Substitutes x -> c * x^k: the term a x^e becomes a c^e x^(k e); c^e needs e integral unless c = 1. */
  substitute(k: number, c: Coefficient = 1n): Laurent {
    const b = toBig(c);
    if (b === 0n) throw new RangeError('cannot substitute x -> 0 * x^k');
    return Laurent.fromPairs(
      this.terms.map(([e, a]) => {
        if (b === 1n) return [k * e, a];
        if (!Number.isInteger(e)) throw new RangeError(`cannot raise ${b} to the fractional power ${e}`);
        if (e >= 0) return [k * e, a * b ** BigInt(e)];
        const d = b ** BigInt(-e);
        if (a % d !== 0n) throw new RangeError(`substitution x -> ${b} x^${k} leaves non-integer coefficients`);
        return [k * e, a / d];
      }),
    );
  }

  /** The value at an integer x, as an exact fraction. Fractional exponents are rejected, as are negative ones at 0. */
  evaluate(x: Coefficient): Fraction {
    const v = toBig(x);
    let num = 0n;
    let den = 1n;
    for (const [e, c] of this.terms) {
      if (!Number.isInteger(e)) throw new RangeError(`cannot evaluate the fractional power x^${e} at an integer`);
      if (e < 0 && v === 0n) throw new RangeError('cannot evaluate a negative power at 0');
      // num/den + c v^e
      if (e >= 0) num += c * v ** BigInt(e) * den;
      else {
        const p = v ** BigInt(-e);
        num = num * p + c * den;
        den *= p;
      }
    }
    return reduce(num, den);
  }

  equals(q: Laurent): boolean {
    return this.terms.length === q.terms.length && this.terms.every(([e, c], i) => e === q.terms[i][0] && c === q.terms[i][1]);
  }

  /** Written in increasing exponent, e.g. "t + t^3 - t^4" (plain), "t + t³ − t⁴", "t + t^{3} - t^{4}". */
  format(variable = 't', style: Style = 'plain'): string {
    if (this.isZero()) return '0';
    const minus = style === 'unicode' ? '−' : '-';
    return this.terms
      .map(([e, c], i) => {
        const negative = c < 0n;
        const abs = negative ? -c : c;
        const power = e === 0 ? '' : variable + exponentText(e, style);
        const body = abs === 1n && power !== '' ? power : abs.toString() + power;
        if (i === 0) return (negative ? minus : '') + body;
        return ` ${negative ? minus : '+'} ${body}`;
      })
      .join('');
  }

  toString(): string {
    return this.format();
  }
}

function reduce(num: bigint, den: bigint): Fraction {
  const abs = (x: bigint) => (x < 0n ? -x : x);
  let a = abs(num);
  let b = den;
  while (b !== 0n) [a, b] = [b, a % b];
  const g = a === 0n ? den : a;
  return { num: num / g, den: den / g };
}

const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻', '/': 'ᐟ',
};

// An exponent as a reduced fraction p/q, q a power of two.
function fractionText(e: number): string {
  let q = 1;
  while (!Number.isInteger(e * q)) q *= 2;
  return q === 1 ? `${e}` : `${e * q}/${q}`;
}

function exponentText(e: number, style: Style): string {
  if (e === 1) return '';
  const text = fractionText(e);
  if (style === 'latex') return `^{${text}}`;
  if (style === 'unicode') return [...text].map((ch) => SUPERSCRIPT[ch]).join('');
  return Number.isInteger(e) ? `^${text}` : `^(${text})`;
}
