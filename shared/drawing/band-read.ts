// From a drawing with bands to what the band mathematics (shared/knot/bands) takes, and to
// the drawing after the band moves. Both are surgery on the drawing (band-trace.ts):
// - the finger drawing: each band's first strand is pushed by a finger move along the core
//   and on over the second strand (isotopies: a finger move, then a Reidemeister II move). The
//   finger's two sides are the band's sides: they cross strands where the core does, over or
//   under as the band does, and each other once per half twist. Each band is then a short
//   saddle across the bigon between the finger's tip and the second strand (swinging it over
//   that strand, hinged on it, brings it back to the band); the bigon's two sides are edges of
//   their own, whose PD labels are read off with the PD code. The R2 also keeps the drawing
//   connected where a band joins split pieces, so the bigon is a face of the code.
// - the after drawing: each band replaced by its two sides, joining the two strands.
// Over/under of every crossing follows its sources: strands as in the drawing, band against
// strand as the band is set, band against band the higher-numbered one under, a twist as its
// handedness says (docs/conventions.md, Bands).

import { bandStages } from '@/shared/knot/bands/saddle';
import { BandError } from '@/shared/knot/bands/types';
import { orient, PDCode } from '@/shared/knot/pd';
import { Analysis, analyse, readDrawing, Reading, UnderRule } from './analyse';
import { bandsOf } from './bands';
import { BandShape, bandShapes, closedOf, offsetAt, sidePoint } from './band-shape';
import { Cut, Join, Source, trace, Traced } from './band-trace';
import { Tip, tipCentre } from './band-tip';
import { DrawingOptions, withDefaults } from './options';
import { add, dist, dot, lerp, Point, scale, sub } from './point';
import { arcsOf } from './polyline';
import { Sketch, SketchComponent } from './sketch';
import { edgeAt } from './to-pd';

export interface Saddle {
  readonly a: number;
  readonly b: number;
}

export interface BandDrawings {
  /** The finger-moved drawing and, read from it, the band presentation. */
  readonly finger: Analysis;
  readonly presentation: { readonly pd: PDCode; readonly unknots: number; readonly saddles: readonly Saddle[] };
  /** The drawing after the band moves and its diagram. */
  readonly after: Analysis;
  readonly afterDiagram: { readonly pd: PDCode; readonly unknots: number; readonly components: number };
}

// Points strictly between p and q, about `spacing` apart.
const between = (p: Point, q: Point, spacing: number): Point[] => {
  const steps = Math.max(1, Math.round(dist(p, q) / spacing));
  return Array.from({ length: steps - 1 }, (_, i) => lerp(p, q, (i + 1) / steps));
};

// One side of a band from core arc s0 to s1 (either way round), with its sources. Side -1 is
// sampled half a step off, so the two sides never share a vertex where a twist crosses them.
function side(b: BandShape, k: number, s: 1 | -1, s0: number, s1: number, spacing: number): Traced {
  const steps = Math.max(2, Math.round(Math.abs(s1 - s0) / spacing));
  const shift = (i: number) => (s < 0 && i > 0 && i < steps ? 0.5 : 0);
  const arcs = Array.from({ length: steps + 1 }, (_, i) => s0 + ((s1 - s0) * (i + shift(i))) / steps);
  return { points: arcs.map((a) => sidePoint(b, s, a)), sources: arcs.map((arc) => ({ kind: 'band', band: k, side: s, arc })) };
}

const concat = (...parts: Traced[]): Traced => ({ points: parts.flatMap((p) => p.points), sources: parts.flatMap((p) => p.sources) });
const bridge = (p: Point, q: Point, source: Source, spacing: number): Traced => {
  const points = between(p, q, spacing);
  return { points, sources: points.map(() => source) };
};

/** Points a band's cut removes either side of its end: about its half width. */
const cutHalf = (b: BandShape, spacing: number) => Math.ceil(b.halfWidth / spacing);

// Travel-order neighbours of a band end: the points where its cut leaves the strand.
function endPoints(c: SketchComponent, index: number, half: number): { in: Point; out: Point } {
  const n = c.points.length;
  const step = c.reversed ? -half : half;
  return { in: c.points[(index - step + 2 * n) % n], out: c.points[(index + step + 2 * n) % n] };
}

