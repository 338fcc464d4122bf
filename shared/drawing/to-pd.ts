// From the crossings of closed drawn paths to a PD code (docs/conventions.md). Each
// component's edges are labelled consecutively along its orientation, so an over-only
// component has increasing labels as orient() expects. At a crossing the four labels are read
// counterclockwise AS SEEN ON SCREEN (y down) from the incoming under-strand. Seen on screen,
// the ray after the incoming under ray (-u) is the outgoing over ray (+v) exactly when v is
// turned clockwise from u, i.e. cross(u, v) > 0 in y-down coordinates; the over-strand then runs
// from d to b and the crossing is positive (the right-handed picture: under from bottom right
// to top left, over from bottom left to top right).

import { Crossing, PDCode } from '@/shared/knot/pd';
import { cross, Point } from './point';

export interface StrandPass {
  readonly path: number;
  readonly arc: number;
  /** Direction of travel (already reversed for reversed components). */
  readonly direction: Point;
}

export interface OverUnder {
  readonly over: StrandPass;
  readonly under: StrandPass;
}

/** Positive crossing: seen on screen, the over direction is turned clockwise from the under. */
export const isPositive = (c: OverUnder): boolean => cross(c.under.direction, c.over.direction) > 0;

interface Labelling {
  /** in/out labels of each passage: key crossing*2 + (under ? 0 : 1) */
  readonly incoming: Map<number, number>;
  readonly outgoing: Map<number, number>;
  /** Per path, its passages in order of travel with the label of the edge leaving each. */
  readonly along: { arc: number; out: number }[][];
}

// Each path's edges numbered consecutively along its direction of travel.
function labelling(crossings: readonly OverUnder[], paths: number, reversed: readonly boolean[]): Labelling {
  // Passages along each path in order of travel.
  const passes: { crossing: number; role: 'over' | 'under' }[][] = Array.from({ length: paths }, () => []);
  const arcs: number[][] = Array.from({ length: paths }, () => []);
  crossings.forEach((c, i) => {
    for (const role of ['over', 'under'] as const) {
      passes[c[role].path].push({ crossing: i, role });
      arcs[c[role].path].push(c[role].arc);
    }
  });
  const incoming = new Map<number, number>();
  const outgoing = new Map<number, number>();
  const along: { arc: number; out: number }[][] = [];
  let next = 1;
  passes.forEach((list, k) => {
    const order = list.map((_, i) => i).sort((i, j) => (reversed[k] ? arcs[k][j] - arcs[k][i] : arcs[k][i] - arcs[k][j]));
    const m = order.length;
    const labels = order.map((_, j) => next + j);
    // An over-only component with two edges reads "increasing" both ways; orient() then starts at
    // the lower-numbered crossing holding its smallest label, so that crossing must be its tail.
    if (m === 2 && list.every((p) => p.role === 'over') && list[order[1]].crossing < list[order[0]].crossing) labels.reverse();
    order.forEach((i, j) => {
      const p = list[i];
      const key = p.crossing * 2 + (p.role === 'under' ? 0 : 1);
      outgoing.set(key, labels[j]);
      incoming.set(key, labels[(j + m - 1) % m]);
    });
    along.push(order.map((i, j) => ({ arc: arcs[k][i], out: labels[j] })));
    next += m;
  });
  return { incoming, outgoing, along };
}

/**
 * The PD code of the crossings (PD crossing i is crossings[i]) on `paths` closed paths; paths
 * listed in `reversed` run against increasing arc. Paths without crossings get no labels.
 */
export function toPD(crossings: readonly OverUnder[], paths: number, reversed: readonly boolean[]): PDCode {
  const { incoming, outgoing } = labelling(crossings, paths, reversed);
  return crossings.map((c, i): Crossing => {
    const a = incoming.get(i * 2)!;
    const cOut = outgoing.get(i * 2)!;
    const overIn = incoming.get(i * 2 + 1)!;
    const overOut = outgoing.get(i * 2 + 1)!;
    return isPositive(c) ? [a, overOut, cOut, overIn] : [a, overIn, cOut, overOut];
  });
}

/**
 * The label toPD gives the edge of `path` through arc length `arc` (drawing order): the edge
 * leaving the last passage before it in order of travel. null for a path without crossings.
 */
export function edgeAt(crossings: readonly OverUnder[], paths: number, reversed: readonly boolean[], path: number, arc: number): number | null {
  const list = labelling(crossings, paths, reversed).along[path];
  if (list.length === 0) return null;
  const before = list.filter((p) => (reversed[path] ? p.arc > arc : p.arc < arc));
  return (before.length ? before[before.length - 1] : list[list.length - 1]).out;
}
