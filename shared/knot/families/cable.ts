// The (r+, r-)-cable of a framed component: r+ parallel and r- reversed copies of it, side by
// side in the plane (the blackboard framing), every crossing replaced by the grid of crossings
// of the copies, then (framing - blackboard framing) full twists of the copies inserted on one
// edge so that the copies follow the component's framing (common practice; e.g. Gompf and
// Stipsicz, "4-Manifolds and Kirby Calculus", 1999, ch. 5 on framed pushoffs).

import { assemble, Framed } from '../assemble';
import { blackboardFramings, Diagram, framingsOf } from '../diagram';
import { Crossing, mapLabels, orient, PDError, Slot } from '../pd';

/** The PD code being built: labels made on first use of a key, crossings, and each label's head slot (for assemble). */
class Builder {
  private readonly ids = new Map<string, number>();
  readonly pd: Crossing[] = [];
  readonly heads = new Map<number, Slot>();

  id(key: string): number {
    if (!this.ids.has(key)) this.ids.set(key, this.ids.size + 1);
    return this.ids.get(key)!;
  }

  /** Adds x; `incoming` lists the labels that enter it, with their positions. */
  push(x: Crossing, incoming: [number, number][]): void {
    for (const [label, position] of incoming) this.heads.set(label, { crossing: this.pd.length, position });
    this.pd.push(x);
  }
}

/** The r copies of the cabled component: copies r+ .. r-1 run against it. */
interface Copies {
  readonly r: number;
  reversed(copy: number): boolean;
}

/**
 * |twists| full twists of the copies on top of `bottom` (their labels, copy j first), strands
 * upward, copy j at braid position r-1-j (copies are numbered leftwards). Returns the copies'
 * labels on top. Called at most once per cable (its keys are not unique across calls).
 */
function twistRegion(b: Builder, { r, reversed }: Copies, twists: number, bottom: number[]): number[] {
  const cur = [...bottom].reverse();
  const copyAt = Array.from({ length: r }, (_, p) => r - 1 - p);
  let fresh = 0;
  for (let t = 0; t < Math.abs(twists) * r; t++) {
    for (let k = 1; k < r; k++) {
      const l = k - 1;
      const [BL, BR] = [cur[l], cur[l + 1]];
      const [TL, TR] = [b.id(`twist:${fresh++}`), b.id(`twist:${fresh++}`)];
      const upRight = !reversed(copyAt[l + 1]); // the strand BR-TL
      const upLeft = !reversed(copyAt[l]); // the strand BL-TR
      if (twists > 0) {
        // sigma_k: BR-TL under.
        if (upRight) b.push([BR, TR, TL, BL], [[BR, 0], upLeft ? [BL, 3] : [TR, 1]]);
        else b.push([TL, BL, BR, TR], [[TL, 0], upLeft ? [BL, 1] : [TR, 3]]);
      } else if (upLeft) b.push([BL, BR, TR, TL], [[BL, 0], upRight ? [BR, 1] : [TL, 3]]);
      else b.push([TR, TL, BL, BR], [[TR, 0], upRight ? [BR, 3] : [TL, 1]]);
      cur[l] = TL;
      cur[l + 1] = TR;
      [copyAt[l], copyAt[l + 1]] = [copyAt[l + 1], copyAt[l]];
    }
  }
  return Array.from({ length: r }, (_, j) => cur[r - 1 - j]);
}

/** A crossingless unknot's copies: the twist region closed up on itself. */
function twistedUnknot(b: Builder, copies: Copies, twists: number): void {
  const bottom = Array.from({ length: copies.r }, (_, j) => b.id(`loop:${j}`));
  const top = twistRegion(b, copies, twists, bottom);
  const close = new Map(top.map((t, j) => [t, bottom[j]]));
  for (let i = 0; i < b.pd.length; i++) b.pd[i] = mapLabels(b.pd[i], (l) => close.get(l) ?? l);
  for (const [t, bottomLabel] of close) {
    b.heads.set(bottomLabel, b.heads.get(t) ?? b.heads.get(bottomLabel)!);
    b.heads.delete(t);
  }
}

/**
 * The grid replacing one crossing: ru under copies by ro over copies (1 for an uncabled strand).
 * `name(position, copy)` is the label of that copy of the crossing's edge at `position`.
 */