// Side `sd` of band k from core arc d1 on over the second strand, square to it, in that order:
// tip sources, since it passes over the second strand. `along` is the side's place along the strand.
function reach(b: BandShape, k: number, sd: 1 | -1, f: Tip, along: 1 | -1, spacing: number): Traced {
  const lane = add(f.q, scale(f.t, along * b.halfWidth));
  const before = add(lane, scale(f.n, b.halfWidth + 4));
  const start = sidePoint(b, sd, b.d1);
  const steps = Math.round((b.halfWidth + 4 + f.overshoot) / spacing);
  const points = [...between(start, before, spacing), before, ...Array.from({ length: steps }, (_, i) => lerp(before, add(lane, scale(f.n, -f.overshoot)), (i + 1) / steps))];
  return { points, sources: points.map(() => ({ kind: 'tip', band: k, middle: false })) };
}

const backwards = (t: Traced): Traced => ({ points: [...t.points].reverse(), sources: [...t.sources].reverse() });

// The finger of band k: from its first strand's incoming end out along one side, over the second
// strand, round the tip, back along the other side to the outgoing end.
function fingerOf(b: BandShape, k: number, closed: readonly SketchComponent[], spacing: number): Join {
  const ends = endPoints(closed[b.from.path], b.from.index, cutHalf(b, spacing));
  const s = b.inSide;
  const out = side(b, k, s, b.d0, b.d1, spacing);
  const back = side(b, k, -s as 1 | -1, b.d1, b.d0, spacing);
  const f = b.tip;
  // Which side of the band's end lies towards +t along the strand.
  const along: 1 | -1 = dot(sub(sidePoint(b, s, b.d1), sidePoint(b, -s as 1 | -1, b.d1)), f.t) > 0 ? 1 : -1;
  const c = tipCentre(f);
  const capSteps = Math.max(4, Math.round((Math.PI * b.halfWidth) / spacing / 2) * 2);
  const cap = Array.from({ length: capSteps - 1 }, (_, i) => {
    const phi = (Math.PI * (i + 1)) / capSteps;
    return add(c, add(scale(f.t, along * b.halfWidth * Math.cos(phi)), scale(f.n, -b.halfWidth * Math.sin(phi))));
  });
  const tip: Traced = { points: cap, sources: cap.map((_, i): Source => ({ kind: 'tip', band: k, middle: 2 * (i + 1) === capSteps })) };
  const edge: Source = { kind: 'band', band: k, side: s, arc: b.d0 };
  return {
    from: `${k}A:in`,
    to: `${k}A:out`,
    piece: concat(
      bridge(ends.in, out.points[0], edge, spacing),
      out,
      reach(b, k, s, f, along, spacing),
      tip,
      backwards(reach(b, k, -s as 1 | -1, f, -along as 1 | -1, spacing)),
      back,
      bridge(back.points[back.points.length - 1], ends.out, { ...edge, side: -s as 1 | -1 }, spacing),
    ),
  };
}

// Band k replaced by its two sides: incoming end of the first strand to the outgoing end of the
// second, and back (band-shape.ts checked that these are the ends the sides reach).
function sides(b: BandShape, k: number, closed: readonly SketchComponent[], spacing: number): Join[] {
  const a = endPoints(closed[b.from.path], b.from.index, cutHalf(b, spacing));
  const z = endPoints(closed[b.to.path], b.to.index, cutHalf(b, spacing));
  const s = b.inSide;
  const there = side(b, k, s, b.d0, b.d1, spacing);
  const back = side(b, k, -s as 1 | -1, b.d1, b.d0, spacing);
  const src = (sd: 1 | -1, arc: number): Source => ({ kind: 'band', band: k, side: sd, arc });
  const last = (t: Traced) => t.points[t.points.length - 1];
  return [
    { from: `${k}A:in`, to: `${k}B:out`, piece: concat(bridge(a.in, there.points[0], src(s, b.d0), spacing), there, bridge(last(there), z.out, src(s, b.d1), spacing)) },
    { from: `${k}B:in`, to: `${k}A:out`, piece: concat(bridge(z.in, back.points[0], src(-s as 1 | -1, b.d1), spacing), back, bridge(last(back), a.out, src(-s as 1 | -1, b.d0), spacing)) },
  ];
}

