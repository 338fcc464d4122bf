// The class of a ribbon disk of the pretzel knots P(p, -p, q) (ribbon: a band joins the p and
// -p columns; the band used is the first orientable saddle of the generated code that is
// certified ribbon), by the cube at two bidegrees; goal for 12 crossings <= 2 s, 14 is the
// default limit. Also the sizes
// that do not depend on load: the basis of C^{0,1}/B^{0,1} and the class's support. The class
// over Z on P(3,-3,4) and P(3,-3,6).

import { bandCertificate, BandPresentation, surfaceClass, surfaceClassOn } from '@/shared/knot/bands';
import { diagram } from '@/shared/knot/diagram';
import { faces, pushAcross } from '@/shared/knot/moves';
import { orient } from '@/shared/knot/pd';
import { pretzelLink } from '@/shared/knot/families/pretzel';
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

export function bandsBench(): Line[] {
  const lines: Line[] = [];
  const cases: [number[], number, string | undefined][] = [
    [[3, -3, 6], 5, '<= 2 s'],
    [[5, -5, 2], 5, '<= 2 s'],
    [[5, -5, 4], 3, undefined],
    // 16 crossings, past the default limit (CLASS_CROSSINGS = 14); P(7,-7,2) takes about a minute.
    [[5, -5, 6], 1, undefined],
  ];
  for (const [twists, runs, goal] of cases) {
    const p = ribbonBand(twists);
    const name = `P(${twists.join(',')}) (${p.pd.length} crossings)`;
    const times: number[] = [];
    let c = surfaceClass(p, { maxCrossings: 16 });
    for (let r = 0; r < runs; r++) {
      const t = performance.now();
      c = surfaceClass(p, { maxCrossings: 16 });
      times.push(performance.now() - t);
    }
    lines.push({ name: `disk class of ${name}`, value: round(median(times)), unit: 'ms', goal });
    lines.push({ name: `${name}: dim C^{0,1}/B^{0,1}`, value: c.basisSize, unit: 'generators' });
    lines.push({ name: `${name}: support of the class`, value: c.support.length, unit: 'generators' });
  }
  // Over Z (class-z.ts: integer kernels, Hermite and Smith forms); P(5,-5,2) is over its limit.
  for (const twists of [[3, -3, 4], [3, -3, 6]]) {
    const p = ribbonBand(twists);
    const times: number[] = [];
    for (let r = 0; r < 3; r++) {
      const t = performance.now();
      surfaceClass(p, { ring: 'Z' });
      times.push(performance.now() - t);
    }
    lines.push({ name: `disk class over Z of P(${twists.join(',')}) (${p.pd.length} crossings)`, value: round(median(times)), unit: 'ms' });
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
