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

/** Framings no real component has, marking each original component through the cablings. */
const MARK = 900_000_000;

/**
 * The cable of a framed link for a cell, one component at a time with the knot core's cable
 * family. Cabling renumbers the components, so each original component carries a marker
 * framing (cable() keeps the framings of the components it does not touch) that finds it
 * again; its own framing is put back just before it is cabled, since that sets the twists.
 */
export function cableOf(d: Diagram, cell: CableCell): Diagram {
  let cur: Diagram = { ...d, framings: d.framings.map((_, k) => MARK + k) };
  cell.forEach(([rPlus, rMinus], k) => {
    const at = cur.framings.indexOf(MARK + k);
    const framings = cur.framings.map((f, i) => (i === at ? d.framings[k] : f));
    cur = cable({ ...cur, framings }, at, rPlus, rMinus);
  });
  return cur;
}
