// Families in their standard pictures on a phone (390x844): a pretzel link in columns, a
// connected sum side by side, a 2-cable as two parallel copies of its companion.
import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { baseUrl, person, phoneWithTouch, shoot } from './helpers';

const who = person('Petra Pictures', 'petra.pictures', 'columns and copies 3');
let browser: Browser;
let page: Page;

beforeAll(async () => {
  ({ browser, page } = await phoneWithTouch(who, 30_000));
});

afterAll(async () => {
  await browser?.close();
});

/** Screenshots at both sizes, also kept under /tmp/pictures-shots for review. */
async function keep(name: string) {
  await shoot(page, name);
  mkdirSync('/tmp/pictures-shots', { recursive: true });
  for (const size of ['390x844', '1440x900']) copyFileSync(join(__dirname, '../artifacts', `${name}-${size}.png`), `/tmp/pictures-shots/${name}-${size}.png`);
}

type Point = { x: number; y: number };

/** Every visible piece of strand on the canvas (cut at the under-crossings): its chalk colour and its points. */
async function pieces(): Promise<{ colour: string; points: Point[] }[]> {
  const paths = await page.getByTestId('slate-canvas').locator('path[stroke-width="3.4"]').all();
  return Promise.all(paths.map(async (p) => ({
    colour: (await p.getAttribute('stroke')) ?? '',
    points: [...((await p.getAttribute('d')) ?? '').matchAll(/[ML](-?[\d.]+) (-?[\d.]+)/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) })),
  })));
}

const boxOf = (points: Point[]) => {
  const [xs, ys] = [points.map((p) => p.x), points.map((p) => p.y)];
  return { x: Math.min(...xs), y: Math.min(...ys), width: Math.max(...xs) - Math.min(...xs), height: Math.max(...ys) - Math.min(...ys) };
};

async function family(name: string, fields: Record<string, string>, placement?: string) {
  await page.getByRole('button', { name: 'Families' }).click();
  await page.getByRole('radio', { name }).click();
  for (const [label, value] of Object.entries(fields)) await page.getByRole('textbox', { name: label }).fill(value);
  if (placement) await page.getByRole('radio', { name: placement }).click();
  await page.getByRole('button', { name: 'Draw it' }).click();
}

test('a pretzel link is drawn as columns of twists', async () => {
  await page.goto(baseUrl + '/sketches/new');
  await page.getByTestId('slate-canvas').waitFor();
  await family('Pretzel link', { 'Columns a1 a2 …': '-2 3 7' });
  // P(-2,3,7): 2 + 3 + 7 crossings, a knot (odd columns with one even: common practice).
  await page.getByTestId('readout-crossings-count').getByText('12 crossings').waitFor();
  await page.getByText(/^1 component/).waitFor();
  await page.waitForTimeout(300);
  const all = await pieces();
  const drawing = boxOf(all.flatMap((p) => p.points));
  // The pieces end at the gaps of the under-crossings, and the crossings stand in three
  // columns across the drawing: the ends' x-coordinates fall in three narrow groups.
  const ends = all.flatMap((p) => [p.points[0].x, p.points[p.points.length - 1].x]).sort((a, b) => a - b);
  const starts = ends.filter((x, i) => i === 0 || x - ends[i - 1] > 0.15 * drawing.width);
  expect(starts).toHaveLength(3);
  for (const s of starts) expect(Math.max(...ends.filter((x) => x >= s && x < s + 0.15 * drawing.width)) - s).toBeLessThan(0.1 * drawing.width);
  await keep('slate-pretzel');
});

test('a connected sum is drawn side by side', async () => {
  await family('Torus link', { 'p (strands)': '2', 'q (turns)': '3' }, 'Connected sum');
  // P(-2,3,7) # T(2,3): the crossings add up (12 + 3), still a knot.
  await page.getByTestId('readout-crossings-count').getByText('15 crossings').waitFor();
  await page.waitForTimeout(300);
  const drawing = boxOf((await pieces()).flatMap((p) => p.points));
  await keep('slate-sum');
  // Two summands side by side: wider than high (the pretzel alone is higher than wide).
  expect(drawing.width).toBeGreaterThan(1.2 * drawing.height);
});

test('a 2-cable is drawn as two parallel copies of the companion', async () => {
  await family('Torus link', { 'p (strands)': '2', 'q (turns)': '3' }, 'Replace the sketch');
  await page.getByTestId('readout-crossings-count').getByText('3 crossings').waitFor();
  await family('Cable of the sketch', { Component: '1', Framing: '1', 'r+ (parallel copies)': '2', 'r- (reversed copies)': '0' });
  // The (2,0)-cable of the +1-framed right trefoil (writhe 3): 4 x 3 grid crossings and one
  // full twist of -2 (the framing minus the writhe) on two strands, 2 crossings each (common practice).
  await page.getByTestId('readout-crossings-count').getByText('16 crossings').waitFor();
  // Two copies of a +1-framed knot link once (the framing is their linking number: common practice).
  await page.getByText('lk(1,2) = +1').waitFor();
  await page.waitForTimeout(300);
  const all = await pieces();
  const colours = [...new Set(all.map((p) => p.colour))];
  expect(colours).toHaveLength(2);
  const [a, b] = colours.map((c) => all.filter((p) => p.colour === c).flatMap((p) => p.points));
  const size = boxOf([...a, ...b]).width;
  // Parallel copies: most points of one copy lie a small, steady offset (a few percent of the
  // drawing's width, several pixels) from the other copy.
  const near = a.map((p) => Math.min(...b.map((q) => Math.hypot(p.x - q.x, p.y - q.y)))).sort((s, t) => s - t);
  const [low, median, high] = [near[Math.floor(near.length * 0.25)], near[near.length >> 1], near[Math.floor(near.length * 0.75)]];
  expect(median).toBeGreaterThan(4);
  expect(median).toBeLessThan(0.1 * size);
  expect(high - low).toBeLessThan(0.5 * median);
  await keep('slate-cable');
});
