// PD code: crossings X[a,b,c,d], labels read counterclockwise from the incoming under-strand.
// This file validates a PD code and derives what every invariant needs from it: the
// components, the direction of every edge and the sign of every crossing (conventions in
// docs/conventions.md).

export type Crossing = readonly [number, number, number, number];
export type PDCode = readonly Crossing[];
/** A writable copy of a PD code, for moves and builders that rewire slots. */
export type WritablePD = [number, number, number, number][];

export const writablePD = (pd: PDCode): WritablePD => pd.map(([a, b, c, d]) => [a, b, c, d]);

/** The crossing with every label replaced by f(label, its position 0-3). */
export const mapLabels = (x: Crossing, f: (label: number, position: number) => number): Crossing => [f(x[0], 0), f(x[1], 1), f(x[2], 2), f(x[3], 3)];
/** The same crossing read from its position k on (k = 2 starts at c): for a strand now entering elsewhere. */
export const rotated = (x: Crossing, k: number): Crossing => mapLabels(x, (_, p) => x[(p + k) % 4]);
/** `x` with the label at `position` replaced by `label`. */
export const withLabelAt = (x: Crossing, position: number, label: number): Crossing => mapLabels(x, (l, p) => (p === position ? label : l));

/** Where one occurrence of an edge label sits: crossing index and position 0..3 (a..d). */
export interface Slot {
  readonly crossing: number;
  readonly position: number;
}

/**
 * The code with the labels at the heads of edges a and b exchanged, and the heads to match: a
 * then runs from its tail into b's old head and b into a's. This is the saddle between a and b
 * (a band move, and the join of a connected sum); `heads` gives the head slot of both labels.
 */
export function exchangeHeads(code: { readonly pd: PDCode; readonly heads: ReadonlyMap<number, Slot> }, a: number, b: number): { pd: WritablePD; heads: Map<number, Slot> } {
  const ha = code.heads.get(a)!;
  const hb = code.heads.get(b)!;
  const pd = writablePD(code.pd);
  pd[ha.crossing][ha.position] = b;
  pd[hb.crossing][hb.position] = a;
  const heads = new Map(code.heads);
  heads.set(a, hb);
  heads.set(b, ha);
  return { pd, heads };
}

export interface Oriented {
  readonly pd: PDCode;
  /** +1 or -1 per crossing: positive when the over-strand runs from d to b. */
  readonly signs: readonly number[];
  /** Each component as its edge labels in the order of travel. */
  readonly components: readonly (readonly number[])[];
  /** Component index of every label. */
  readonly componentOf: ReadonlyMap<number, number>;
  /** For every label, the slot at which the edge ends (enters a crossing). */
  readonly head: ReadonlyMap<number, Slot>;
  /** For every label, the slot at which the edge starts (leaves a crossing). */
  readonly tail: ReadonlyMap<number, Slot>;
}

export class PDError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PDError';
  }
}

/** Both slots of every label; throws PDError unless each label occurs exactly twice. */
export function slotsOf(pd: PDCode): Map<number, Slot[]> {
  const slots = new Map<number, Slot[]>();
  pd.forEach((x, crossing) => {
    if (!Array.isArray(x) || x.length !== 4) {
      throw new PDError(`crossing ${crossing + 1} must have exactly 4 labels, got ${JSON.stringify(x)}`);
    }
    x.forEach((label, position) => {
      if (!Number.isSafeInteger(label)) {
        throw new PDError(`crossing ${crossing + 1}: label ${JSON.stringify(label)} is not an integer`);
      }
      const list = slots.get(label) ?? [];
      list.push({ crossing, position });
      slots.set(label, list);
    });
  });
  for (const [label, list] of slots) {
    if (list.length !== 2) {
      throw new PDError(`label ${label} appears ${list.length} time${list.length === 1 ? '' : 's'}; each label must appear exactly twice`);
    }
  }
  return slots;
}

const other = (pair: Slot[], s: Slot): Slot =>
  pair[0].crossing === s.crossing && pair[0].position === s.position ? pair[1] : pair[0];

/**
 * Orients a PD code. Components that pass under somewhere take their direction from a -> c;
 * a component that never passes under runs so that its labels increase, wrapping from the
 * largest to the smallest. A two-edge over-only component reads "increasing" both ways; it
 * then leaves, through the first crossing (in list order) where its smallest label sits, towards
 * its other label.
 */
