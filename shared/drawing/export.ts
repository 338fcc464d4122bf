// Pictures for papers and files: an analysed drawing as an SVG document or a TikZ snippet.
// Pure string functions; under-strands are drawn with their gaps cut out. Bands, when given, are
// drawn over the strands as translucent ribbons along their cores.

import { Analysis } from './analyse';
import { Point } from './point';
import { gapsAround, visiblePieces } from './pieces';
import { defaultOptions } from './options';

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

/** A standalone SVG document of the drawing. */
export function toSVG(a: Analysis, options: ExportOptions = {}): string {
  const colors = options.colors ?? chalkPalette;
  const width = options.strokeWidth ?? 3;
  const b = bounds(a, options.padding ?? 10, options.bands);
  const ribbons = (options.bands ?? []).map((core) => {
    const d = core.map((p, i) => `${i === 0 ? 'M' : 'L'}${fixed(p.x)} ${fixed(p.y)}`).join(' ');
    return `<path d="${d}" fill="none" stroke="${options.bandColor ?? '#9b6bdf'}" stroke-opacity="0.4" stroke-width="${2 * defaultOptions.bandHalfWidth}"/>`;
  });
  const paths = piecesOf(a, options.gap ?? 2.5 * width).map(({ component, points }) => {
    const d = points.map((p, i) => `${i === 0 ? 'M' : 'L'}${fixed(p.x)} ${fixed(p.y)}`).join(' ');
    return `<path d="${d}" fill="none" stroke="${colors[component % colors.length]}" stroke-width="${width}" stroke-linecap="round" stroke-linejoin="round"/>`;
  });
  const background = options.background ? [`<rect x="${fixed(b.minX)}" y="${fixed(b.minY)}" width="${fixed(b.width)}" height="${fixed(b.height)}" fill="${options.background}"/>`] : [];
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${fixed(b.minX)} ${fixed(b.minY)} ${fixed(b.width)} ${fixed(b.height)}" width="${fixed(b.width)}" height="${fixed(b.height)}">`,
    ...background,
    ...paths,
    ...ribbons,
    '</svg>',
  ].join('\n');
}

/**
 * A tikzpicture of the drawing, `size` centimetres wide (y flipped: TikZ's y points up).
 * Colours are given to \draw as written, so pass names xcolor knows (default: black).
 */
export function toTikZ(a: Analysis, options: ExportOptions & { size?: number } = {}): string {
  const colors = options.colors ?? ['black'];
  const b = bounds(a, 0, options.bands);
  const k = (options.size ?? 6) / Math.max(b.width, b.height, 1e-9);
  const coord = (p: Point) => `(${fixed((p.x - b.minX) * k)},${fixed((b.minY + b.height - p.y) * k)})`;
  // Default gap: 1.2 mm either side on paper.
  const lines = piecesOf(a, options.gap ?? 0.12 / k).map(
    ({ component, points }) => `  \\draw[${colors[component % colors.length]}, line width=${options.strokeWidth ?? 1}pt] ${points.map(coord).join(' -- ')};`,
  );
  const ribbons = (options.bands ?? []).map(
    (core) => `  \\draw[${options.bandColor ?? 'violet'}, opacity=0.4, line width=${fixed(2 * defaultOptions.bandHalfWidth * k)}cm, line cap=butt] ${core.map(coord).join(' -- ')};`,
  );
  return ['\\begin{tikzpicture}[line cap=round, line join=round]', ...lines, ...ribbons, '\\end{tikzpicture}'].join('\n');
}