function crossingGrid(b: Builder, crossing: number, positive: boolean, under: { copies: number; reversed(i: number): boolean }, over: { copies: number; reversed(j: number): boolean }, name: (position: number, copy: number) => number): void {
  const ru = under.copies;
  const ro = over.copies;
  // Frame: under-strand along +x (a west, c east), b south, d north; under copy i at y = i.
  // Over copy j sits at x = j when the over-strand runs south (positive crossing), at x = -j
  // when north; columns are numbered west to east.
  const copyInColumn = (c: number) => (positive ? c : ro - 1 - c);
  const overNorth = (j: number) => !positive !== over.reversed(j);
  const H = (i: number, s: number) => (s === 0 ? name(0, i) : s === ro ? name(2, i) : b.id(`h:${crossing}:${i}:${s}`));
  const V = (j: number, s: number) => (s === 0 ? name(1, j) : s === ru ? name(3, j) : b.id(`v:${crossing}:${j}:${s}`));
  for (let i = 0; i < ru; i++) {
    for (let c = 0; c < ro; c++) {
      const j = copyInColumn(c);
      const [W, E, S, N] = [H(i, c), H(i, c + 1), V(j, i), V(j, i + 1)];
      const cell: Crossing = under.reversed(i) ? [E, N, W, S] : [W, S, E, N];
      // The over copy enters from the south when it runs north; S sits at 1 in [W,S,E,N], 3 in [E,N,W,S].
      const southPosition = under.reversed(i) ? 3 : 1;
      b.push(cell, [[cell[0], 0], overNorth(j) ? [S, southPosition] : [N, 4 - southPosition]]);
    }
  }
}

/** Degenerate inputs: a component out of range or (r+, r-) not a cable throws a PDError. */
export function cable(d: Diagram, component: number, rPlus: number, rMinus: number): Diagram {
  const o = orient(d.pd);
  const count = o.components.length + d.unknots;
  if (!Number.isInteger(component) || component < 0 || component >= count) throw new PDError(`there is no component ${component + 1}`);
  if (!Number.isInteger(rPlus) || !Number.isInteger(rMinus) || rPlus < 0 || rMinus < 0 || rPlus + rMinus < 1) {
    throw new PDError(`a cable needs r+ >= 0, r- >= 0 and r+ + r- >= 1, got (${rPlus}, ${rMinus})`);
  }
  const copies: Copies = { r: rPlus + rMinus, reversed: (copy) => copy >= rPlus };
  const { r } = copies;
  const twists = framingsOf(d, o)[component] - blackboardFramings(d, o)[component];
  const b = new Builder();

  const unknotFramings = d.framings.slice(o.components.length);
  if (component >= o.components.length) {
    unknotFramings.splice(component - o.components.length, 1);
    if (twists === 0 || r === 1) unknotFramings.push(...new Array<null>(r).fill(null));
    else twistedUnknot(b, copies, twists);
  }

  const isCabled = (label: number) => o.componentOf.get(label) === component;
  // The twists sit on the copies of the component's first edge, at its head end.
  const first = component < o.components.length ? o.components[component][0] : undefined;
  const firstHead = first === undefined ? undefined : o.head.get(first)!;
  const topOfFirst = first !== undefined && twists !== 0 ? twistRegion(b, copies, twists, Array.from({ length: r }, (_, j) => b.id(`${first}:${j}`))) : undefined;

  d.pd.forEach((x, crossing) => {
    const strand = (cabled: boolean) => ({ copies: cabled ? r : 1, reversed: (i: number) => cabled && copies.reversed(i) });
    const name = (position: number, copy: number): number => {
      const label = x[position];
      if (topOfFirst && label === first && firstHead!.crossing === crossing && firstHead!.position === position) return topOfFirst[copy];
      return b.id(`${label}:${copy}`);
    };
    crossingGrid(b, crossing, o.signs[crossing] > 0, strand(isCabled(x[0])), strand(isCabled(x[1])), name);
  });

  const framed: Framed[] = [];
  o.components.forEach((labels, c) => {
    if (c !== component) framed.push({ label: b.id(`${labels[0]}:0`), framing: d.framings[c] });
  });
  return assemble(b.pd, b.heads, framed, unknotFramings);
}
