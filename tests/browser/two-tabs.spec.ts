// Two tabs of the app at once (a run e-mail's link opened in a new tab does this): the device
// database can be held by one tab only, so the first tab owns it and the second works through
// it (lib/store/tab-owner.ts). Both create and list sketches; the status line of neither says
// "Up to date" before a sync has succeeded; when the first tab closes, the second takes over.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { PHONE, baseUrl, launch, newTitledSketch, person, register, shoot, signIn } from './helpers';

const who = person('Rhea Tabs', 'rhea.tabs', 'two tabs one sketchbook 4');

let browser: Browser;
let context: BrowserContext;
const errors: string[] = [];

/** A page of the shared context whose console errors and page errors are kept. */
async function openTab(): Promise<Page> {
  const page = await context.newPage();
  page.on('pageerror', (e) => errors.push(e.message));
  page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
  return page;
}

/** "New sketch", a title through Details, then back to the list. */
async function newSketch(page: Page, title: string): Promise<void> {
  await newTitledSketch(page, title);
  await page.goBack();
  await page.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
}

beforeAll(async () => {
  await register(who);
  browser = await launch();
  context = await browser.newContext({ viewport: PHONE });
  context.setDefaultTimeout(20_000);
});

afterAll(async () => {
  await browser?.close();
});

test('two tabs open at once both create and list sketches, and the second takes over when the first closes', async () => {
  const first = await openTab();
  await signIn(first, who);
  const second = await openTab();
  await second.goto(baseUrl + '/sketches');
  await second.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
  // The second tab's status comes from the owner: never "Up to date" before a round succeeded.
  await second.getByTestId('sync-status').getByText('Up to date').waitFor();

  await newSketch(first, 'Hopf link, first tab');
  await newSketch(second, 'Whitehead link, second tab');
  for (const page of [first, second]) {
    await page.getByRole('link', { name: 'Open Hopf link, first tab' }).waitFor();
    await page.getByRole('link', { name: 'Open Whitehead link, second tab' }).waitFor();
  }
  await shoot(second, 'two-tabs-01-second-tab-list');

  await first.close();
  await newSketch(second, 'Borromean rings, after the first tab closed');
  await second.getByRole('link', { name: 'Open Hopf link, first tab' }).waitFor();
  await second.getByRole('link', { name: 'Open Borromean rings, after the first tab closed' }).waitFor();
  await second.getByTestId('sync-status').getByText('Up to date').waitFor();
  expect(errors.filter((e) => /NoModificationAllowed|createSyncAccessHandle/.test(e))).toEqual([]);
});
