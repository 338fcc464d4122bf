// Gaps cut into under-strands, and the SVG / TikZ exports.

import { analyse } from '@/shared/drawing/analyse';
import { toSVG, toTikZ } from '@/shared/drawing/export';
import { visiblePieces } from '@/shared/drawing/pieces';
import { arrowOf, componentNear, crossingNear } from '@/shared/drawing/pick';
import { reverseComponent } from '@/shared/drawing/sketch';
import { dist } from '@/shared/drawing/point';
import { circleCurve, drawCurves } from './drawing-fixtures';

const hopf = drawCurves([circleCurve(200, 200, 50), circleCurve(260, 200, 50)]);

const square = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }, { x: 0, y: 10 }];

describe('visible pieces', () => {
  test('a gap splits an open path in two at the right arc lengths', () => {
    const pieces = visiblePieces(square, false, [{ from: 5, to: 15 }]);
    expect(pieces).toHaveLength(2);
    expect(pieces[0][pieces[0].length - 1]).toEqual({ x: 5, y: 0 });
    expect(pieces[1][0]).toEqual({ x: 10, y: 5 });
  });

  test('a closed path with one gap is one piece; a gap across the start wraps', () => {
    expect(visiblePieces(square, true, [{ from: 5, to: 15 }])).toHaveLength(1);
    const wrapped = visiblePieces(square, true, [{ from: 35, to: 5 }]);
    expect(wrapped).toHaveLength(1);
    expect(wrapped[0][0]).toEqual({ x: 5, y: 0 });
    expect(wrapped[0][wrapped[0].length - 1]).toEqual({ x: 0, y: 5 });
  });

  test('under-strands get a gap at each crossing, over-strands none', () => {
    const a = analyse(hopf);
    expect(a.gaps.map((g) => g.component)).toEqual([a.paths[1].id, a.paths[1].id]);
    const over = visiblePieces(a.paths[0].points, true, a.gaps.filter((g) => g.component === a.paths[0].id));
    const under = visiblePieces(a.paths[1].points, true, a.gaps.filter((g) => g.component === a.paths[1].id));
    expect(over).toHaveLength(1);
    expect(under).toHaveLength(2);
    // No visible point of the under-strand lies within the gap around a crossing.
    for (const c of a.crossings) for (const piece of under) for (const p of piece) expect(dist(p, c.at)).toBeGreaterThan(4);
  });
});

describe('export', () => {
  const a = analyse(hopf);

  test('SVG: one path per visible piece, a colour per component', () => {
    const svg = toSVG(a, { colors: ['red', 'blue'], background: '#223' });
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.match(/<path /g)).toHaveLength(3);
    expect(svg.match(/stroke="red"/g)).toHaveLength(1);
    expect(svg.match(/stroke="blue"/g)).toHaveLength(2);
    expect(svg).toContain('fill="#223"');
  });

  test('a wider gap hides more of the under-strand', () => {
    const visible = (gap: number) =>
      [...toSVG(a, { gap }).matchAll(/d="([^"]*)"/g)].map((m) => m[1].split('L').length).reduce((x, y) => x + y, 0);
    expect(visible(12)).toBeLessThan(visible(4));
  });

  test('TikZ: one \\draw per piece, coordinates within the requested size, y pointing up', () => {
    const tikz = toTikZ(a, { size: 5 });
    expect(tikz.split('\n')[0]).toBe('\\begin{tikzpicture}[line cap=round, line join=round]');
    expect(tikz.match(/\\draw/g)).toHaveLength(3);
    const coords = [...tikz.matchAll(/\((-?[\d.]+),(-?[\d.]+)\)/g)].map((m) => [Number(m[1]), Number(m[2])]);
    expect(Math.max(...coords.map((c) => c[0]))).toBeCloseTo(5, 1);
    expect(Math.min(...coords.flat())).toBeGreaterThanOrEqual(0);
    // The top of the screen picture (smallest y on screen) is the top of the TikZ picture.
    const top = a.paths[0].points.reduce((m, p) => (p.y < m.y ? p : m));
    expect(top.y).toBeLessThan(200);
    expect(Math.max(...coords.map((c) => c[1]))).toBeGreaterThan(3);
  });
});

