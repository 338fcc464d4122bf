// Bands for the specs that draw them by touch on a pasted code: the same band built in Node (to
// check the mathematics first) and swiped on the Slate, where the view fits the drawing.
import type { CDPSession, Page } from 'playwright-core';
import { fitView, toScreen } from '@/lib/slate/picture';
import { addBand } from '@/shared/drawing/bands';
import { readBands } from '@/shared/drawing/band-read';
import type { Point } from '@/shared/drawing/point';
import type { Sketch } from '@/shared/drawing/sketch';
import { swipe } from './helpers';

/** A band's core: the straight drag from p to q. */
export const line = (p: Point, q: Point, n = 24): Point[] => Array.from({ length: n + 1 }, (_, i) => ({ x: p.x + ((q.x - p.x) * i) / n, y: p.y + ((q.y - p.y) * i) / n }));

export function withBand(s: Sketch, [p, q]: [Point, Point]): Sketch {
  const r = addBand(s, line(p, q));
  if ('reason' in r) throw new Error(r.reason);
  return r.sketch;
}

/** The band presentation the Readout certifies (read off the finger drawing). */
export function presentation(s: Sketch) {
  const r = readBands(s);
  if (!r || 'reason' in r) throw new Error(r ? r.reason : 'no bands');
  return { ...r.presentation, saddles: [...r.presentation.saddles] };
}

/** The Bands tool, then one finger drag along the band's core (world points of `drawing`, as the Slate shows it). */
export async function drawBand(page: Page, touch: CDPSession, drawing: Sketch, band: [Point, Point]): Promise<void> {
  await page.waitForTimeout(300); // the view fits the pasted drawing
  const box = (await page.getByTestId('slate-canvas').boundingBox())!;
  const view = fitView(drawing.components.flatMap((c) => c.points), box.width, box.height);
  const screen = (p: Point) => {
    const s = toScreen(view, p);
    return { x: box.x + s.x, y: box.y + s.y };
  };
  await page.getByRole('button', { name: 'Bands' }).click();
  await swipe(touch, line(screen(band[0]), screen(band[1])));
}

/** The phone's split: a shorter canvas and more of the Readout in view (once per sketch page). */
export async function moreReadout(page: Page): Promise<void> {
  const more = page.getByRole('button', { name: 'More room for the Readout' });
  if (await more.count()) await more.click();
}