export function orient(pd: PDCode): Oriented {
  const slots = slotsOf(pd);
  const head = new Map<number, Slot>();
  const tail = new Map<number, Slot>();
  const componentOf = new Map<number, number>();
  const components: number[][] = [];

  // Walk a component leaving crossing `start.crossing` through slot `start` (a tail slot).
  const walk = (start: Slot): number[] => {
    const labels: number[] = [];
    let out = start;
    for (;;) {
      const label = pd[out.crossing][out.position];
      if (componentOf.has(label)) {
        if (tail.get(label)?.crossing === out.crossing && tail.get(label)?.position === out.position) break;
        throw new PDError(`edge ${label} is traversed in both directions: the orientation is inconsistent`);
      }
      const into = other(slots.get(label)!, out);
      componentOf.set(label, components.length);
      tail.set(label, out);
      head.set(label, into);
      labels.push(label);
      if (into.position === 2) {
        throw new PDError(`edge ${label} enters crossing ${into.crossing + 1} at its outgoing under-strand: the orientation is inconsistent`);
      }
      out = { crossing: into.crossing, position: (into.position + 2) % 4 };
    }
    return labels;
  };

  pd.forEach((_, crossing) => {
    const incoming = pd[crossing][0];
    if (!componentOf.has(incoming)) {
      // Start where the incoming under-edge begins, so it is walked forwards.
      components.push(walk(other(slots.get(incoming)!, { crossing, position: 0 })));
    } else if (head.get(incoming)?.crossing !== crossing || head.get(incoming)?.position !== 0) {
      throw new PDError(`edge ${incoming} leaves crossing ${crossing + 1} through its incoming under-strand: the orientation is inconsistent`);
    }
  });

  // Over-only components: labels increase along the direction of travel.
  pd.forEach((x, crossing) => {
    for (const position of [1, 3]) {
      if (componentOf.has(x[position])) continue;
      const sorted = loopLabels(pd, slots, { crossing, position }).sort((p, q) => p - q);
      const smallest = sorted[0];
      const wanted = sorted[1 % sorted.length];
      const exits = [...slots.get(smallest)!].sort((p, q) => p.crossing - q.crossing || p.position - q.position);
      const start = exits.find((s) => labelAfter(pd, slots, s) === wanted);
      if (!start) {
        throw new PDError(`component with labels ${sorted.join(', ')} passes only over and its labels do not increase along it`);
      }
      components.push(walk(start));
    }
  });

  const signs = pd.map((x, crossing) => {
    const d = head.get(x[3])!;
    return d.crossing === crossing && d.position === 3 ? 1 : -1;
  });
  return { pd, signs, components, componentOf, head, tail };
}

// The label met next when an edge leaves through slot `s`.
function labelAfter(pd: PDCode, slots: Map<number, Slot[]>, s: Slot): number {
  const into = other(slots.get(pd[s.crossing][s.position])!, s);
  return pd[into.crossing][(into.position + 2) % 4];
}

// The labels of the component through slot `from`, in either direction.
function loopLabels(pd: PDCode, slots: Map<number, Slot[]>, from: Slot): number[] {
  const seen: number[] = [];
  let out = from;
  for (;;) {
    const label = pd[out.crossing][out.position];
    if (seen.includes(label)) return seen;
    seen.push(label);
    const into = other(slots.get(label)!, out);
    out = { crossing: into.crossing, position: (into.position + 2) % 4 };
  }
}

/** Writhe: the sum of the crossing signs. */
export function writhe(o: Oriented): number {
  return o.signs.reduce((s, x) => s + x, 0);
}

/** The crossing indices of each connected piece of the diagram, in order of first crossing. */
export function connectedPieces(pd: PDCode): number[][] {
  const parent = pd.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i])));
  for (const [, [p, q]] of slotsOf(pd)) parent[find(p.crossing)] = find(q.crossing);
  const pieces = new Map<number, number[]>();
  pd.forEach((_, i) => {
    const root = find(i);
    pieces.set(root, [...(pieces.get(root) ?? []), i]);
  });
  return [...pieces.values()];
}

/**
 * The same diagram with labels 1, 2, ... numbered along the components in order of travel
 * (the components and their starting edges as orient() finds them). Orientation is kept: an
 * over-only component still has increasing labels, so orient() reads the same directions back.
 */
export function relabel(o: Oriented): PDCode {
  const fresh = new Map<number, number>();
  o.components.flat().forEach((label, i) => fresh.set(label, i + 1));
  return o.pd.map((x) => mapLabels(x, (label) => fresh.get(label)!));
}

/** Reads a PD code from JSON text: an array of crossings, each an array of four integer labels. */
export function parsePD(text: string): PDCode {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new PDError('a PD code must be JSON: an array of crossings such as [[1,5,2,4],[3,1,4,6],[5,3,6,2]]');
  }
  if (!Array.isArray(value)) throw new PDError('a PD code must be an array of crossings');
  slotsOf(value as PDCode);
  return value as PDCode;
}
