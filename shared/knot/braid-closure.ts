// Closed braids among PD codes by Seifert circles and the Seifert graph (circles as vertices,
// crossings as edges; S. Yamada, "The minimal number of Seifert circles equals the braid index
// of a link", Invent. Math. 89, 1987): when that graph is a path c1 - c2 - ... - cn and the
// circles are nested in that order, the diagram is the closure of an n-strand braid.
//
// The crossings between c_i and c_(i+1) are the letters sigma_i, met in one cyclic order on
// both circles; walking c1, c2, ... and slotting each circle's new letters after the ones it
// shares with the previous circle gives the word (far letters commute, so where they fall
// between two shared ones does not matter). The path alone does not prove the nesting, so the
// word is kept only when its closure is the given code relabelled, crossing for crossing.

import { BraidWord, fromBraid } from './braid';
import { orient, Oriented, PDCode, PDError } from './pd';

export interface ClosedBraid {
  readonly word: BraidWord;
  readonly strands: number;
  /** crossings[t]: the crossing of the code that letter t is. */
  readonly crossings: readonly number[];
}

/** The braid whose closure (fromBraid) is this code up to relabelling, or undefined. */
export function braidClosure(pd: PDCode): ClosedBraid | undefined {
  if (pd.length === 0) return undefined;
  let o: Oriented;
  try {
    o = orient(pd);
  } catch (e) {
    if (e instanceof PDError) return undefined; // not orientable: no Seifert circles
    throw e;
  }
  const { circles, under, over } = seifertCircles(o);
  const path = pathOf(circles.length, under, over);
  if (!path) return undefined;
  // fromBraid runs every circle one way round its axis; which end of the path is c1 depends on
  // which way round the code's circles run, so both ends are tried.
  for (const levels of [path, [...path].reverse()]) {
    const level = new Array<number>(levels.length);
    levels.forEach((c, i) => (level[c] = i));
    const generator = pd.map((_, i) => Math.min(level[under[i]], level[over[i]]) + 1);
    const crossings = cyclicOrder(levels.map((c) => circles[c]), generator);
    const word = crossings.map((i) => o.signs[i] * generator[i]);
    if (sameCode(pd, crossings, fromBraid(word, levels.length).pd)) return { word, strands: levels.length, crossings };
  }
  return undefined;
}

/**
 * The Seifert circles, each as the crossings it meets in order of travel, and the circle through
 * each crossing's under- and over-strand. The oriented smoothing joins each incoming end to the
 * outgoing end beside it: a to b and d to c at a positive crossing, a to d and b to c at a
 * negative one (positions 0..3 = a..d, docs/conventions.md).
 */
function seifertCircles(o: Oriented): { circles: number[][]; under: number[]; over: number[] } {
  const { pd, signs, head } = o;
  const under = new Array<number>(pd.length).fill(-1);
  const over = new Array<number>(pd.length).fill(-1);
  const circles: number[][] = [];
  const turn = (position: number, sign: number): number => (sign > 0 ? [1, -1, -1, 2] : [3, 2, -1, -1])[position];
  for (let start = 0; start < pd.length; start++) {
    for (const which of [under, over]) {
      if (which[start] >= 0) continue;
      const circle: number[] = [];
      let crossing = start;
      let position = which === under ? 0 : signs[start] > 0 ? 3 : 1;
      while ((position === 0 ? under : over)[crossing] < 0) {
        (position === 0 ? under : over)[crossing] = circles.length;
        circle.push(crossing);
        const into = head.get(pd[crossing][turn(position, signs[crossing])])!;
        [crossing, position] = [into.crossing, into.position];
      }
      circles.push(circle);
    }
  }
  return { circles, under, over };
}

/** The circles in path order when the Seifert graph is a path of at least two circles. */
function pathOf(count: number, under: readonly number[], over: readonly number[]): number[] | undefined {
  const neighbours = Array.from({ length: count }, () => new Set<number>());
  for (let i = 0; i < under.length; i++) {
    if (under[i] === over[i]) return undefined;
    neighbours[under[i]].add(over[i]);
    neighbours[over[i]].add(under[i]);
  }
  if (neighbours.some((n) => n.size > 2)) return undefined;
  const end = neighbours.findIndex((n) => n.size === 1);
  if (end < 0) return undefined;
  const path = [end];
  for (let previous = -1, at = end; ; ) {
    const next = [...neighbours[at]].find((c) => c !== previous);
    if (next === undefined) break;
    [previous, at] = [at, next];
    path.push(at);
  }
  return path.length === count ? path : undefined;
}

/**
 * Every crossing once, in the cyclic order round the axis: circle levels[0]'s letters, then
 * each next circle's new letters (generator j + 1) slotted after the shared letter (generator
 * j) that they follow on that circle.
 */
function cyclicOrder(levels: readonly (readonly number[])[], generator: readonly number[]): number[] {
  let order = [...levels[0]];
  for (let j = 1; j + 1 < levels.length; j++) {
    const circle = levels[j];
    const first = circle.findIndex((i) => generator[i] === j);
    const after = new Map<number, number[]>();
    let last = circle[first];
    for (let k = 1; k <= circle.length; k++) {
      const i = circle[(first + k) % circle.length];
      if (generator[i] === j) last = i;
      else after.set(last, [...(after.get(last) ?? []), i]);
    }
    order = order.flatMap((i) => [i, ...(after.get(i) ?? [])]);
  }
  return order;
}

/** Whether crossing t of `braid` is crossing crossings[t] of `pd` under one relabelling of the edges. */
function sameCode(pd: PDCode, crossings: readonly number[], braid: PDCode): boolean {
  const forth = new Map<number, number>();
  const back = new Map<number, number>();
  return crossings.every((i, t) =>
    pd[i].every((label, p) => {
      const image = braid[t][p];
      if ((forth.get(label) ?? image) !== image || (back.get(image) ?? label) !== label) return false;
      forth.set(label, image);
      back.set(image, label);
      return true;
    }),
  );
}
