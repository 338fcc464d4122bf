// The cells of a cable sweep and the cable diagram of each. Every component takes each
// (r+, r-) with 1 <= r+ + r- <= maxStrands; a link's cells are all combinations, first
// component varying slowest. Building cables is work for the job pool (cellCables); the
// request checks cableCrossings, which needs only the base diagram, first.
import type { CableCell, RunDiagram } from '@/shared/api/runs';
import { blackboardFramings, framingsOf, type Diagram } from '@/shared/knot/diagram';
import { cable } from '@/shared/knot/families/cable';
import { orient, writablePD } from '@/shared/knot/pd';
import { diagramKey } from './keys';

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

/**
 * Crossings of cableOf(d, cell), from the base diagram's numbers alone (derived from
 * shared/knot/families/cable.ts): with r_k = r+ + r- strands on component k, a crossing of
 * component a under component b becomes the r_a x r_b grid of their copies, and component k
 * gets |f_k - w_k| full twists of its r_k strands, r_k (r_k - 1) crossings each (f_k its
 * framing, w_k its writhe, the blackboard framing). So
 *   crossings = sum over crossings x of r_under(x) r_over(x) + sum over k of |f_k - w_k| r_k (r_k - 1).
 * Cabling one component after another changes neither term of the others. Linear in d.
 */
export function cableCrossings(d: Diagram, cell: CableCell): number {
  const o = orient(d.pd);
  const r = cell.map(([plus, minus]) => plus + minus);
  const framings = framingsOf(d, o);
  const writhes = blackboardFramings(d, o);
  let n = 0;
  for (const x of d.pd) n += r[o.componentOf.get(x[0])!] * r[o.componentOf.get(x[1])!];
  r.forEach((rk, k) => (n += Math.abs(framings[k] - writhes[k]) * rk * (rk - 1)));
  return n;
}

export interface CellCable extends RunDiagram {
  /** diagramKey of the cable. */
  key: string;
}

/** Every cell's cable with its reuse key: the job (server/jobs) a sweep runs off the request thread. */
export function cellCables({ diagram, cells, reduced }: { diagram: Diagram; cells: CableCell[]; reduced: boolean }): CellCable[] {
  return cells.map((cell) => {
    const c = cableOf(diagram, cell);
    const out = { pd: writablePD(c.pd), unknots: c.unknots, framings: [...c.framings] };
    return { ...out, key: diagramKey(out, reduced) };
  });
}
