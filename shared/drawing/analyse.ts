// From a Sketch to everything the Slate shows and the knot core needs: per component the
// smoothed path, per crossing its position and which strand is over, the gaps to cut into
// under-strands, the degeneracy markers, and (only when there is no marker) the diagram.
// Over/under: by default the later stroke passes under (for a self-crossing, the passage drawn
// later); each stored flip swaps the crossing of its two components nearest to it.

import type { Diagram } from '@/shared/knot/diagram';
import { orient } from '@/shared/knot/pd';
import { FoundCrossing, findCrossings, Marker, Passage } from './crossings';
import { DrawingOptions, withDefaults } from './options';
import { dist, Point, scale } from './point';
import { Flip, Sketch, SketchComponent } from './sketch';
import { gapsAround } from './pieces';
import { length } from './smooth';
import { isPositive, OverUnder, StrandPass, toPD } from './to-pd';

export interface DrawnPath {
  readonly id: string;
  readonly points: readonly Point[];
  readonly closed: boolean;
  readonly reversed: boolean;
  /** Total arc length (closed paths include the closing segment). */
  readonly length: number;
}

export interface DrawnCrossing {
  readonly at: Point;
  readonly over: string;
  readonly under: string;
  /** Arc length of the passage along each path, in drawing order. */
  readonly overArc: number;
  readonly underArc: number;
  /** Unit directions of travel of the two strands here (current orientations). */
  readonly overDirection: Point;
  readonly underDirection: Point;
  /** +1 or -1 with the components' current orientations. */
  readonly sign: number;
  /** Whether a stored flip swapped the default. */
  readonly flipped: boolean;
}

/** A piece of an under-strand to leave out when drawing: arc lengths from..to (may wrap). */
export interface Gap {
  readonly component: string;
  readonly crossing: number;
  readonly from: number;
  readonly to: number;
}

export interface DrawnDiagram {
  readonly diagram: Diagram;
  /** Sketch component id of every diagram component (PD components first, then unknots). */
  readonly componentIds: readonly string[];
}

export interface Analysis {
  /** Every component, open strands included. */
  readonly paths: readonly DrawnPath[];
  /** Crossings among closed components; PD crossing i is crossings[i]. */
  readonly crossings: readonly DrawnCrossing[];
  readonly gaps: readonly Gap[];
  readonly markers: readonly Marker[];
  /** Ids of open (unfinished) strands, not part of the diagram. */
  readonly open: readonly string[];
  /** null when there is a marker or no closed component. */
  readonly diagram: DrawnDiagram | null;
}

// Stored flips matched to crossings: each flip to the nearest crossing of its two components.
function flippedSet(found: readonly FoundCrossing[], ids: readonly string[], flips: readonly Flip[], radius: number): Set<number> {
  const flipped = new Set<number>();
  for (const f of flips) {
    let best = -1;
    let bestDistance = radius;
    found.forEach((c, i) => {
      const a = ids[c.passages[0].path];
      const b = ids[c.passages[1].path];
      const same = (a === f.a && b === f.b) || (a === f.b && b === f.a);
      const d = dist(c.at, f.at);
      if (same && !flipped.has(i) && d <= bestDistance) [best, bestDistance] = [i, d];
    });
    if (best >= 0) flipped.add(best);
  }
  return flipped;
}

const unit = (p: Point): Point => scale(p, 1 / (Math.hypot(p.x, p.y) || 1));

/** Which passage of each found crossing is under: true = its first passage. */
export type UnderRule = (found: readonly FoundCrossing[], closed: readonly SketchComponent[]) => boolean[];

export interface Reading {
  readonly analysis: Analysis;
  /** What toPD read, crossing by crossing (paths index `closed`). */
  readonly overUnder: readonly OverUnder[];
  readonly closed: readonly SketchComponent[];
}

/** The analysis of drawn components whose over/under is decided by `rule`. */
export function readDrawing(components: readonly SketchComponent[], rule: UnderRule, options: Partial<DrawingOptions> = {}): Reading {
  const o = withDefaults(options);
  const closed = components.filter((c) => c.closed && c.points.length >= 3);
  const ids = closed.map((c) => c.id);
  const { crossings: found, markers } = findCrossings(closed, o);
  const firstUnder = rule(found, closed);

  const travel = (p: Passage): StrandPass => ({
    path: p.path,
    arc: p.arc,
    direction: closed[p.path].reversed ? scale(p.direction, -1) : p.direction,
  });
  const overUnder: OverUnder[] = found.map((c, i) => {
    const [first, second] = c.passages;
    return firstUnder[i] ? { over: travel(second), under: travel(first) } : { over: travel(first), under: travel(second) };
  });
  const crossings: DrawnCrossing[] = found.map((c, i) => ({
    at: c.at,
    over: ids[overUnder[i].over.path],
    under: ids[overUnder[i].under.path],
    overArc: overUnder[i].over.arc,
    underArc: overUnder[i].under.arc,
    overDirection: unit(overUnder[i].over.direction),
    underDirection: unit(overUnder[i].under.direction),
    sign: isPositive(overUnder[i]) ? 1 : -1,
    flipped: false,
  }));
  const paths: DrawnPath[] = components.map((c) => ({
    id: c.id,
    points: c.points,
    closed: c.closed,
    reversed: c.reversed,
    length: length(c.points, c.closed),
  }));
  const analysis: Analysis = {
    paths,
    crossings,
    gaps: gapsAround(crossings, new Map(paths.map((p) => [p.id, p.length])), o.gapRadius),
    markers,
    open: components.filter((c) => !c.closed).map((c) => c.id),
    diagram: markers.length === 0 && closed.length > 0 ? diagramOf(toPD(overUnder, closed.length, closed.map((c) => c.reversed)), closed, overUnder) : null,
  };
  return { analysis, overUnder, closed };
}

export function analyse(sketch: Sketch, options: Partial<DrawingOptions> = {}): Analysis {
  const o = withDefaults(options);
  let flipped = new Set<number>();
  const byRank: UnderRule = (found, closed) => {
    flipped = flippedSet(found, closed.map((c) => c.id), sketch.flips, o.flipRadius);
    return found.map((c, i) => closed[c.passages[0].path].seq > closed[c.passages[1].path].seq !== flipped.has(i));
  };
  const { analysis } = readDrawing(sketch.components, byRank, o);
  return { ...analysis, crossings: analysis.crossings.map((c, i) => (flipped.has(i) ? { ...c, flipped: true } : c)) };
}

function diagramOf(pd: DrawnDiagram['diagram']['pd'], closed: readonly SketchComponent[], overUnder: readonly OverUnder[]): DrawnDiagram {
  const o = orient(pd);
  // The path of each oriented component, found through any crossing it passes.
  const pathOfComponent = new Array<number>(o.components.length);
  pd.forEach((x, i) => {
    pathOfComponent[o.componentOf.get(x[0])!] = overUnder[i].under.path;
    pathOfComponent[o.componentOf.get(x[1])!] = overUnder[i].over.path;
  });
  const withCrossings = new Set(pathOfComponent);
  const unknots = closed.filter((_, k) => !withCrossings.has(k));
  const ordered = [...pathOfComponent.map((k) => closed[k]), ...unknots];
  return {
    diagram: { pd, unknots: unknots.length, framings: ordered.map((c) => c.framing) },
    componentIds: ordered.map((c) => c.id),
  };
}
