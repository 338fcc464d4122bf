// The diagram after all band moves, with the original link's orientation, simplified by R1 and
// R2 moves (shared/knot/moves/simplify.ts).

import { assemble } from '../assemble';
import { componentCount } from '../diagram';
import { simplify } from '../moves/simplify';
import { PDCode } from '../pd';
import { Stage } from './saddle';

export interface AfterBands {
  pd: PDCode;
  /** Crossingless unknots: the presentation's own and those simplification freed. */
  unknots: number;
  components: number;
}

/** The last stage as a diagram oriented like the link the bands started from, simplified. */
export function simplifiedStage(last: Stage, unknots: number): AfterBands {
  // The heads carry the orientation, so components that pass only over keep their direction.
  const d = simplify(assemble(last.pd, last.heads, [], new Array<null>(unknots).fill(null)));
  return { pd: d.pd, unknots: d.unknots, components: componentCount(d) };
}
