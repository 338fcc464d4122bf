// "New sketch" left empty leaves no record, also when its page was reloaded; one with a stroke or
// a title is kept (phone, touch).
import type { Browser, CDPSession, Page } from 'playwright-core';
import { person, phoneWithTouch, shoot } from './helpers';

const who = person('Edda Empty', 'edda.empty', 'nothing drawn yet 4');
let browser: Browser;
let page: Page;
let touch: CDPSession;

beforeAll(async () => {
  ({ browser, page, touch } = await phoneWithTouch(who, 20_000));
});

afterAll(async () => {
  await browser?.close();
});

const untitled = () => page.getByRole('link', { name: 'Open Untitled sketch' });

async function newSketchAndBack(fill: () => Promise<void>) {
  await page.getByRole('button', { name: 'New sketch' }).first().click();
  await page.getByTestId('slate-canvas').waitFor();
  await fill();
  await page.getByRole('link', { name: 'Sketches' }).first().click();
  await page.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
}

test('an empty new sketch is gone when its Slate closes, also after a reload', async () => {
  await newSketchAndBack(async () => undefined);
  await newSketchAndBack(async () => undefined);
  await page.getByText('Draw your first link').waitFor();
  expect(await untitled().count()).toBe(0);
  await page.reload();
  await page.getByText('Draw your first link').waitFor();
  expect(await untitled().count()).toBe(0);
});

test('an empty new sketch whose page was reloaded is gone when its Slate closes', async () => {
  await newSketchAndBack(async () => {
    await page.reload();
    await page.getByTestId('slate-canvas').waitFor();
  });
  await page.getByText('Draw your first link').waitFor();
  expect(await untitled().count()).toBe(0);
  await page.reload();
  await page.getByText('Draw your first link').waitFor();
  expect(await untitled().count()).toBe(0);
});

test('a stroke or a title keeps it', async () => {
  await newSketchAndBack(async () => {
    const box = (await page.getByTestId('slate-canvas').boundingBox())!;
    const c = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    const at = (i: number) => [{ x: Math.round(c.x + 60 * Math.cos(i / 5)), y: Math.round(c.y + 60 * Math.sin(i / 5)) }];
    await touch.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: at(0) });
    for (let i = 1; i <= 32; i++) await touch.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: at(i) });
    await touch.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
    await page.getByTestId('readout-crossings-count').getByText('0 crossings').waitFor();
  });
  await untitled().waitFor();
  await newSketchAndBack(async () => {
    await page.getByRole('button', { name: 'Details', exact: true }).click();
    await page.getByRole('textbox', { name: 'Title' }).fill('Only a title');
    await page.getByRole('button', { name: 'Save details' }).click();
    await page.getByRole('heading', { name: 'Only a title' }).waitFor();
  });
  await page.getByRole('link', { name: 'Open Only a title' }).waitFor();
  expect(await untitled().count()).toBe(1);
  await shoot(page, 'empty-sketch-list');
});
