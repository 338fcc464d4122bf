// Standard pictures from the Families builder (shared/layout): building the picture and its
// read-back check, which run when "Draw it" is pressed. No goal yet: the figures show what a
// cable costs as it grows.

import { fromBraid } from '@/shared/knot/braid';
import { connectedSum, pretzelLink, twistKnot } from '@/shared/knot/families';
import { cableSketch, layoutPD, pretzelSketch, sketchPicture, sumSketch } from '@/shared/layout';
import { median, round, type Line } from './timing';

function timed(name: string, runs: number, f: () => unknown): Line {
  const times = Array.from({ length: runs }, () => {
    const t0 = performance.now();
    f();
    return performance.now() - t0;
  });
  return { name: `${name} (median of ${runs})`, value: round(median(times)), unit: 'ms' };
}

export function picturesBench(runs = 3): Line[] {
  const trefoil = fromBraid([1, 1, 1]);
  const figureEight = twistKnot(2);
  const picture = (d: typeof trefoil) => ({ ...layoutPD(d.pd, d.unknots), framings: d.framings });
  const onSlate = sketchPicture(pretzelSketch([-2, 3, 7])!)!;
  return [
    timed('pretzel P(-2,3,7), 12 crossings', runs, () => pretzelSketch([-2, 3, 7])),
    // As the Families builder does it: the pretzel on the Slate, the trefoil laid out.
    timed('sum P(-2,3,7) # 3_1, 15 crossings', runs, () => sumSketch(onSlate, picture(trefoil), connectedSum(pretzelLink([-2, 3, 7]), trefoil))),
    timed('2-cable of the 0-framed figure-eight, 16 crossings', runs, () => cableSketch({ ...figureEight, framings: [0] }, 0, 2)),
    timed('2-cable of the 0-framed trefoil, 18 crossings', runs, () => cableSketch({ ...trefoil, framings: [0] }, 0, 2)),
    timed('3-cable of the -1-framed trefoil, 51 crossings', runs, () => cableSketch({ ...trefoil, framings: [-1] }, 0, 3)),
  ];
}
