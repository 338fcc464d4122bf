// Khovanov homology of a link given by a PD code: the public entry point of the engine.

import { diagram } from '../knot/diagram';
import { jones } from '../knot/jones';
import { orient, PDCode } from '../knot/pd';
import { integers, primeField, rationals, Ring } from '../linalg/ring';
import { Laurent } from '../poly/laurent';
import { EngineOptions, fastKhovanov, KhCancelled, Progress } from './engine';
import { KhGroup } from './homology';
import { programVersion } from '../version';
import { poincareFormat } from './format';
import { eulerCharacteristic, expectedEuler, poincare, width } from './summary';

export { KhCancelled };
export type { KhGroup, Progress };

/**
 * The ground ring: 'Z' (integers, with torsion), 'Q', or the prime field F_p written 'F2',
 * 'F3', ... or { p: 5 }.
 */
export type KhRing = 'Z' | 'Q' | `F${number}` | { readonly p: number };

export interface KhOptions {
  readonly ring: KhRing;
  /** Reduced homology, at the component `component` (default 0: the first one orient() finds). */
  readonly reduced?: boolean;
  readonly component?: number;
  /**
   * Extra crossingless unknot components, numbered after the PD code's components. Default:
   * 1 for the empty PD code (the unknot), 0 otherwise.
   */
  readonly unknots?: number;
  /** Compare the Euler characteristic with the Jones polynomial (default true). */
  readonly eulerCheck?: boolean;
  readonly onProgress?: (p: Progress) => void;
  /** Anything with `aborted` (an AbortSignal will do); checked between steps. */
  readonly signal?: { readonly aborted: boolean };
}

export interface KhResult {
  /** The canonical ring name: 'Z', 'Q' or 'F<p>'. */
  readonly ring: string;
  readonly reduced: boolean;
  /** Reduced: the marked component, numbered from 0 in the order of docs/conventions.md (Framings and cables). */
  readonly component?: number;
  /** Nonzero groups sorted by i then j; over a field `torsion` is []. */
  readonly groups: KhGroup[];
  /** [i, j, rank] terms of sum rank h^i q^j (free ranks over Z), and the same as text. */
  readonly poincare: [number, number, number][];
  readonly poincareText: string;
  /** Graded Euler characteristic and what the Jones polynomial says it must be, as [exponent of q, coefficient]. */
  readonly euler?: { readonly computed: [number, string][]; readonly expected: [number, string][]; readonly ok: boolean };
  /** Number of diagonals j - 2i carrying homology; thin = at most 2 (unreduced) or 1 (reduced). */
  readonly width: number;
  readonly thin: boolean;
  /** The program version that computed it. */
  readonly version: string;
}

export function parseRing(ring: KhRing): { name: string; ring: Ring<unknown> } {
  if (ring === 'Z') return { name: 'Z', ring: integers as Ring<unknown> };
  if (ring === 'Q') return { name: 'Q', ring: rationals as Ring<unknown> };
  const p = typeof ring === 'object' ? ring.p : /^F\d+$/.test(ring) ? Number(ring.slice(1)) : NaN;
  if (Number.isNaN(p)) throw new RangeError(`unknown ring ${JSON.stringify(ring)}; use 'Z', 'Q', 'F<p>' or { p }`);
  const field = primeField(p);
  return { name: field.name, ring: field as Ring<unknown> };
}

/**
 * Khovanov homology of the link with this PD code (validated first; PDError when invalid), by
 * Bar-Natan's local algorithm. Degenerate inputs: the empty code is the unknot unless
 * `unknots` says otherwise (unknots: 0 gives the empty link, Z at (0,0)); kinks (a label twice
 * in one crossing) and split diagrams are fine. RangeError for an unknown ring, a missing
 * component, a diagram whose open boundary would pass 60 points in the crossing order, or so
 * many unknots that a rank passes 2^53.
 * KhCancelled when `signal.aborted` becomes true.
 */
export function khovanov(pd: PDCode, options: KhOptions): KhResult {
  const { name, ring } = parseRing(options.ring);
  const reduced = options.reduced ?? false;
  const unknots = options.unknots ?? (pd.length === 0 ? 1 : 0);
  const d = diagram(pd, { unknots }); // validates the code before any work
  const components = orient(pd).components;
  const component = options.component ?? 0;
  const total = components.length + unknots;
  if (reduced && !(Number.isInteger(component) && component >= 0 && component < total)) {
    throw new RangeError(`component ${component} does not exist; the link has ${total}`);
  }
  if (reduced && total === 0) throw new RangeError('reduced homology of the empty link is not defined');
  const engine: EngineOptions = {
    marked: reduced && component < components.length ? components[component][0] : undefined,
    // Reduced at a crossingless unknot: that unknot contributes A/(x) = R in degree 0.
    unknots: reduced && component >= components.length ? unknots - 1 : unknots,
    onProgress: options.onProgress,
    signal: options.signal,
  };
  const groups = fastKhovanov(pd, ring, engine);
  const w = width(groups);
  let euler: KhResult['euler'];
  if (options.eulerCheck ?? true) {
    const computed = eulerCharacteristic(groups);
    // Kh of the empty link is Z in degree (0,0) by definition (Khovanov 2000, math/9908171).
    const expected = total === 0 ? Laurent.one : expectedEuler(jones(d), reduced);
    const json = (l: typeof computed): [number, string][] => l.toPairs().map(([e, c]) => [e, c.toString()]);
    euler = { computed: json(computed), expected: json(expected), ok: computed.equals(expected) };
  }
  const terms = poincare(groups);
  return { ring: name, reduced, ...(reduced && { component }), groups, poincare: terms, poincareText: poincareFormat(terms, 'text'), euler, width: w, thin: w <= (reduced ? 1 : 2), version: programVersion };
}
