// Closed braids among PD codes by Seifert circles and the Seifert graph (circles as vertices,
// crossings as edges; S. Yamada, "The minimal number of Seifert circles equals the braid index
// of a link", Invent. Math. 89, 1987): when that graph is a path c1 - c2 - ... - cn and the
// circles are nested in that order, the diagram is the closure of an n-strand braid.
//
// The crossings between c_i and c_(i+1) are the letters sigma_i, met in one cyclic order on
// both circles; walking c1, c2, ... and slotting each circle's new letters after the ones it
// shares with the previous circle gives the word (far letters commute, so where they fall
// between two shared ones does not matter). The path alone does not prove the nesting (two
// circles may lie on one side of their common neighbour), so the word is kept only when its
// closure is the given code relabelled, crossing for crossing.

import { BraidWord, fromBraid } from './braid';
import { orient, Oriented, PDCode, PDError, rotated } from './pd';

export interface ClosedBraid {
  readonly word: BraidWord;
  readonly strands: number;
  /** crossings[t]: the crossing of the code that letter t is. */
  readonly crossings: readonly number[];
}

/** Most components whose directions are searched (2^(k-1) tries); past it only the code's own. */
const MAX_TURNED = 6;

/**
 * The braid whose closure (fromBraid) is this code up to relabelling and the direction of its
 * components, or undefined (also past maxStrands). The bracket does not see directions, and a
 * drawing or a code may run some strands of a closed braid the other way: the code's own
 * directions are tried first, then (up to MAX_TURNED components) every other choice but the
 * whole reversed, which reads the same braid backwards.
 */
export function braidClosure(pd: PDCode, maxStrands = Infinity): ClosedBraid | undefined {
  if (pd.length === 0) return undefined;
  let o: Oriented;
  try {
    o = orient(pd);
  } catch (e) {
    if (e instanceof PDError) return undefined; // not orientable: no Seifert circles
    throw e;
  }
  const k = o.components.length;
  for (let mask = 0; mask < (k <= MAX_TURNED ? 2 ** (k - 1) : 1); mask++) {
    const braid = withDirections(o, (label) => {
      const c = o.componentOf.get(label)!;
      return c > 0 && ((mask >> (c - 1)) & 1) === 1;
    }, maxStrands);
    if (braid) return braid;
  }
  return undefined;
}

/** The braid when the code, with the components `turned` says reversed, is a closed braid. */
function withDirections(o: Oriented, turned: (label: number) => boolean, maxStrands: number): ClosedBraid | undefined {
  const { pd } = o;
  const signs = pd.map((x, i) => o.signs[i] * (turned(x[0]) === turned(x[1]) ? 1 : -1));
  const { circles, under, over } = seifertCircles(o, turned);
  const path = circles.length <= maxStrands ? pathOf(circles.length, under, over) : undefined;
  if (!path) return undefined;
  // Where the under-strand is reversed its incoming end is c: the crossing read from there.
  const code = pd.map((x) => (turned(x[0]) ? rotated(x, 2) : x));
  // In fromBraid's closure the under-strand of sigma_k comes from strand k + 1 and that of its
  // inverse from strand k, and the smoothing keeps each incoming end on its strand's circle:
  // the first crossing's sign says which end of the path is strand 1.
  const levels = (signs[0] > 0) === path.indexOf(under[0]) > path.indexOf(over[0]) ? path : [...path].reverse();
  const level = new Array<number>(levels.length);
  levels.forEach((c, i) => (level[c] = i));
  const generator = pd.map((_, i) => Math.min(level[under[i]], level[over[i]]) + 1);
  const crossings = cyclicOrder(levels.map((c) => circles[c]), generator);
  const word = crossings.map((i) => signs[i] * generator[i]);
  return sameCode(code, crossings, fromBraid(word, levels.length).pd) ? { word, strands: levels.length, crossings } : undefined;
}

/**
 * The Seifert circles, each as the crossings it meets in order of travel, and the circle through
 * each crossing's under- and over-strand. The oriented smoothing joins each incoming end to the
 * outgoing end beside it (positions 0..3 = a..d counterclockwise, docs/conventions.md).
 */
function seifertCircles(o: Oriented, turned: (label: number) => boolean): { circles: number[][]; under: number[]; over: number[] } {
  const { pd } = o;
  // Incoming ends: the under-strand's at a (c if reversed), the over-strand's at d if it runs
  // from d to b in the code (a positive crossing there) and is kept, or the other way round.
  const entries = pd.map((x, i): [number, number] => [turned(x[0]) ? 2 : 0, (o.signs[i] > 0) !== turned(x[1]) ? 3 : 1]);
  const exit = (i: number, p: number): number => ((p + 1) % 4 === entries[i][0] || (p + 1) % 4 === entries[i][1] ? (p + 3) % 4 : (p + 1) % 4);
  const under = new Array<number>(pd.length).fill(-1);
  const over = new Array<number>(pd.length).fill(-1);
  const circles: number[][] = [];
  for (let start = 0; start < pd.length; start++) {
    for (const strand of [0, 1]) {
      if ((strand === 0 ? under : over)[start] >= 0) continue;
      const circle: number[] = [];
      let [crossing, position] = [start, entries[start][strand]];
      while ((position % 2 === 0 ? under : over)[crossing] < 0) {
        (position % 2 === 0 ? under : over)[crossing] = circles.length;
        circle.push(crossing);
        const label = pd[crossing][exit(crossing, position)];
        const into = (turned(label) ? o.tail : o.head).get(label)!;
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
      else if (after.has(last)) after.get(last)!.push(i);
      else after.set(last, [i]);
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
