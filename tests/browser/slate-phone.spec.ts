// The Slate on a phone (390x844, touch): the bar under the canvas trades drawing room for
// Readout room (the canvas becomes a strip still showing the whole drawing), and back.
import type { Browser, Page } from 'playwright-core';
import { baseUrl, person, phoneWithTouch, shoot } from './helpers';

const who = person('Pia Phone', 'pia.phone', 'small screens 5');
let browser: Browser;
let page: Page;

beforeAll(async () => {
  ({ browser, page } = await phoneWithTouch(who, 20_000));
});

afterAll(async () => {
  await browser?.close();
});

test('More room for the Readout: a shorter canvas still showing the whole drawing, more Readout rows in view', async () => {
  await page.goto(baseUrl + '/sketches/new');
  await page.getByTestId('slate-canvas').waitFor();
  await page.getByRole('button', { name: 'Paste a code' }).click();
  await page.getByRole('radio', { name: 'Braid word' }).click();
  // The closure of [1,1,1] is the positive trefoil (docs/conventions.md, Braid word).
  await page.getByRole('textbox', { name: 'Braid word' }).fill('1 1 1');
  await page.getByRole('button', { name: 'Draw it' }).click();
  await page.getByTestId('readout-crossings-count').getByText('3 crossings').waitFor();
  const canvas = page.getByTestId('slate-canvas');
  const tabs = (await page.getByTestId('tab-sketches').boundingBox())!;
  // In view: between the bar under the canvas and the tab bar.
  const visible = async (testId: string) => {
    const bar = (await page.getByRole('button', { name: /^More room/ }).boundingBox())!;
    const box = (await page.getByTestId(testId).boundingBox())!;
    return box.y >= bar.y + bar.height && box.y + box.height <= tabs.y;
  };
  // The Readout from its top, as after opening the sketch.
  await page.getByTestId('readout-crossings-count').evaluate((e) => {
    for (let p = e.parentElement; p; p = p.parentElement) if (p.scrollHeight > p.clientHeight + 1) p.scrollTop = 0;
  });
  const before = (await canvas.boundingBox())!;
  expect(await visible('readout-crossings-count')).toBe(true);
  expect(await visible('readout-jones')).toBe(false);

  await page.getByRole('button', { name: 'More room for the Readout' }).click();
  await page.getByRole('button', { name: 'More room to draw' }).waitFor();
  await page.waitForTimeout(300);
  const after = (await canvas.boundingBox())!;
  // About 230 px more Readout on a 844 px phone: the Jones polynomial joins the count in view.
  expect(after.height).toBeLessThan(before.height - 200);
  expect(await visible('readout-jones')).toBe(true);
  // The drawing is fitted to the shorter canvas: every strand inside it.
  for (const box of await Promise.all((await canvas.locator('path').all()).map((p) => p.boundingBox()))) {
    if (!box) continue;
    expect(box.y).toBeGreaterThanOrEqual(after.y - 2);
    expect(box.y + box.height).toBeLessThanOrEqual(after.y + after.height + 2);
  }
  await shoot(page, 'slate-phone-reading');
  await page.getByRole('button', { name: 'More room to draw' }).click();
  await page.getByRole('button', { name: 'More room for the Readout' }).waitFor();
  await page.waitForTimeout(300);
  expect((await canvas.boundingBox())!.height).toBeCloseTo(before.height, 0);
});

test('a long title takes two lines of the header, not cut; "Draw it" stays in view in every family', async () => {
  const title = 'Figure-eight from the Tuesday seminar';
  await page.getByRole('button', { name: 'Details', exact: true }).click();
  await page.getByRole('textbox', { name: 'Title' }).fill(title);
  await page.getByRole('button', { name: 'Save details' }).click();
  const heading = page.getByRole('heading', { name: title });
  await heading.waitFor();
  expect(await heading.evaluate((e) => e.scrollHeight <= e.clientHeight + 1 && e.scrollWidth <= e.clientWidth + 1)).toBe(true);

  await page.getByRole('button', { name: 'Families' }).click();
  const draw = page.getByRole('button', { name: 'Draw it' });
  // On top and inside the 844 px screen, with no scrolling: the dialog keeps its buttons under the fields.
  const inView = () => draw.evaluate((e) => {
    const r = e.getBoundingClientRect();
    const top = document.elementFromPoint(r.x + r.width / 2, r.y + r.height / 2);
    return r.top >= 0 && r.bottom <= window.innerHeight && !!top && e.contains(top);
  });
  for (const family of ['Torus link', 'Twist knot', 'Pretzel link', 'Rational knot', 'Cable of the sketch']) {
    await page.getByRole('radio', { name: family }).click();
    expect([family, await inView()]).toEqual([family, true]);
  }
  await shoot(page, 'slate-phone-families');
  await page.getByRole('button', { name: 'Cancel' }).click();
});
