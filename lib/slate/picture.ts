// What the Slate canvas draws, computed from the document and its analysis: per component its
// colour, its visible pieces (gaps cut at under-crossings) as SVG path data, its orientation
// arrow, its number and its framing badge. World units in, screen pixels out.
import { arrowOf } from '@/shared/drawing/pick';
import type { Analysis } from '@/shared/drawing/analyse';
import type { Point } from '@/shared/drawing/point';
import { gapsAround, visiblePieces } from '@/shared/drawing/pieces';
import { signed } from '@/shared/text/integers';
import { chalkFor } from '@/constants/theme';
import type { SlateDoc } from './record';
import type { View } from './slate-store';

export interface StrandPicture {
  id: string;
  colour: string;
  /** 1-based number in drawing order (as the Readout shows it), null for open strands. */
  number: number | null;
  closed: boolean;
  /** SVG path data of the visible pieces, in screen coordinates. */
  pieces: string[];
  arrow: { at: Point; direction: Point } | null;
  /** The framing badge beside the arrow: "bb" for the blackboard framing, else the integer. */
  badge: { at: Point; text: string; blackboard: boolean } | null;
  /** The component's number, beside the arrow on the side away from the badge. */
  label: { at: Point; text: string } | null;
  /** Open strands: their two ends, drawn as unfinished. */
  ends: Point[];
}

/** Sizes on screen, whatever the zoom (pixels). */
export const screenSizes = { stroke: 3.4, gap: 8, badgeOffset: 30, labelOffset: 15 };

/** The framing badge's pill on the Slate (px). */
export const badgePill = { width: 30, height: 20 };

type Board = { width: number; height: number };

/**
 * Where the badge goes so that all of its pill is on the board: beside an arrow on the
 * drawing's edge it would be cut off (the fit's margin is smaller than the badge's reach, so
 * that a short board still shows the drawing large).
 */
const onBoard = (at: Point, board: Board | undefined): Point => {
  if (!board) return at;
  const within = (v: number, half: number, size: number) => Math.min(Math.max(v, half), size - half);
  return { x: within(at.x, badgePill.width / 2, board.width), y: within(at.y, badgePill.height / 2, board.height) };
};

const fixed = (x: number) => Math.round(x * 10) / 10;

/** Component colour: chosen by hand, else by drawing rank. */
export const colourOf = (doc: SlateDoc, id: string): string => {
  const c = doc.sketch.components.find((x) => x.id === id);
  return chalkFor(doc.colours[id] ?? (c ? c.seq - 1 : 0));
};

export const framingText = (framing: number | null): string => (framing === null ? 'bb' : signed(framing));

/**
 * Closed components numbered 1, 2, ... in the order they were first drawn (a stroke that
 * continues a strand keeps the strand's place): the numbers the canvas, the selection and the
 * Readout show.
 */
export function drawingNumbers(doc: SlateDoc): Map<string, number> {
  const closed = doc.sketch.components.filter((c) => c.closed).sort((p, q) => p.seq - q.seq);
  return new Map(closed.map((c, i) => [c.id, i + 1]));
}

/** The number shown for each component of the drawing's diagram (in the diagram's order), or undefined without a diagram. */
export function diagramNumbers(doc: SlateDoc, a: Analysis): number[] | undefined {
  const numbers = drawingNumbers(doc);
  return a.diagram?.componentIds.map((id) => numbers.get(id) ?? 0);
}

/** `board`: the Slate's size, which keeps the framing badges on it. */
export function strandPictures(doc: SlateDoc, a: Analysis, view: View, board?: Board): StrandPicture[] {
  const numbers = drawingNumbers(doc);
  const screen = (p: Point) => toScreen(view, p);
  const pathData = (points: readonly Point[]) => points.map((p, i) => `${i ? 'L' : 'M'}${fixed(screen(p).x)} ${fixed(screen(p).y)}`).join(' ');
  const gaps = gapsAround(a.crossings, new Map(a.paths.map((p) => [p.id, p.length])), screenSizes.gap / view.k);
  return a.paths.map((path) => {
    const c = doc.sketch.components.find((x) => x.id === path.id)!;
    const arrow = path.closed && path.points.length > 2 ? arrowOf(a, path) : null;
    const at = arrow && screen(arrow.at);
    const { badgeOffset: d, labelOffset: l } = screenSizes;
    const number = numbers.get(path.id) ?? null;
    return {
      id: path.id,
      colour: colourOf(doc, path.id),
      number,
      closed: path.closed,
      pieces: visiblePieces(path.points, path.closed, gaps.filter((g) => g.component === path.id)).map(pathData),
      arrow: arrow && at ? { at, direction: arrow.direction } : null,
      // Beside the arrow, off to its left as it travels.
      badge: arrow && at ? { at: onBoard({ x: at.x + arrow.direction.y * d, y: at.y - arrow.direction.x * d }, board), text: framingText(c.framing), blackboard: c.framing === null } : null,
      label: arrow && at && number ? { at: { x: at.x - arrow.direction.y * l, y: at.y + arrow.direction.x * l }, text: String(number) } : null,
      ends: path.closed || path.points.length === 0 ? [] : [screen(path.points[0]), screen(path.points[path.points.length - 1])],
    };
  });
}

/** A view that fits every point into a box of the given size with a margin, at most 4x. */
export function fitView(points: readonly Point[], width: number, height: number, margin = 36): View {
  if (points.length === 0 || width <= 0 || height <= 0) return { k: 1, x: 0, y: 0 };
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const k = Math.min(4, (width - 2 * margin) / Math.max(x1 - x0, 1), (height - 2 * margin) / Math.max(y1 - y0, 1));
  return { k, x: width / 2 - k * (x0 + x1) / 2, y: height / 2 - k * (y0 + y1) / 2 };
}

export const toScreen = (v: View, p: Point): Point => ({ x: p.x * v.k + v.x, y: p.y * v.k + v.y });
export const toWorld = (v: View, p: Point): Point => ({ x: (p.x - v.x) / v.k, y: (p.y - v.y) / v.k });
