// The Rasmussen s-invariant: T(7,8) over Q (48 crossings, goal <= 30 s) and two 14-crossing
// knots over Q and F2 (goal <= 300 ms), beside Khovanov homology of the same diagram over the
// same field, and load-independent sizes: the widest open boundary, the largest complex met, and
// the closed complex before the graded elimination (= the dimension of Khovanov homology).

import { khovanov, Progress } from '@/shared/khovanov';
import { fromBraid } from '@/shared/knot/braid';
import { torusLink } from '@/shared/knot/families/torus';
import { PDCode } from '@/shared/knot/pd';
import { deformedHomology, rasmussenS, SField } from '@/shared/rasmussen';
import { Line, median, round } from './timing';

function timeS(pd: PDCode, field: SField, runs: number): { ms: number; s: number } {
  const times: number[] = [];
  let s = 0;
  for (let r = 0; r < runs; r++) {
    const t = performance.now();
    s = rasmussenS(pd, field);
    times.push(performance.now() - t);
  }
  return { ms: median(times), s };
}

function sizes(pd: PDCode, field: SField): { boundary: number; objects: number; entries: number; closed: number } {
  let boundary = 0;
  let objects = 0;
  let entries = 0;
  const onProgress = (p: Progress) => {
    boundary = Math.max(boundary, p.boundary);
    objects = Math.max(objects, p.objects);
    entries = Math.max(entries, p.entries);
  };
  const closed = deformedHomology(pd, field, { onProgress }).atZero.length;
  return { boundary, objects, entries, closed };
}

export function sinvBench(): Line[] {
  const lines: Line[] = [];
  const cases: [string, PDCode, SField[], number, string][] = [
    ['T(3,7) (14 crossings, positive braid)', torusLink(3, 7).pd, ['Q', 'F2'], 9, '<= 300 ms'],
    ['closure of (s1 s2^-1)^7 (14 crossings, alternating)', fromBraid(Array.from({ length: 7 }, () => [1, -2]).flat()).pd, ['Q', 'F2'], 9, '<= 300 ms'],
    ['T(7,8) (48 crossings)', torusLink(7, 8).pd, ['Q'], 1, '<= 30000 ms'],
  ];
  for (const [name, pd, fields, runs, goal] of cases) {
    for (const field of fields) {
      const { ms, s } = timeS(pd, field, runs);
      lines.push({ name: `s: ${name} over ${field} = ${s}, median of ${runs}`, value: round(ms), unit: 'ms', goal });
      const t = performance.now();
      khovanov(pd, { ring: field, eulerCheck: false });
      lines.push({ name: `s: ${name}, Khovanov homology over ${field} for comparison`, value: round(performance.now() - t), unit: 'ms' });
    }
    const z = sizes(pd, fields[0]);
    lines.push({ name: `s: ${name}, widest open boundary`, value: z.boundary, unit: 'points' });
    lines.push({ name: `s: ${name}, largest complex`, value: z.objects, unit: 'objects' });
    lines.push({ name: `s: ${name}, most differential entries`, value: z.entries, unit: 'entries' });
    lines.push({ name: `s: ${name}, closed complex before the graded elimination`, value: z.closed, unit: 'objects' });
  }
  return lines;
}
