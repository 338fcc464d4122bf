// HOMFLY-PT speed of the skein tree (shared/knot/homfly.ts): 15-crossing knots (goal <= 50 ms)
// and 30-crossing braid closures (goal <= 2 s), with the diagrams the Readout computes on the
// device (its limit, lib/slate/readout.ts). Each figure is the median of a few runs after one
// warm-up run.
import { fromBraid } from '@/shared/knot/braid';
import { Diagram } from '@/shared/knot/diagram';
import { torusLink } from '@/shared/knot/families/torus';
import { homfly } from '@/shared/knot/homfly';
import { seededRng } from '@/shared/knot/moves/random';
import { HOMFLY_DEVICE_LIMIT } from '@/lib/slate/readout';
import { median, round, type Line } from './timing';

/** A seeded random braid using every generator in turn (as in the jones bench). */
function braidOf(strands: number, crossings: number): Diagram {
  const rng = seededRng(crossings);
  return fromBraid(Array.from({ length: crossings }, (_, i) => ((i % (strands - 1)) + 1) * (rng() < 0.5 ? 1 : -1)), strands);
}

function timeMs(d: Diagram, runs: number): number {
  homfly(d);
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const t = performance.now();
    homfly(d);
    times.push(performance.now() - t);
  }
  return median(times);
}

export function homflyBench(): Line[] {
  const cases: [string, Diagram, number, string][] = [
    ['T(2,15)', torusLink(2, 15), 5, '<= 50 ms'],
    ['T(4,5)', torusLink(4, 5), 5, '<= 50 ms'],
    ['random 4-strand braid (a knot)', braidOf(4, 15), 5, '<= 50 ms'],
    ['alternating 3-strand braid (s1 s2^-1)^8', fromBraid(Array.from({ length: HOMFLY_DEVICE_LIMIT }, (_, i) => (i % 2 === 0 ? 1 : -2))), 5, 'the Readout limit'],
    ['random 4-strand braid', braidOf(4, 30), 1, '<= 2000 ms'],
    ['T(3,15)', torusLink(3, 15), 1, '<= 2000 ms'],
  ];
  return cases.map(([name, d, runs, goal]) => ({ name: `HOMFLY-PT, ${name}, ${d.pd.length} crossings`, value: round(timeMs(d, runs)), unit: 'ms', goal }));
}
