// The Readout says which chirality the name table means and opens the conventions sheet: the
// closure of the braid word 1 1 1 is the positive trefoil (docs/conventions.md, Braid word),
// which our table calls 3_1, with signature -2 (docs/conventions.md, Signature).
import type { Browser, Page } from 'playwright-core';
import { PHONE, launch, person, register, shoot, signIn } from './helpers';

const who = person('Clara Conventions', 'clara.conv', 'signs and mirrors 7');
let browser: Browser;
let page: Page;

beforeAll(async () => {
  await register(who);
  browser = await launch();
  const context = await browser.newContext({ viewport: PHONE });
  context.setDefaultTimeout(20_000);
  page = await context.newPage();
  await signIn(page, who);
});

afterAll(async () => {
  await browser?.close();
});

test('the name line tells the chirality of 3_1 and the Readout opens the conventions', async () => {
  await page.getByRole('button', { name: 'New sketch' }).first().click();
  await page.getByRole('button', { name: 'Paste a code' }).click();
  await page.getByRole('radio', { name: 'Braid word' }).click();
  await page.getByRole('textbox', { name: 'Braid word' }).fill('1 1 1');
  await page.getByRole('button', { name: 'Draw it' }).click();
  await page.getByLabel(/invariants match 3₁/).waitFor();
  const chirality = page.getByTestId('readout-chirality');
  await chirality.and(page.getByLabel("Our table's 3₁ is the positive (right-handed) trefoil, with signature −2. Positive knots have negative signature here.")).waitFor();
  // The name in it typeset as on the name line (KaTeX), not written 3_1.
  await chirality.locator('.katex').waitFor();
  expect((await chirality.locator('.katex-html').innerText()).replace(/[\s\u200b]/g, '')).toBe('31');
  await chirality.locator('.katex .msupsub').waitFor(); // the 1 set as a subscript
  await page.getByTestId('readout-chirality').scrollIntoViewIfNeeded();
  await shoot(page, 'conventions-00-readout-name');
  await page.getByRole('button', { name: 'Conventions' }).click();
  const sheet = page.getByRole('dialog', { name: 'Conventions' });
  await sheet.getByText(/Positive knots have negative signature: the positive trefoil has signature −2/).waitFor();
  const names = sheet.getByLabel(/3₁ is the positive trefoil/);
  expect(await names.locator('.katex').count()).toBe(2);
  expect(await names.evaluate((e) => Array.from(e.childNodes).filter((n) => n.nodeType === Node.TEXT_NODE).map((n) => n.textContent).join(''))).not.toMatch(/3_1/);
  expect(await sheet.innerText()).toMatch(/Components are numbered in drawing order/);
  await shoot(page, 'conventions-01-sheet');
});
