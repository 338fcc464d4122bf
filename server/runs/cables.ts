// The cells of a cable sweep and the cable diagram of each. Every component takes each
// (r+, r-) with 1 <= r+ + r- <= maxStrands; a link's cells are all combinations, first
// component varying slowest.
import type { CableCell } from '@/shared/api/runs';
import type { Diagram } from '@/shared/knot/diagram';
import { cable } from '@/shared/knot/families/cable';

export function sweepCells(components: number, maxStrands: number): CableCell[] {
  const pairs: [number, number][] = [];
  for (let total = 1; total <= maxStrands; total++) for (let minus = 0; minus <= total; minus++) pairs.push([total - minus, minus]);
  let cells: CableCell[] = [[]];
  for (let c = 0; c < components; c++) cells = cells.flatMap((cell) => pairs.map((p) => [...cell, p]));
  return cells;
}

/** The order of sweepCells: per component, by r+ + r-, then by r-. */
export function compareCells(a: CableCell, b: CableCell): number {
  for (let c = 0; c < Math.min(a.length, b.length); c++) {
    const d = a[c][0] + a[c][1] - (b[c][0] + b[c][1]) || a[c][1] - b[c][1];
    if (d !== 0) return d;
  }
  return a.length - b.length;
}

/** Number of cells sweepCells would give, without building them. */
export const sweepSize = (components: number, maxStrands: number): number =>
  Math.pow((maxStrands * (maxStrands + 3)) / 2, components);

/**
 * The cable of a framed knot for a one-entry cell (the knot core's cable family). Links are
 * refused by startRun: cabling one component renumbers the others, so cells of several
 * components cannot be built one component at a time yet.
 */
export function cableOf(d: Diagram, cell: CableCell): Diagram {
  const [[rPlus, rMinus]] = cell;
  return cable(d, 0, rPlus, rMinus);
}
