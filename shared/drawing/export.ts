// Pictures for papers and files: an analysed drawing as an SVG document or a TikZ picture (bare,
// or a standalone LaTeX document). Pure string functions; under-strands are drawn with their
// gaps cut out; bands, when given, are drawn over the strands as translucent ribbons along their
// cores; optionally each closed component carries its orientation arrow and a label
// "number: framing" beside it, on its left as it travels (where the Slate puts its badge).

import { Analysis, DrawnPath } from './analyse';
import { arrowHead, arrowOf } from './pick';
import { Point } from './point';
import { gapsAround, visiblePieces } from './pieces';
import { defaultOptions } from './options';

/** What a component's label says; either part may be left out. */
export interface ComponentLabel {
  readonly number?: number;
  readonly framing?: number;
}

export interface Marks {
  /** An arrowhead on every closed component, along its orientation. */
  readonly arrows?: boolean;
  /** One label per path of the analysis (same order), null for none. */
  readonly labels?: readonly (ComponentLabel | null)[];
}

export interface ExportOptions {
  /** One colour per component, cycled (CSS colours for SVG, any xcolor name/HTML for TikZ). */
  readonly colors?: readonly string[];
  readonly strokeWidth?: number;
  /** Background fill (SVG only); none when omitted. */
  readonly background?: string;
  readonly padding?: number;
  /** Half-length of the gap in under-strands (default: 2.5 stroke widths). */
  readonly gap?: number;
  /** Band cores (shared/drawing/bands.ts), drawn as ribbons in `bandColor` (default violet). */
  readonly bands?: readonly (readonly Point[])[];
  readonly bandColor?: string;
  readonly marks?: Marks;
}

/** Chalk on slate: light colours that stay apart for the common colour-vision deficiencies. */
export const chalkPalette: readonly string[] = ['#f4f1e8', '#f2c14e', '#5fb7e5', '#f08a5d', '#b8de6f', '#d7a6f5'];

const fixed = (x: number) => (Math.round(x * 100) / 100).toString();

function piecesOf(a: Analysis, gap: number): { component: number; points: Point[] }[] {
  const all = gapsAround(a.crossings, new Map(a.paths.map((p) => [p.id, p.length])), gap);
  return a.paths.flatMap((path, component) => {
    const gaps = all.filter((g) => g.component === path.id);
    return visiblePieces(path.points, path.closed, gaps).map((points) => ({ component, points }));
  });
}

function bounds(a: Analysis, padding: number, bands: readonly (readonly Point[])[] = []) {
  const all = [...a.paths.flatMap((p) => p.points), ...bands.flat()];
  const xs = all.map((p) => p.x);
  const ys = all.map((p) => p.y);
  const minX = (all.length ? Math.min(...xs) : 0) - padding;
  const minY = (all.length ? Math.min(...ys) : 0) - padding;
  return { minX, minY, width: (all.length ? Math.max(...xs) : 0) + padding - minX, height: (all.length ? Math.max(...ys) : 0) + padding - minY };
}

interface Mark {
  component: number;
  arrow: { at: Point; direction: Point };
  label: ComponentLabel | null;
  /** Unit normal to the strand at the arrow, on its left as it travels (y down). */
  side: Point;
}

function marksOf(a: Analysis, marks: Marks | undefined): Mark[] {
  if (!marks) return [];
  return a.paths.flatMap((path: DrawnPath, component) => {
    const label = marks.labels?.[component] ?? null;
    if (!path.closed || path.points.length < 3 || (!marks.arrows && !label)) return [];
    const arrow = arrowOf(a, path);
    return [{ component, arrow, label, side: { x: arrow.direction.y, y: -arrow.direction.x } }];
  });
}

const signed = (n: number, minus: string) => (n > 0 ? `+${n}` : n < 0 ? `${minus}${-n}` : '0');

/** "1: +2", "1", or "+2"; `minus` is the sign written for negative framings. */
function labelText(l: ComponentLabel, minus: string): string {
  return [l.number?.toString(), l.framing === undefined ? undefined : signed(l.framing, minus)].filter(Boolean).join(': ');
}