const circular = (x: number, y: number, total: number) => {
  const d = Math.abs(x - y) % total;
  return Math.min(d, total - d);
};

// Over/under of the surgered drawing's crossings from the sources of their two passages.
function bySource(original: Analysis['crossings'], closed: readonly SketchComponent[], shapes: readonly BandShape[], traced: readonly Traced[]): UnderRule {
  const lengths = closed.map((c) => arcsOf(c.points, true)[c.points.length]);
  // Whether passage p (source s) is over passage q (source t).
  const over = (s: Source, t: Source): boolean => {
    // A finger's tip passes over its second strand (and anything else near it).
    if (s.kind === 'tip' || t.kind === 'tip') return s.kind === 'tip';
    if (s.kind === 'strand' && t.kind === 'strand') {
      // The drawn crossing these two passages are nearest to, along both strands.
      let best = { score: Infinity, over: false };
      for (const c of original) {
        const score = (x: typeof s, id: string, arc: number) => (closed[x.path].id === id ? circular(x.arc, arc, lengths[x.path]) : Infinity);
        const mine = score(s, c.over, c.overArc) + score(t, c.under, c.underArc);
        const theirs = score(t, c.over, c.overArc) + score(s, c.under, c.underArc);
        if (mine < best.score) best = { score: mine, over: true };
        if (theirs < best.score) best = { score: theirs, over: false };
      }
      return best.over;
    }
    if (s.kind === 'strand' || t.kind === 'strand') {
      const [strand, band] = s.kind === 'strand' ? [s, t] : [t, s];
      if (strand.kind !== 'strand' || band.kind !== 'band') return false;
      const id = closed[strand.path].id;
      const nearest = shapes[band.band].crossings.filter((c) => c.component === id).reduce<{ under: boolean; d: number } | null>((m, c) => {
        const d = Math.abs(c.arc - band.arc);
        return m && m.d <= d ? m : { under: c.under, d };
      }, null);
      const bandOver = !(nearest?.under ?? false);
      return s.kind === 'band' ? bandOver : !bandOver;
    }
    if (s.kind !== 'band' || t.kind !== 'band') return false;
    if (s.band !== t.band) return s.band < t.band;
    // A twist: in a positive (right-handed) half twist the side arriving from offset +w passes
    // under, so that with both sides oriented along the core the crossing is positive.
    const b = shapes[s.band];
    const twist = b.twistStarts.reduce((best, start, i) => (Math.abs(start - s.arc) < Math.abs(b.twistStarts[best] - s.arc) ? i : best), 0);
    const arriving = offsetAt(b, s.side, b.twistStarts[twist] ?? 0) > 0;
    return arriving !== (b.twistSign > 0);
  };
  return (found) =>
    found.map((c) => {
      const [p, q] = c.passages;
      return !over(traced[p.path].sources[p.segment], traced[q.path].sources[q.segment]);
    });
}

const asComponents = (traced: readonly Traced[], prefix: string): SketchComponent[] =>
  traced.map((t, i) => ({ id: `${prefix}${i + 1}`, seq: i + 1, points: t.points, closed: true, reversed: false, framing: null }));

function read(original: Analysis['crossings'], closed: readonly SketchComponent[], shapes: readonly BandShape[], traced: readonly Traced[], prefix: string, o: DrawingOptions): Reading {
  return readDrawing(asComponents(traced, prefix), bySource(original, closed, shapes, traced), o);
}

// Where a source sits in the traced drawing: path and point index.
function locate(traced: readonly Traced[], match: (s: Source) => number): { path: number; index: number } | null {
  let best: { path: number; index: number; d: number } | null = null;
  traced.forEach((t, path) =>
    t.sources.forEach((s, index) => {
      const d = match(s);
      if (d < (best?.d ?? Infinity)) best = { path, index, d };
    }),
  );
  return best;
}

/** Text of the refusal when the band mathematics cannot apply the saddles as read. */
export const unreadSaddles = 'The band could not be read as a saddle of the drawing';