describe('export marks', () => {
  const a = analyse(hopf);
  const labels = [{ number: 1, framing: -1 }, { number: 2 }];
  const svgArrows = (svg: string) => [...svg.matchAll(/<path d="M([-\d.]+) ([-\d.]+) L[^"]* Z" fill="([^"]+)"/g)];

  test('SVG: an arrowhead per closed component, pointing along its orientation, in its colour', () => {
    const svg = toSVG(a, { colors: ['red', 'blue'], marks: { arrows: true } });
    const heads = svgArrows(svg);
    expect(heads.map((h) => h[3])).toEqual(['red', 'blue']);
    a.paths.forEach((path, i) => {
      const arrow = arrowOf(a, path);
      const tip = { x: Number(heads[i][1]), y: Number(heads[i][2]) };
      // The tip lies ahead of the arrow's point along the direction of travel.
      expect((tip.x - arrow.at.x) * arrow.direction.x + (tip.y - arrow.at.y) * arrow.direction.y).toBeGreaterThan(5);
    });
    expect(svg).not.toContain('<text');
    const back = analyse(reverseComponent(hopf, hopf.components[0].id));
    const flipped = svgArrows(toSVG(back, { marks: { arrows: true } }))[0];
    const before = arrowOf(a, a.paths[0]);
    // Reversed, the first component's arrow points back against its old direction of travel.
    expect((Number(flipped[1]) - before.at.x) * before.direction.x + (Number(flipped[2]) - before.at.y) * before.direction.y).toBeLessThan(-5);
  });

  test('SVG: "number: framing" labels beside the strand, a true minus sign, room for them in the picture', () => {
    const svg = toSVG(a, { marks: { labels } });
    const texts = [...svg.matchAll(/<text x="([-\d.]+)" y="([-\d.]+)"[^>]*>([^<]*)<\/text>/g)];
    expect(texts.map((t) => t[3])).toEqual(['1: \u22121', '2']);
    for (const [i, t] of texts.entries()) {
      const arrow = arrowOf(a, a.paths[i]);
      const at = { x: Number(t[1]), y: Number(t[2]) };
      // On the left of travel (y down: left of direction (dx, dy) is (dy, -dx)), off the strand.
      expect((at.x - arrow.at.x) * arrow.direction.y - (at.y - arrow.at.y) * arrow.direction.x).toBeGreaterThan(10);
      expect(Math.min(...a.paths.flatMap((p) => p.points).map((p) => dist(p, at)))).toBeGreaterThan(8);
    }
    const box = (s: string) => s.match(/viewBox="([-\d.]+) ([-\d.]+) ([-\d.]+) ([-\d.]+)"/)!.slice(1).map(Number);
    expect(box(svg)[2]).toBeGreaterThan(box(toSVG(a))[2]);
  });

  test('TikZ: filled arrowheads and math-mode labels; standalone wraps a LaTeX document', () => {
    const tikz = toTikZ(a, { colors: ['red', 'blue'], marks: { arrows: true, labels } });
    expect(tikz.match(/\\fill\[(red|blue)\] \([^)]*\) -- \([^)]*\) -- \([^)]*\) -- cycle;/g)).toHaveLength(2);
    expect(tikz).toContain('{$1\\colon -1$};');
    expect(tikz).toContain('{$2$};');
    expect(tikz.startsWith('\\begin{tikzpicture}')).toBe(true);
    const doc = toTikZ(a, { marks: { arrows: true, labels }, standalone: true }).split('\n');
    expect(doc.slice(0, 3)).toEqual(['\\documentclass[border=2mm]{standalone}', '\\usepackage{tikz}', '\\begin{document}']);
    expect(doc.slice(-2)).toEqual(['\\end{tikzpicture}', '\\end{document}']);
  });
});

describe('picking', () => {
  const a = analyse(hopf);

  test('a tap near a crossing finds it; far away finds nothing', () => {
    const top = a.crossings.findIndex((c) => c.at.y < 200);
    expect(crossingNear(a, { x: 231, y: 161 }, 10)).toBe(top);
    expect(crossingNear(a, { x: 100, y: 100 }, 10)).toBeNull();
  });

  test('a tap near a strand finds its component and the nearest point', () => {
    const hit = componentNear(a, { x: 150, y: 202 }, 6);
    expect(hit?.id).toBe(a.paths[0].id);
    expect(dist(a.paths[0].points[hit!.index], { x: 150, y: 202 })).toBeLessThan(4); // points are 3 px apart
    expect(componentNear(a, { x: 230, y: 200 }, 6)).toBeNull();
  });

  test('the arrow sits away from crossings and follows the orientation', () => {
    const arrow = arrowOf(a, a.paths[0]);
    for (const c of a.crossings) expect(dist(arrow.at, c.at)).toBeGreaterThan(40);
    expect(Math.hypot(arrow.direction.x, arrow.direction.y)).toBeCloseTo(1, 6);
    const back = analyse(reverseComponent(hopf, hopf.components[0].id));
    const reversed = arrowOf(back, back.paths[0]);
    expect(reversed.direction.x).toBeCloseTo(-arrow.direction.x, 6);
    expect(reversed.direction.y).toBeCloseTo(-arrow.direction.y, 6);
  });
});
