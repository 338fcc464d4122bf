// The class of a ribbon disk of the pretzel knots P(p, -p, q) (ribbon: a band joins the p and
// -p columns; the band used is the first orientable saddle of the generated code that is
// certified ribbon) on the two routes: the cube at two bidegrees (class.ts; goal for 12
// crossings <= 2 s, 14 is its default limit) and the local algorithm with the band edges cut
// open (class-local.ts), which takes over past 14. The local route's cost grows with the cut
// edges' open ends (four a band) more than with the crossings, so it is also timed on connected
// sums of 9_46's ribbon disk (k bands, 9k crossings). Also the sizes that do not depend on load:
// the basis of C^{0,1}/B^{0,1} (of the cube, or of the simplified complex) and the class's
// support, and the peak resident memory of the bench process after each case (the local route's
// cases first, then the cube's, each in growing size, so each figure bounds that case). The
// class over Z on P(3,-3,4) and P(3,-3,6) (cube) and on P(5,-5,6) to P(11,-11,6) (local).

import { bandCertificate, BandPresentation, surfaceClass, surfaceClassOn } from '@/shared/knot/bands';
import { diagram } from '@/shared/knot/diagram';
import { faces, pushAcross } from '@/shared/knot/moves';
import { orient } from '@/shared/knot/pd';
import { pretzelLink } from '@/shared/knot/families/pretzel';
import { ribbon, summed } from '@/tests/shared/bands-fixtures';
import { Line, median, round } from './timing';

function ribbonBand(twists: number[]): BandPresentation {
  const { pd } = pretzelLink(twists);
  const labels = [...new Set(pd.flat())].sort((a, b) => a - b);
  for (const a of labels) {
    for (const b of labels) {
      if (b <= a) continue;
      const p = { pd, unknots: 0, saddles: [{ a, b }] };
      try {
        if (bandCertificate(p).ribbon) return p;
      } catch {
        // not an orientable saddle across a common face
      }
    }
  }
  throw new Error(`no one-band ribbon presentation of P(${twists.join(',')}) found`);
}

const peakMB = (): number => Math.round(process.resourceUsage().maxRSS / 1024);

/** Median time of `runs` runs (after one untimed) of the class by one route, and its sizes. */
function timed(name: string, p: BandPresentation, route: 'cube' | 'local', runs: number, goal?: string): Line[] {
  // The cube up to 16 crossings here; the local route from 0 crossings on, up to 40 (its default
  // limit is 30: a pretzel's columns keep the tangle narrow, other knots of 40 are wider).
  const opts = route === 'cube' ? { maxCrossings: 16, localCrossings: 0 } : { maxCrossings: 0, localCrossings: 40 };
  let c = surfaceClass(p, opts);
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const t = performance.now();
    c = surfaceClass(p, opts);
    times.push(performance.now() - t);
  }
  const what = route === 'cube' ? 'cube' : 'local';
  return [
    { name: `disk class of ${name}, ${what}`, value: round(median(times)), unit: 'ms', goal },
    { name: `${name}, ${what}: dim C^{0,1}/B^{0,1}`, value: c.basisSize, unit: 'generators' },
    { name: `${name}, ${what}: support of the class`, value: c.support.length, unit: 'generators' },
    { name: `${name}, ${what}: peak memory so far`, value: peakMB(), unit: 'MB' },
  ];
}

export function bandsBench(): Line[] {
  const lines: Line[] = [];
  const pretzel = (twists: number[]) => {
    const p = ribbonBand(twists);
    return { name: `P(${twists.join(',')}) (${p.pd.length} crossings)`, p };
  };
  for (const twists of [[3, -3, 6], [5, -5, 2], [5, -5, 4], [5, -5, 6], [7, -7, 6], [11, -11, 6], [15, -15, 10]]) {
    const { name, p } = pretzel(twists);
    lines.push(...timed(name, p, 'local', 3));
  }
  const disk946 = ribbon.find((r) => r.name.startsWith('9_46'))!.presentation;
  // Four bands (eight edges, past LOCAL_CLASS_EDGES) took 68 s and 2.5 GB, five ran out of memory.
  for (const k of [2, 3]) {
    const p = summed(new Array<BandPresentation>(k).fill(disk946));
    lines.push(...timed(`9_46^#${k} (${p.pd.length} crossings, ${k} bands)`, p, 'local', 1));
  }
  const cube: [number[], number, string | undefined][] = [
    [[3, -3, 6], 5, '<= 2 s'],
    [[5, -5, 2], 5, '<= 2 s'],
    [[5, -5, 4], 3, undefined],
    // 16 crossings, past the default limit (CLASS_CROSSINGS = 14); P(7,-7,2) takes about a minute.
    [[5, -5, 6], 1, undefined],
  ];
  for (const [twists, runs, goal] of cube) {
    const { name, p } = pretzel(twists);
    lines.push(...timed(name, p, 'cube', runs, goal));
  }
  // Over Z (class-z.ts: integer kernels, Hermite and Smith forms; P(5,-5,2) is over its limit),
  // past 14 crossings on the local route (class-local-z.ts).
  for (const twists of [[3, -3, 4], [3, -3, 6], [5, -5, 6], [7, -7, 6], [11, -11, 6]]) {
    const p = ribbonBand(twists);
    const times: number[] = [];
    for (let r = 0; r < 3; r++) {
      const t = performance.now();
      surfaceClass(p, { ring: 'Z' });
      times.push(performance.now() - t);
    }
    lines.push({ name: `disk class over Z of P(${twists.join(',')}) (${p.pd.length} crossings), ${p.pd.length > 14 ? 'local' : 'cube'}`, value: round(median(times)), unit: 'ms' });
  }
  // The class with a finger pushed in a face away from the band, carried back to the pretzel's
  // own code (carry.ts, common-class.ts), beside the class on the fingered code alone.
  const p = ribbonBand([3, -3, 6]);
  const keep = p.saddles.flatMap((s) => [s.a, s.b]);
  const plain = diagram(p.pd);
  const face = faces(plain.pd).find((f) => f.length > 2 && f.every((c) => !keep.includes(plain.pd[c.crossing][c.arrive])))!;
  const fingered = pushAcross(plain, face, 0, 1, true);
  const heads = orient(p.pd).head;
  const label = (l: number) => fingered.pd[heads.get(l)!.crossing][heads.get(l)!.position];
  const q = { pd: fingered.pd, unknots: 0, saddles: p.saddles.map(({ a, b }) => ({ a: label(a), b: label(b) })) };
  const fingers = { common: p.pd, of: fingered.pd.map((_, i) => (i < p.pd.length ? i : -1)) };
  for (const [name, f] of [['on the fingered code', () => surfaceClass(q, { maxCrossings: 16 })], ['carried to the knot code', () => surfaceClassOn(q, fingers, { maxCrossings: 16 })]] as const) {
    const times: number[] = [];
    for (let r = 0; r < 3; r++) {
      const t = performance.now();
      f();
      times.push(performance.now() - t);
    }
    lines.push({ name: `disk class of P(3,-3,6) with a finger (${q.pd.length} crossings), ${name}`, value: round(median(times)), unit: 'ms' });
  }
  return lines;
}