// The checks above are meant to leave nothing for the band mathematics to refuse; should a
// drawing still slip through (bands crowding each other's ends), it is refused here, when the
// band is drawn, rather than accepted and then left uncertified.
function saddleRefusal(p: { pd: PDCode; unknots: number; saddles: Saddle[] }): string | null {
  try {
    bandStages({ ...p, saddles: [...p.saddles] });
    return null;
  } catch (e) {
    if (!(e instanceof BandError)) throw e;
    return `${unreadSaddles} (${e.message}): draw it a little elsewhere.`;
  }
}

/**
 * The finger drawing with its band presentation and the after drawing, or the reason there is
 * none (a band that cannot be read, or a drawing or surgery with a degeneracy). null when the
 * sketch has no bands.
 */
export function readBands(sketch: Sketch, options: Partial<DrawingOptions> = {}): BandDrawings | { reason: string } | null {
  const o = withDefaults(options);
  const bands = bandsOf(sketch);
  if (bands.length === 0) return null;
  const base = analyse(sketch, o);
  if (!base.diagram) return { reason: base.markers[0]?.message ?? 'Draw closed strands first.' };
  const closed = closedOf(sketch);
  const shapes: BandShape[] = [];
  for (const shape of bandShapes(sketch, o)) {
    if ('reason' in shape) return shape;
    shapes.push(shape);
  }
  const cutsA: Cut[] = shapes.map((b, k) => ({ id: `${k}A`, path: b.from.path, index: b.from.index, half: cutHalf(b, o.spacing) }));
  const cutsB: Cut[] = shapes.map((b, k) => ({ id: `${k}B`, path: b.to.path, index: b.to.index, half: cutHalf(b, o.spacing) }));
  const fingerTraced = trace(closed, cutsA, shapes.map((b, k) => fingerOf(b, k, closed, o.spacing)));
  const afterTraced = trace(closed, [...cutsA, ...cutsB], shapes.flatMap((b, k) => sides(b, k, closed, o.spacing)));
  if ('reason' in fingerTraced) return fingerTraced;
  if ('reason' in afterTraced) return afterTraced;

  const lengths = closed.map((c) => arcsOf(c.points, true)[c.points.length]);
  const ends = (k: number) => {
    const b = shapes[k];
    const q = arcsOf(closed[b.to.path].points, true)[b.to.index];
    return [
      locate(fingerTraced as Traced[], (s) => (s.kind === 'tip' && s.band === k && s.middle ? 0 : Infinity))!,
      locate(fingerTraced as Traced[], (s) => (s.kind === 'strand' && s.path === b.to.path ? circular(s.arc, q, lengths[b.to.path]) : Infinity))!,
    ];
  };
  const saddlesOf = (reading: Reading): (Saddle | null)[] => {
    const reversed = reading.closed.map(() => false);
    const label = (at: { path: number; index: number }) => edgeAt(reading.overUnder, reading.closed.length, reversed, at.path, arcsOf(reading.closed[at.path].points, true)[at.index]);
    const all = shapes.map((_, k) => ends(k).map(label));
    const used = all.flat();
    return all.map(([a, b]) => (a !== null && b !== null && used.filter((x) => x === a || x === b).length === 2 && a !== b ? { a, b } : null));
  };
  const fingerReading = read(base.crossings, closed, shapes, fingerTraced, 'f', o);
  const saddles = saddlesOf(fingerReading);
  const finger = fingerReading.analysis;
  const after = read(base.crossings, closed, shapes, afterTraced, 'a', o).analysis;
  const problem = finger.markers[0] ?? after.markers[0];
  if (problem) return { reason: `With the bands: ${problem.message}` };
  if (saddles.some((s) => !s)) return { reason: 'Two band ends are too close together on one strand: move one of them.' };
  const fd = finger.diagram!.diagram;
  const ad = after.diagram!.diagram;
  const presentation = { pd: fd.pd, unknots: fd.unknots, saddles: saddles as Saddle[] };
  const unread = saddleRefusal(presentation);
  if (unread) return { reason: unread };
  return {
    finger,
    presentation,
    after,
    afterDiagram: { pd: ad.pd, unknots: ad.unknots, components: orient(ad.pd).components.length + ad.unknots },
  };
}
