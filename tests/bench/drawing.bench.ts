// Slate latency: from the end of a stroke to a diagram and its Jones polynomial, for drawings
// of 5, 15 and 30 crossings (goal: 15 crossings within one 16 ms frame). The drawings are the
// layouts of closures of (sigma_1 sigma_2^-1)^k; the timed stroke is the last component drawn
// again as one stroke (smoothing, closing, crossings, degeneracy checks, PD code, then Jones
// from the knot core), the others being on the Slate already.

import { analyse } from '@/shared/drawing/analyse';
import { readBands } from '@/shared/drawing/band-read';
import { addBand } from '@/shared/drawing/bands';
import { addStroke, flipCrossing, Sketch } from '@/shared/drawing/sketch';
import { layoutPD } from '@/shared/layout/layout';
import { layoutToSketch } from '@/shared/layout/to-sketch';
import { fromBraid } from '@/shared/knot/braid';
import { jones } from '@/shared/knot/jones';
import { median, round, type Line } from './timing';

const word = (n: number) => Array.from({ length: n }, (_, i) => (i % 2 === 0 ? 1 : -2));

// The link's picture: a sketch of all components but the last, the last as raw touch points of
// one stroke, and the flips that make the crossings right.
function drawingOf(crossings: number): { before: Sketch; points: { x: number; y: number }[]; flips: Sketch['flips'] } {
  const d = fromBraid(word(crossings));
  const s = layoutToSketch(layoutPD(d.pd, d.unknots));
  const last = s.components[s.components.length - 1];
  return { before: { ...s, components: s.components.slice(0, -1), flips: [] }, points: [...last.points, last.points[0]], flips: s.flips };
}

// Pasting a code: PD code to a verified picture and an editable sketch.
function layoutLines(runs: number): Line[] {
  return [15, 30].map((n) => {
    const d = fromBraid(word(n));
    const times = Array.from({ length: runs }, () => {
      const t0 = performance.now();
      layoutToSketch(layoutPD(d.pd, d.unknots));
      return performance.now() - t0;
    });
    return { name: `layout: PD code -> picture -> sketch, ${n} crossings (median of ${runs})`, value: round(median(times)), unit: 'ms' };
  });
}

export function drawingBench(runs = 30): Line[] {
  return [...strokeLines(runs), ...layoutLines(5), ...bandLines(10)];
}

// Reading bands (finger drawing, saddles, after drawing): a tall ellipse with k bands across it.
function bandLines(runs: number): Line[] {
  return [2, 6].map((k) => {
    const ellipse = Array.from({ length: 241 }, (_, i) => ({ x: 200 + 100 * Math.cos((2 * Math.PI * i) / 240), y: 400 + 380 * Math.sin((2 * Math.PI * i) / 240) }));
    const s = Array.from({ length: k }, (_, i) => 400 - 300 + (600 * (i + 0.5)) / k).reduce((acc, y) => {
      const half = 100 * Math.sqrt(1 - ((y - 400) / 380) ** 2);
      const r = addBand(acc, Array.from({ length: 21 }, (_, j) => ({ x: 200 - half + (2 * half * j) / 20, y })));
      if ('reason' in r) throw new Error(r.reason);
      return r.sketch;
    }, addStroke({ components: [], flips: [], nextSeq: 1 }, ellipse));
    const times = Array.from({ length: runs }, () => {
      const t0 = performance.now();
      const r = readBands(s);
      if (!r || 'reason' in r || r.afterDiagram.components !== k + 1) throw new Error(`bench bands: ${r && 'reason' in r ? r.reason : 'wrong count'}`);
      return performance.now() - t0;
    });
    return { name: `bands: finger and after drawings, an unknot with ${k} bands (median of ${runs})`, value: round(median(times)), unit: 'ms' };
  });
}

function strokeLines(runs: number): Line[] {
  return [5, 15, 30].flatMap((n) => {
    const { before, points, flips } = drawingOf(n);
    const times: number[] = [];
    const analysis: number[] = [];
    let found = 0;
    for (let r = -5; r < runs; r++) {
      const t0 = performance.now();
      const s = flips.reduce((acc, f) => flipCrossing(acc, f), addStroke(before, points));
      const a = analyse(s);
      const t1 = performance.now();
      if (a.diagram) jones(a.diagram.diagram);
      if (r < 0) continue; // warm-up
      times.push(performance.now() - t0);
      analysis.push(t1 - t0);
      found = a.crossings.length;
      if (!a.diagram || found !== n) throw new Error(`bench drawing of ${n} crossings read back as ${found}`);
    }
    return [
      { name: `drawing: stroke end -> diagram, ${found} crossings (median of ${runs})`, value: round(median(analysis)), unit: 'ms' },
      { name: `drawing: stroke end -> diagram + Jones, ${found} crossings (median of ${runs})`, value: round(median(times)), unit: 'ms', goal: n === 15 ? '<= 16 ms' : undefined },
    ];
  });
}
