// Keyboard shortcuts on a wide screen (docs/product.md journey 5): g then a destination's first letter
// switches destination, ? lists the live shortcuts, Escape closes the list, and keys typed into
// a field stay in the field. Screenshot of the list at 1440x900 (tests/artifacts/shortcuts-*).
import type { Browser, Page } from 'playwright-core';
import { WIDE, baseUrl, launch, shoot, uniqueEmail } from './helpers';

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launch();
  page = await (await browser.newContext({ viewport: WIDE })).newPage();
  await page.goto(baseUrl + '/sign-up');
  await page.getByLabel('Name').fill('Kit Aranda');
  await page.getByLabel('E-mail').fill(uniqueEmail('kit'));
  await page.getByLabel('Password').fill('correct horse 4');
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
});

afterAll(async () => {
  await browser?.close();
});

const blur = () => page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());

test('g then f, r, a, s switches destination', async () => {
  await blur();
  for (const [key, heading, path] of [['f', 'Feed', '/feed'], ['r', 'Runs', '/runs'], ['a', 'Account', '/account'], ['s', 'Sketches', '/sketches']]) {
    await page.keyboard.press('g');
    await page.keyboard.press(key);
    await page.waitForURL((u) => u.pathname === path);
    await page.getByRole('heading', { name: heading, exact: true }).waitFor();
  }
}, 60_000);

test('? shows the live shortcuts, Escape closes them; keys typed in a field stay there', async () => {
  await page.keyboard.press('g');
  await page.keyboard.press('r');
  await page.getByRole('heading', { name: 'Runs', exact: true }).waitFor();
  await blur();
  await page.keyboard.press('?');
  const sheet = page.getByRole('dialog', { name: 'Keyboard shortcuts' });
  await sheet.waitFor();
  await expect(sheet.getByText('Go to').isVisible()).resolves.toBe(true);
  await expect(sheet.getByText('Runs', { exact: true }).isVisible()).resolves.toBe(true);
  await shoot(page, 'shortcuts-01-sheet');
  await page.keyboard.press('Escape');
  await sheet.waitFor({ state: 'detached' });

  const field = page.getByLabel('PD code');
  await field.click();
  await page.keyboard.type('g f ?');
  await expect(field.inputValue()).resolves.toBe('g f ?');
  expect(new URL(page.url()).pathname).toBe('/runs');
  await expect(page.getByRole('dialog', { name: 'Keyboard shortcuts' }).count()).resolves.toBe(0);
}, 60_000);
