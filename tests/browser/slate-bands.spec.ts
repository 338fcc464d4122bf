// Bands on the Slate with a finger at 390x844: a drawn unknot and two bands across it; the
// After the bands view shows three components and the Readout certifies a ribbon disk (two
// bands to the 3-component unlink: c = b + 1, shared/knot/bands/certificate.ts). A half twist
// on a band between antiparallel strands would make a Moebius band: it is refused with the reason.
import type { Browser, CDPSession, Page } from 'playwright-core';
import { baseUrl, person, phoneWithTouch, shoot, swipe as fingerSwipe, type ScreenPoint } from './helpers';

const who = person('Bea Bands', 'bea.bands', 'ribbon and disk 4');

let browser: Browser;
let page: Page;
let touch: CDPSession;

type P = ScreenPoint;

const swipe = (points: P[]) => fingerSwipe(touch, points);

const line = (p: P, q: P, n = 24): P[] => Array.from({ length: n + 1 }, (_, i) => ({ x: p.x + ((q.x - p.x) * i) / n, y: p.y + ((q.y - p.y) * i) / n }));

beforeAll(async () => {
  ({ browser, page, touch } = await phoneWithTouch(who, 20_000));
});

afterAll(async () => {
  await browser?.close();
});

test('an unknot with two bands across it: 3-component unlink, ribbon', async () => {
  await page.goto(baseUrl + '/sketches/new');
  await page.getByText('Draw a strand. End it where it began to close it.').waitFor();
  const box = (await page.getByTestId('slate-canvas').boundingBox())!;
  const c = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
  const [rx, ry] = [100, 150];
  await swipe(Array.from({ length: 61 }, (_, i) => ({ x: c.x + rx * Math.cos((2 * Math.PI * i) / 60), y: c.y + ry * Math.sin((2 * Math.PI * i) / 60) })));
  await page.getByText('1 component · writhe 0').waitFor();

  await page.getByRole('button', { name: 'Bands' }).click();
  // Across the ellipse at y = c.y -+ 60, from the left strand to the right one.
  const half = rx * Math.sqrt(1 - (60 / ry) ** 2);
  for (const dy of [-60, 60]) await swipe(line({ x: c.x - half, y: c.y + dy }, { x: c.x + half, y: c.y + dy }));
  await page.getByTestId('readout-bands-ribbon').getByText('Ribbon disk: the knot is ribbon, hence slice').waitFor();
  await page.getByText('2 bands → 3-component unlink (certified: crossingless)').waitFor();
  await page.getByText('g4 ≤ 0').waitFor();
  await shoot(page, 'slate-bands');

  await page.getByRole('button', { name: 'After the bands' }).click();
  await page.getByTestId('after-bands').getByText('After the bands · 3 components').waitFor();
  expect(await page.getByTestId('after-bands').innerText()).toContain('3 components');
  await shoot(page, 'slate-bands-after');
  await page.getByRole('button', { name: 'After the bands' }).click();

  // The second band is open (just drawn): one half twist is refused, the reason shown.
  await page.getByRole('button', { name: 'One half twist more' }).click();
  await page.getByText(/would make the surface non-orientable/).first().waitFor();
  await shoot(page, 'slate-bands-refused');
  // Undo takes the twist back: ribbon again.
  await page.getByRole('button', { name: 'Undo' }).click();
  await page.getByTestId('readout-bands-ribbon').waitFor();
});
