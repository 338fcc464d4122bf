// Movies of circles in the plane and the maps Khovanov's Frobenius algebra A = Z[x]/(x^2) gives
// their elementary cobordisms (Khovanov, "An invariant of tangle cobordisms", 2006, arXiv
// math/0207264): birth (unit, 1), death (counit, eps(1) = 0, eps(x) = 1), merge (m) and split
// (Delta(1) = 1 x + x 1, Delta(x) = x x). A movie from the empty diagram to itself is a closed
// surface and evaluates to an integer (Rasmussen, "Khovanov's invariant for closed surfaces",
// 2005, arXiv math/0502527). An element is a map from x-masks (bit i: circle i carries x) to
// integer coefficients; circles are numbered 0, 1, ... in the order the movie keeps them.

export type Element = ReadonlyMap<number, number>;

export type Frame = { birth: true } | { death: number } | { merge: [number, number] } | { split: number };

/** 1 in A^(x 0) = Z: the empty diagram. */
export const emptyElement: Element = new Map([[0, 1]]);

// Removes bit i of a mask, moving the higher bits down (circle i leaves the numbering).
const drop = (mask: number, i: number): number => (mask & ((1 << i) - 1)) | ((mask >> (i + 1)) << i);

function collect(terms: [number, number][]): Element {
  const out = new Map<number, number>();
  for (const [mask, c] of terms) out.set(mask, (out.get(mask) ?? 0) + c);
  for (const [mask, c] of out) if (c === 0) out.delete(mask);
  return out;
}

/** The image of v (on `circles` circles) under one frame, and the new number of circles. */
export function play(v: Element, circles: number, frame: Frame): { element: Element; circles: number } {
  const terms = [...v];
  if ('birth' in frame) return { element: v, circles: circles + 1 };
  const check = (i: number): void => {
    if (!Number.isInteger(i) || i < 0 || i >= circles) throw new RangeError(`there is no circle ${i} among ${circles}`);
  };
  if ('death' in frame) {
    check(frame.death);
    const i = frame.death;
    return { element: collect(terms.filter(([m]) => (m >> i) & 1).map(([m, c]) => [drop(m, i), c])), circles: circles - 1 };
  }
  if ('split' in frame) {
    check(frame.split);
    const i = frame.split;
    const j = 1 << circles; // the new circle
    return {
      element: collect(terms.flatMap(([m, c]): [number, number][] => ((m >> i) & 1 ? [[m | j, c]] : [[m | j, c], [m | (1 << i), c]]))),
      circles: circles + 1,
    };
  }
  const [i, k] = frame.merge;
  check(i);
  check(k);
  if (i === k) throw new RangeError('a merge joins two different circles');
  // Circle k is merged into circle i, then removed from the numbering.
  const merged = terms.flatMap(([m, c]): [number, number][] => {
    const dots = ((m >> i) & 1) + ((m >> k) & 1);
    return dots === 2 ? [] : [[drop(m | (dots << i), k), c]];
  });
  return { element: collect(merged), circles: circles - 1 };
}

/** A closed movie (empty to empty) evaluated: the integer it multiplies 1 by. */
export function evaluateClosed(frames: readonly Frame[]): number {
  let state = { element: emptyElement, circles: 0 };
  for (const f of frames) state = play(state.element, state.circles, f);
  if (state.circles !== 0) throw new RangeError(`the movie ends with ${state.circles} circles, not the empty diagram`);
  return state.element.get(0) ?? 0;
}
