// The standard picture of the r-cable of a framed component (common practice; e.g. Gompf and
// Stipsicz, "4-Manifolds and Kirby Calculus", 1999, ch. 5 on framed pushoffs): the companion is
// laid out first (layout.ts), the component is replaced by r parallel copies offset along the
// normal of its picture, so each of its crossings becomes the grid of the copies' crossings,
// and (framing - blackboard framing) full twists of the copies are drawn as one braid box on
// the component's longest stretch clear of crossings. Kept only when it reads back as
// cable(d, component, r, 0) (read-back.ts); otherwise null (reversed copies are not drawn here).

import { analyse } from '@/shared/drawing/analyse';
import { defaultOptions } from '@/shared/drawing/options';
import { dist, Point } from '@/shared/drawing/point';
import { movingAverage, resample } from '@/shared/drawing/smooth';
import { Sketch } from '@/shared/drawing/sketch';
import { blackboardFramings, Diagram, framingsOf } from '@/shared/knot/diagram';
import { cable } from '@/shared/knot/families';
import { layoutPD } from './layout';
import { readsBack } from './read-back';
import { layoutToSketch } from './to-sketch';

/** Distance between neighbouring copies, length of one letter of the twist box (pixels). */
const APART = 18;
const LETTER = 30;

/** The longest run of consecutive points (cyclically) farther than `clear` from every crossing: its first index and length. */
function longestClearRun(points: readonly Point[], centres: readonly Point[], clear: number) {
  const n = points.length;
  const near = points.map((p) => centres.some((c) => dist(p, c) < clear));
  const start = near.indexOf(true);
  if (start < 0) return { first: 0, count: n };
  let best = { first: 0, count: 0 };
  for (let i = 0, run = 0; i < n; i++) {
    const k = (start + 1 + i) % n;
    run = near[k] ? 0 : run + 1;
    if (run > best.count) best = { first: (k - run + 1 + n) % n, count: run };
  }
  return best;
}

/** The companion scaled about the origin, its paths smoothed (the copies' normals turn gently) and resampled. */
const scaled = (paths: readonly (readonly Point[])[], crossings: readonly { at: Point; sign: number }[], g: number) => ({
  paths: paths.map((p) => resample(movingAverage(movingAverage(p.map((q) => ({ x: q.x * g, y: q.y * g })), true, 4), true, 4), true, defaultOptions.spacing)),
  crossings: crossings.map((c) => ({ at: { x: c.at.x * g, y: c.at.y * g }, sign: c.sign })),
});

export function cablePicture(d: Diagram, component: number, r: number) {
  const layout = layoutPD(d.pd, d.unknots, { spacing: 20 * r + 20 });
  if (!layout.faithful) return null;
  // The companion's crossings where its drawn strands meet (the layout's centres are only near them).
  const companion = analyse(layoutToSketch(layout));
  const drawn = companion.paths.map((p) => p.points);
  const twists = framingsOf(d)[component] - blackboardFramings(d)[component];
  // One letter per crossing of a full twist (sigma_1 ... sigma_(r-1))^r on r strands.
  const letters = Array.from({ length: Math.abs(twists) * r }, () => Array.from({ length: r - 1 }, (_, l) => l)).flat();
  const clear = r * APART + 12;
  const needed = letters.length * LETTER + 2 * clear;
  const step = (p: Point[]) => dist(p[0], p[1]);
  const first = scaled(drawn, companion.crossings, 1);
  const run0 = longestClearRun(first.paths[component], first.crossings.map((c) => c.at), clear);
  // A picture too small for its twist box is drawn larger.
  const room = run0.count * step(first.paths[component]);
  const { paths, crossings } = room >= needed ? first : scaled(drawn, companion.crossings, (1.1 * needed) / room);
  const base = paths[component];
  const n = base.length;
  const run = longestClearRun(base, crossings.map((c) => c.at), clear);
  const ds = step(base);
  const boxFirst = run.first + Math.round((run.count - (letters.length * LETTER) / ds) / 2);
  const normal = base.map((_, i) => {
    const [p, q] = [base[(i + n - 1) % n], base[(i + 1) % n]];
    const len = Math.hypot(q.x - p.x, q.y - p.y) || 1;
    return { x: -(q.y - p.y) / len, y: (q.x - p.x) / len };
  });
  const offsetOf = (position: number) => (position - (r - 1) / 2) * APART;
  const at = (i: number, offset: number): Point => ({ x: base[i].x + normal[i].x * offset, y: base[i].y + normal[i].y * offset });
  // Copy j starts at position j; inside the box, letter l swaps positions l and l + 1 with an eased move.
  const copies = Array.from({ length: r }, (_, j) =>
    base.map((_, k) => {
      const i = (boxFirst + k) % n;
      const s = k * ds;
      let position = j;
      for (let m = 0; m < letters.length; m++) {
        const l = letters[m];
        const u = Math.min(1, Math.max(0, s / LETTER - m));
        if (u === 0) break;
        const ease = (1 - Math.cos(Math.PI * u)) / 2;
        if (position === l || position === l + 1) {
          const to = position === l ? l + 1 : l;
          if (u === 1) position = to;
          else return at(i, offsetOf(position) + (offsetOf(to) - offsetOf(position)) * ease);
        }
      }
      return at(i, offsetOf(position));
    }),
  );
  const box = letters.map((l, m) => {
    const i = (boxFirst + Math.round(((m + 0.5) * LETTER) / ds)) % n;
    return { at: at(i, offsetOf(l + 0.5)), sign: Math.sign(twists) };
  });
  const others = paths.filter((_, c) => c !== component);
  return {
    paths: [...others, ...copies],
    crossings: [...crossings, ...box],
    framings: [...d.framings.filter((_, c) => c !== component), ...copies.map(() => null)],
  };
}

/** The r-cable (parallel copies) of component `component` of d in its standard picture, or null. */
export function cableSketch(d: Diagram, component: number, r: number): Sketch | null {
  const picture = cablePicture(d, component, r);
  if (!picture) return null;
  const sketch = layoutToSketch(picture, picture.framings);
  return readsBack(sketch, cable(d, component, r, 0)) ? sketch : null;
}
