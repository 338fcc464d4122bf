// An oriented, framed link diagram: a PD code, extra crossingless unknot components, and a
// framing per component. Components are numbered as orient() finds them, then the unknots.
// A framing of null means the blackboard framing: the writhe of the component's self-crossings.

import { checkPlanar } from './moves/faces';
import { orient, Oriented, PDCode, PDError } from './pd';

export interface Diagram {
  readonly pd: PDCode;
  /** Crossingless unknot components, drawn apart from everything else. */
  readonly unknots: number;
  /** One entry per component (PD components first, then the unknots); null = blackboard. */
  readonly framings: readonly (number | null)[];
}

export interface DiagramOptions {
  unknots?: number;
  framings?: readonly (number | null)[];
}

/**
 * Validates and builds a diagram. Throws PDError with a precise message when a label does not
 * occur exactly twice, a crossing has not four integer labels, the orientation is inconsistent,
 * the code is not planar, or the framings do not match the components.
 */
export function diagram(pd: PDCode, options: DiagramOptions = {}): Diagram {
  const unknots = options.unknots ?? 0;
  if (!Number.isSafeInteger(unknots) || unknots < 0) throw new PDError(`the number of unknots must be a non-negative integer, got ${unknots}`);
  const o = orient(pd);
  checkPlanar(pd);
  const count = o.components.length + unknots;
  const framings = options.framings ?? new Array<null>(count).fill(null);
  if (framings.length !== count) {
    throw new PDError(`${framings.length} framing${framings.length === 1 ? '' : 's'} given for ${count} component${count === 1 ? '' : 's'}`);
  }
  framings.forEach((f, i) => {
    if (f !== null && !Number.isSafeInteger(f)) throw new PDError(`framing of component ${i + 1} must be an integer or null, got ${f}`);
  });
  return { pd, unknots, framings };
}

/** The unknot: no crossings, one component. */
export const unknot: Diagram = { pd: [], unknots: 1, framings: [null] };

export function componentCount(d: Diagram): number {
  return orient(d.pd).components.length + d.unknots;
}

/** Blackboard framing of each component: the sum of the signs of its self-crossings. */
export function blackboardFramings(d: Diagram, o: Oriented = orient(d.pd)): number[] {
  const framings = new Array<number>(o.components.length + d.unknots).fill(0);
  d.pd.forEach((x, i) => {
    const under = o.componentOf.get(x[0])!;
    if (under === o.componentOf.get(x[1])) framings[under] += o.signs[i];
  });
  return framings;
}

/** The framing of every component, with null resolved to the blackboard framing. */
export function framingsOf(d: Diagram, o: Oriented = orient(d.pd)): number[] {
  const blackboard = blackboardFramings(d, o);
  return d.framings.map((f, i) => f ?? blackboard[i]);
}
