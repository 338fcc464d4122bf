// The Rasmussen s-invariant of a knot (Rasmussen, "Khovanov homology and the slice genus", 2010,
// arXiv math/0402131) over Q and over F2, from the deformed theory of theory.ts computed by
// Bar-Natan's local algorithm (shared/khovanov/engine.ts, arXiv math/0606318).
// The closed complex is one of free graded k[H]-modules whose entries are c H^m, m > 0 once the
// units are cancelled. Cancelling an entry of least m is a change of basis that splits off
// k[H] --H^m--> k[H] (H-torsion), as H^m divides its row and column; what is left is the free
// part: for a knot two copies of k[H] in homological degree 0, generated in q-degrees s - 1
// and s + 1 (the graded form of Lee's generators in filtration degrees s -+ 1, Rasmussen 2010,
// Sect. 3; Bar-Natan and Morrison, arXiv math/0606542). Sign convention (docs/conventions.md):
// the positive trefoil has s = 2, and for alternating knots s = -signature.

import { EngineOptions, localComplex } from '../khovanov/engine';
import { cancel } from '../khovanov/simplify';
import { diagram } from '../knot/diagram';
import { orient, PDCode } from '../knot/pd';
import { primeField, rationals, Ring } from '../linalg/ring';
import { deformedTheory } from './theory';

export type SField = 'Q' | 'F2';
export const S_FIELDS: readonly SField[] = ['Q', 'F2'];

/** A generator of the deformed homology's free part, or of the complex at H = 0, by (i, j). */
export interface Graded {
  readonly i: number;
  readonly j: number;
}

export interface DeformedHomology {
  /** Generators of the simplified complex: at H = 0 its differential vanishes, so this is Khovanov homology over k. */
  readonly atZero: Graded[];
  /** Generators of the free part. */
  readonly free: Graded[];
  /** Summands k[H]/(H^power) generated at (i, j). */
  readonly torsion: (Graded & { readonly power: number })[];
}

type Options = Pick<EngineOptions, 'onProgress' | 'signal'>;

export interface SOptions extends Options {
  /** Extra crossingless unknot components; default 1 for the empty code (the unknot), else 0. */
  readonly unknots?: number;
}

const rings: Record<SField, Ring<unknown>> = { Q: rationals as Ring<unknown>, F2: primeField(2) as Ring<unknown> };

/**
 * Homology over k[H] of the deformed theory of the link of a PD code (validated first,
 * PDError when invalid; the empty code is the empty link, k[H] at (0,0)). KhCancelled when
 * `signal.aborted` becomes true.
 */
export function deformedHomology(pd: PDCode, field: SField, options: Options = {}): DeformedHomology {
  diagram(pd); // validates the code before any work
  const { cx, nPlus, nMinus } = localComplex(pd, rings[field], options, deformedTheory);
  const grade = (k: number): Graded => ({ i: cx.objs[k].height - nMinus, j: cx.objs[k].shift + nPlus - 2 * nMinus });
  const alive = (): number[] => cx.objs.flatMap((_, k) => (cx.alive[k] ? [k] : []));
  const atZero = alive().map(grade);
  const torsion: DeformedHomology['torsion'] = [];
  // An entry s -> t is c H^m with m = (shift t - shift s) / 2. Cancelling one of least m only
  // adds entries of power >= m, so the entries of each power are cancelled in passes, least first.
  const power = (s: number, t: number): number => (cx.objs[t].shift - cx.objs[s].shift) / 2;
  for (;;) {
    const entries = alive().flatMap((s) => [...cx.out[s].keys()].map((t): [number, number] => [s, t]));
    if (entries.length === 0) break;
    const least = entries.reduce((m, [s, t]) => Math.min(m, power(s, t)), Infinity);
    for (const [s, t] of entries) {
      const c = cx.out[s].get(t)?.get(0);
      if (c === undefined || power(s, t) !== least) continue; // gone with an earlier cancellation
      torsion.push({ ...grade(t), power: least });
      cancel(cx, s, t, cx.ring.neg(cx.ring.inv(c)));
    }
  }
  return { atZero, free: alive().map(grade), torsion };
}

/**
 * The s-invariant of a knot over Q or F2. RangeError for a link of several components (s is
 * defined for knots here).
 */
export function rasmussenS(pd: PDCode, field: SField, options: SOptions = {}): number {
  const unknots = options.unknots ?? (pd.length === 0 ? 1 : 0);
  const components = orient(pd).components.length + unknots;
  if (components !== 1) throw new RangeError(`s is defined for knots here; this link has ${components} components`);
  // A crossingless unknot (then pd is empty) tensors on A, free over k[H] at q = +1 and -1.
  const free = deformedHomology(pd, field, options).free.flatMap((g) => (unknots === 1 ? [{ ...g, j: g.j + 1 }, { ...g, j: g.j - 1 }] : [g]));
  const [lo, hi] = free.map((g) => g.j).sort((a, b) => a - b);
  if (free.length !== 2 || free.some((g) => g.i !== 0) || hi - lo !== 2) {
    throw new Error(`internal: the free part of a knot's deformed homology is ${JSON.stringify(free)}, not two generators at (0, s -+ 1)`);
  }
  return lo + 1;
}

export interface SliceGenusBounds {
  /** |s|/2 <= g4 (Rasmussen 2010, Theorem 1). */
  readonly fromS: number;
  /** |sigma|/2 <= g4 (Murasugi, "On a certain numerical invariant of link types", 1965). */
  readonly fromSignature: number;
  readonly stronger: 's' | 'signature' | 'equal';
}

/** The two lower bounds on the slice genus of a knot with these s and signature, and which is larger. */
export function sliceGenusBounds(s: number, signature: number): SliceGenusBounds {
  const fromS = Math.abs(s) / 2;
  const fromSignature = Math.abs(signature) / 2;
  return { fromS, fromSignature, stronger: fromS > fromSignature ? 's' : fromS < fromSignature ? 'signature' : 'equal' };
}

/** "Slice genus ≥ 1: |s|/2 = 1, |σ|/2 = 1, the same bound", as the Readout and the run page say it. */
export function sliceBoundsText(b: SliceGenusBounds): string {
  const which = { equal: 'the same bound', s: 'the bound from s is stronger', signature: 'the bound from σ is stronger' }[b.stronger];
  return `Slice genus ≥ ${Math.max(b.fromS, b.fromSignature)}: |s|/2 = ${b.fromS}, |σ|/2 = ${b.fromSignature}, ${which}`;
}
