// Drawing with a finger on a phone (390x844, touch events): a quick stroke closes, an overshoot
// is trimmed, a circle traced twice is refused with a warning, Alternate turns a drawn trefoil
// into the trefoil, and the canvas numbers the components in drawing order as the Readout does.
import type { Browser, CDPSession, Page } from 'playwright-core';
import { baseUrl, person, phoneWithTouch, shoot, swipe as fingerSwipe, type ScreenPoint } from './helpers';

const who = person('Tomas Touch', 'tomas.touch', 'chalk and board 6');

let browser: Browser;
let page: Page;
let touch: CDPSession;

type P = ScreenPoint;

const swipe = (points: P[]) => fingerSwipe(touch, points);

async function newSketch(): Promise<{ c: P; box: { width: number; height: number } }> {
  await page.goto(baseUrl + '/sketches/new');
  await page.getByText('Draw a strand. End it where it began to close it.').waitFor();
  const box = (await page.getByTestId('slate-canvas').boundingBox())!;
  return { c: { x: box.x + box.width / 2, y: box.y + box.height / 2 }, box };
}

const settled = (p: Page) => p.waitForFunction(() => document.querySelectorAll('[data-testid^="readout-"][aria-busy="true"]').length === 0);
const count = (text: string) => page.getByTestId('readout-crossings-count').getByText(text).waitFor();

beforeAll(async () => {
  ({ browser, page, touch } = await phoneWithTouch(who, 15_000));
});

afterAll(async () => {
  await browser?.close();
});

test('a quick 30-sample trefoil closes; the Readout says it is descending; Alternate makes it 3_1', async () => {
  const { c, box } = await newSketch();
  const r = Math.min(box.width, box.height) / 7.5;
  // The trefoil curve (sin t + 2 sin 2t, cos t - 2 cos 2t) (common parametrisation) in 30
  // steps of about 30 px, as a one-second stroke on a 60 Hz phone; the finger lifts 8 px from
  // where it went down.
  const points = Array.from({ length: 31 }, (_, i) => {
    const t = (2 * Math.PI * i) / 30;
    return { x: c.x + r * (Math.sin(t) + 2 * Math.sin(2 * t)) + (i === 30 ? 8 : 0), y: c.y + r * (Math.cos(t) - 2 * Math.cos(2 * t)) };
  });
  await swipe(points);
  await count('3 crossings');
  await page.getByTestId('descending-note').waitFor();
  await settled(page);
  await shoot(page, 'slate-descending');
  await page.getByRole('button', { name: 'Make alternating' }).click();
  await page.getByLabel(/invariants match 3₁/).waitFor();
  await settled(page);
  expect(await page.getByTestId('descending-note').count()).toBe(0);
  // One of the two trefoils: V = t + t^3 - t^4 or its mirror V(1/t) (docs/conventions.md; Jones 1985).
  const jones = await page.getByTestId('readout-jones').locator('[role="math"]').getAttribute('aria-label');
  expect(['V(t) = t + t³ − t⁴', 'V(t) = −t⁻⁴ + t⁻³ + t⁻¹']).toContain(jones);
  await shoot(page, 'slate-alternated');
});

test('a circle that runs on 80 px past its start is trimmed and closed', async () => {
  const { c } = await newSketch();
  const r = 90;
  const turn = 2 * Math.PI + 80 / r;
  await swipe(Array.from({ length: 61 }, (_, i) => ({ x: c.x + r * Math.cos((turn * i) / 60), y: c.y + r * Math.sin((turn * i) / 60) })));
  await count('0 crossings');
  await page.getByText('1 component · writhe 0').waitFor();
  expect(await page.getByText(/unfinished/).count()).toBe(0);
});

test('a circle traced twice is refused with a warning, not read as a framed unknot', async () => {
  const { c } = await newSketch();
  // Two laps, the second 7 px outside the first.
  await swipe(Array.from({ length: 121 }, (_, i) => {
    const t = (4 * Math.PI * i) / 120;
    const r = 90 + (7 * t) / (4 * Math.PI);
    return { x: c.x + r * Math.cos(t), y: c.y + r * Math.sin(t) };
  }));
  await page.getByText(/too shallow to see \(traced twice\?\)/).waitFor();
  expect(await page.getByTestId('readout-framings').count()).toBe(0);
  await shoot(page, 'slate-retrace');
});

test('components are numbered on the canvas in drawing order, as in the Readout', async () => {
  const { c } = await newSketch();
  const circle = (o: P, r: number) => Array.from({ length: 41 }, (_, i) => ({ x: o.x + r * Math.cos((2 * Math.PI * i) / 40), y: o.y + r * Math.sin((2 * Math.PI * i) / 40) }));
  // First a circle alone (no crossings), then two overlapping ones.
  await swipe(circle({ x: c.x - 110, y: c.y }, 50));
  await swipe(circle({ x: c.x + 30, y: c.y }, 55));
  await swipe(circle({ x: c.x + 100, y: c.y }, 55));
  await count('2 crossings');
  const labels = await page.getByTestId('slate-canvas').locator('text').evaluateAll((nodes) =>
    nodes.filter((n) => /^\d$/.test(n.textContent ?? '')).map((n) => {
      const r = n.getBoundingClientRect();
      return { text: n.textContent, x: r.x + r.width / 2, fill: n.getAttribute('fill') };
    }));
  labels.sort((p, q) => p.x - q.x);
  expect(labels.map((l) => l.text)).toEqual(['1', '2', '3']);
  // Each in its component's chalk colour: the first circle's strokes carry label 1's colour.
  const strokes = await page.getByTestId('slate-canvas').locator('path[stroke-width="3.4"]').evaluateAll((nodes) => nodes.map((n) => n.getAttribute('stroke')));
  expect(new Set(strokes)).toEqual(new Set(labels.map((l) => l.fill)));
  await settled(page);
  // The later circle passes under at both crossings: linking number 0 (half the sum of the signs, Rolfsen 5.D).
  await page.getByText('lk(2,3) = 0').waitFor();
  await page.getByRole('button', { name: 'Alternate' }).click();
  await page.getByText(/lk\(2,3\) = [+−]1/).waitFor();
  await page.getByText(/1: 0 bb {3}2: 0 bb {3}3: 0 bb/).waitFor();
  await shoot(page, 'slate-numbers');
});
