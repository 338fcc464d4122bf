// The standard picture of a closed braid (Alexander 1923: every link is one; the picture as in
// Kassel and Turaev, "Braid Groups", 2008, ch. 2): strand positions 1..n on concentric circles
// round a centre, the letters in order round the circle, each letter one sector in which
// neighbouring strands k and k+1 swap circles and cross once. A torus link T(p, q) so shows its
// p parallel strands turning q times. Either way round the circle the picture is the closure
// (its reflection in the plane with every crossing switched is a rotation of space), so the
// check is only of the drawing's reading: the picture is kept when it reads back (read-back.ts)
// with one crossing per letter, the braid's components and Jones polynomial;
// otherwise null, and the general layout draws the code. Degenerate input: a braid with a
// strand no letter touches (the empty word among them) gives null: its closure has a split
// unknot, which the general layout sets beside the rest; framings are not drawn here.

import { Point } from '@/shared/drawing/point';
import { Sketch } from '@/shared/drawing/sketch';
import { braidStrands, BraidWord, fromBraid } from '@/shared/knot/braid';
import { readsBack } from './read-back';
import { layoutToSketch } from './to-sketch';

/** Distance between neighbouring circles, and between points along a strand (pixels). */
const GAP = 40;
const STEP = 4;

function picture(word: BraidWord, strands: number, turn: 1 | -1) {
  const sectors = Math.max(word.length, 1);
  const sector = (2 * Math.PI) / sectors;
  // Long enough a sector for a swap to cross at a readable angle.
  const inner = Math.max(1.5 * GAP, (4 * GAP * sectors) / (2 * Math.PI));
  const radius = (position: number) => inner + position * GAP;
  const centre = inner + strands * GAP;
  const at = (angle: number, r: number): Point => ({ x: centre + r * Math.cos(turn * angle), y: centre + r * Math.sin(turn * angle) });
  const samples = 2 * Math.max(4, Math.ceil((radius(strands - 1) * sector) / STEP / 2)); // even: see below
  const done = new Array<boolean>(strands).fill(false);
  const paths: Point[][] = [];
  for (let start = 0; start < strands; start++) {
    if (done[start]) continue;
    const points: Point[] = [];
    let position = start;
    do {
      done[position] = true;
      for (let t = 0; t < sectors; t++) {
        const left = word.length ? Math.abs(word[t]) - 1 : -1;
        const next = position === left ? left + 1 : position === left + 1 ? left : position;
        for (let i = 0; i < samples; i++) {
          // Half a step off the sector's middle (samples is even), so the two strands that cross
          // there never share a point: the analysis would count that one crossing twice.
          const u = (i + 0.5) / samples;
          const ease = (1 - Math.cos(Math.PI * u)) / 2;
          points.push(at((t + u) * sector, radius(position) + (radius(next) - radius(position)) * ease));
        }
        position = next;
      }
    } while (position !== start);
    paths.push(points);
  }
  const crossings = word.map((k, t) => ({ at: at((t + 0.5) * sector, radius(Math.abs(k) - 0.5)), sign: Math.sign(k) }));
  return { paths, crossings };
}

/** The closure of `word` drawn as a closed braid, or null when the picture does not read back as it. */
export function closedBraidSketch(word: BraidWord, strands = braidStrands(word)): Sketch | null {
  // A strand no letter touches would be a circle round the others: the general layout draws it apart.
  const letters = new Set(word.map(Math.abs));
  if (Array.from({ length: strands }, (_, i) => letters.has(i) || letters.has(i + 1)).includes(false)) return null;
  const target = fromBraid(word, strands);
  for (const turn of [1, -1] as const) {
    const sketch = layoutToSketch(picture(word, strands, turn));
    if (readsBack(sketch, target)) return sketch;
  }
  return null;
}