/** A standalone SVG document of the drawing. */
export function toSVG(a: Analysis, options: ExportOptions = {}): string {
  const colors = options.colors ?? chalkPalette;
  const width = options.strokeWidth ?? 3;
  const marks = marksOf(a, options.marks);
  const font = 5 * width;
  // Labels stand beside the strand, so the picture needs room for them past its edge.
  const b = bounds(a, (options.padding ?? 10) + (marks.some((m) => m.label) ? 4 * font : 0), options.bands);
  const ribbons = (options.bands ?? []).map((core) => {
    const d = core.map((p, i) => `${i === 0 ? 'M' : 'L'}${fixed(p.x)} ${fixed(p.y)}`).join(' ');
    return `<path d="${d}" fill="none" stroke="${options.bandColor ?? '#9b6bdf'}" stroke-opacity="0.4" stroke-width="${2 * defaultOptions.bandHalfWidth}"/>`;
  });
  const paths = piecesOf(a, options.gap ?? 2.5 * width).map(({ component, points }) => {
    const d = points.map((p, i) => `${i === 0 ? 'M' : 'L'}${fixed(p.x)} ${fixed(p.y)}`).join(' ');
    return `<path d="${d}" fill="none" stroke="${colors[component % colors.length]}" stroke-width="${width}" stroke-linecap="round" stroke-linejoin="round"/>`;
  });
  const marked = marks.flatMap(({ component, arrow, label, side }) => {
    const colour = colors[component % colors.length];
    const head = arrowHead(arrow.at, arrow.direction, 3 * width)
      .map((p, i) => `${i ? 'L' : 'M'}${fixed(p.x)} ${fixed(p.y)}`).join(' ');
    const at = { x: arrow.at.x + side.x * 2 * font, y: arrow.at.y + side.y * 2 * font };
    const anchor = side.x > 0.4 ? 'start' : side.x < -0.4 ? 'end' : 'middle';
    return [
      ...(options.marks?.arrows ? [`<path d="${head} Z" fill="${colour}"/>`] : []),
      ...(label ? [`<text x="${fixed(at.x)}" y="${fixed(at.y + 0.35 * font)}" font-family="sans-serif" font-size="${fixed(font)}" fill="${colour}" text-anchor="${anchor}">${labelText(label, '\u2212')}</text>`] : []),
    ];
  });
  const background = options.background ? [`<rect x="${fixed(b.minX)}" y="${fixed(b.minY)}" width="${fixed(b.width)}" height="${fixed(b.height)}" fill="${options.background}"/>`] : [];
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${fixed(b.minX)} ${fixed(b.minY)} ${fixed(b.width)} ${fixed(b.height)}" width="${fixed(b.width)}" height="${fixed(b.height)}">`,
    ...background,
    ...paths,
    ...ribbons,
    ...marked,
    '</svg>',
  ].join('\n');
}

/** The TikZ anchor of a label standing on `side` of its strand: the label's edge facing the strand. */
function anchorFacing(side: Point): string {
  const vertical = side.y < -0.4 ? 'south' : side.y > 0.4 ? 'north' : ''; // y down: side.y < 0 is above the strand
  const horizontal = side.x > 0.4 ? 'west' : side.x < -0.4 ? 'east' : '';
  return [vertical, horizontal].filter(Boolean).join(' ') || 'center';
}

/**
 * A tikzpicture of the drawing, `size` centimetres wide (y flipped: TikZ's y points up).
 * Colours are given to \\draw as written, so pass names xcolor knows (default: black).
 * `standalone` wraps it in a LaTeX document of its own (class standalone, package tikz).
 */
export function toTikZ(a: Analysis, options: ExportOptions & { size?: number; standalone?: boolean } = {}): string {
  const colors = options.colors ?? ['black'];
  const b = bounds(a, 0, options.bands);
  const k = (options.size ?? 6) / Math.max(b.width, b.height, 1e-9);
  const toPaper = (p: Point) => ({ x: (p.x - b.minX) * k, y: (b.minY + b.height - p.y) * k });
  const coord = (p: Point) => `(${fixed(toPaper(p).x)},${fixed(toPaper(p).y)})`;
  const colour = (component: number) => colors[component % colors.length];
  // Default gap: 1.2 mm either side on paper.
  const lines = piecesOf(a, options.gap ?? 0.12 / k).map(
    ({ component, points }) => `  \\draw[${colour(component)}, line width=${options.strokeWidth ?? 1}pt] ${points.map(coord).join(' -- ')};`,
  );
  const ribbons = (options.bands ?? []).map(
    (core) => `  \\draw[${options.bandColor ?? 'violet'}, opacity=0.4, line width=${fixed(2 * defaultOptions.bandHalfWidth * k)}cm, line cap=butt] ${core.map(coord).join(' -- ')};`,
  );
  // Arrowheads 1.5 mm long, labels 2 mm off the strand, whatever the picture's size.
  const marks = marksOf(a, options.marks).flatMap(({ component, arrow, label, side }) => [
    ...(options.marks?.arrows ? [`  \\fill[${colour(component)}] ${arrowHead(arrow.at, arrow.direction, 0.1 / k).map(coord).join(' -- ')} -- cycle;`] : []),
    ...(label ? [`  \\node[${colour(component)}, anchor=${anchorFacing(side)}, inner sep=1pt, font=\\small] at ${coord({ x: arrow.at.x + side.x * 0.2 / k, y: arrow.at.y + side.y * 0.2 / k })} {$${labelText(label, '-').replace(': ', '\\colon ')}$};`] : []),
  ]);
  const picture = ['\\begin{tikzpicture}[line cap=round, line join=round]', ...lines, ...ribbons, ...marks, '\\end{tikzpicture}'];
  return (options.standalone ? ['\\documentclass[border=2mm]{standalone}', '\\usepackage{tikz}', '\\begin{document}', ...picture, '\\end{document}'] : picture).join('\n');
}
