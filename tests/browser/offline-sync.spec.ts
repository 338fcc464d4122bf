// Offline-first in a real browser (docs/product.md journeys 1 and 3; sync/SPEC.md S8, S16, S29):
// with the network off, create and edit sketches; reopen the app while the server is still
// unreachable and find them kept; then let the network back and see them reach the server
// and a second signed-in browser context.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { PHONE, WIDE, baseUrl, launch, shoot, uniqueEmail, register } from './helpers';

const who = { name: 'Olga Offline', email: uniqueEmail('olga.offline'), password: 'no signal here 7' };
const FIRST = 'Figure-eight from the talk';
const FIRST_EDITED = 'Figure-eight from the talk (checked)';
const SECOND = 'Second board, no network';

let browser: Browser;
let phone: BrowserContext;
let page: Page;
let token = '';

async function serverTitles(): Promise<string[]> {
  const res = await fetch(baseUrl + '/api/sketches', { headers: { Authorization: `Bearer ${token}` } });
  if (!res.ok) throw new Error(`GET /api/sketches: ${res.status}`);
  return ((await res.json()) as { title: string }[]).map((s) => s.title).sort();
}

async function signIn(p: Page) {
  await p.goto(baseUrl + '/sign-in');
  await p.getByLabel('E-mail').fill(who.email);
  await p.getByLabel('Password').fill(who.password);
  await p.getByRole('button', { name: 'Sign in' }).click();
  await p.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
}

async function setDetails(p: Page, title: string) {
  await p.getByRole('button', { name: 'Details', exact: true }).click();
  await p.getByRole('textbox', { name: 'Title' }).fill(title);
  await p.getByRole('button', { name: 'Save details' }).click();
  await p.getByRole('heading', { name: title }).waitFor();
}

beforeAll(async () => {
  token = await register(who);
  browser = await launch();
  phone = await browser.newContext({ viewport: PHONE });
  phone.setDefaultTimeout(15_000);
  page = await phone.newPage();
  await signIn(page);
});

afterAll(async () => {
  await browser?.close();
});

test('offline: new sketches and edits are kept on the device, nothing reaches the server', async () => {
  await page.getByText('Draw your first link').waitFor(); // the device store is open (its wasm loaded)
  await phone.setOffline(true);
  await page.getByRole('button', { name: 'New sketch' }).first().click();
  await page.getByTestId('slate-canvas').waitFor();
  await page.getByRole('button', { name: 'Paste a code' }).click();
  // The figure-eight knot's PD code (from memory; the Slate spec reads it back as 4_1).
  await page.getByRole('textbox', { name: 'PD code' }).fill('[[4,2,5,1],[8,6,1,5],[6,3,7,4],[2,7,3,8]]');
  await page.getByRole('button', { name: 'Draw it' }).click();
  await page.getByTestId('readout-crossings-count').getByText('4 crossings').waitFor();
  await setDetails(page, FIRST);

  await page.goBack();
  await page.getByRole('link', { name: `Open ${FIRST}` }).waitFor();
  await page.getByRole('button', { name: 'New sketch' }).first().click();
  await page.getByTestId('slate-canvas').waitFor();
  await setDetails(page, SECOND);

  await page.goBack();
  await page.getByRole('link', { name: `Open ${FIRST}` }).click();
  await page.getByTestId('slate-canvas').waitFor();
  await setDetails(page, FIRST_EDITED);
  await page.goBack();
  await page.getByRole('link', { name: `Open ${FIRST_EDITED}` }).waitFor();
  await page.getByRole('link', { name: `Open ${SECOND}` }).waitFor();
  await shoot(page, 'sync-01-offline-sketchbook');

  expect(await serverTitles()).toEqual([]);
});

test('reopened while the server is still unreachable: the sketches are still there, not synced', async () => {
  // The page must load to be reopened; the group server's API stays cut off meanwhile, as on
  // a phone whose app is installed but has no connection to the server.
  await page.route('**/api/**', (route) => route.abort('internetdisconnected'));
  await phone.setOffline(false);
  await page.reload();
  await page.getByRole('link', { name: `Open ${FIRST_EDITED}` }).waitFor();
  await page.getByRole('link', { name: `Open ${SECOND}` }).waitFor();
  expect(await page.getByText(/not synced/).count()).toBe(2);
  expect(await serverTitles()).toEqual([]);
});

test('back online: the sketches reach the server and a second signed-in browser', async () => {
  await page.unroute('**/api/**');
  await page.evaluate(() => window.dispatchEvent(new Event('online')));
  const want = [FIRST_EDITED, SECOND].sort();
  const deadline = Date.now() + 20_000;
  let titles = await serverTitles();
  while (JSON.stringify(titles) !== JSON.stringify(want) && Date.now() < deadline) {
    await new Promise((r) => setTimeout(r, 250));
    titles = await serverTitles();
  }
  expect(titles).toEqual(want);
  await page.getByText(/not synced/).first().waitFor({ state: 'detached', timeout: 20_000 });

  const laptop = await browser.newContext({ viewport: WIDE });
  laptop.setDefaultTimeout(20_000);
  const other = await laptop.newPage();
  await signIn(other);
  await other.getByRole('link', { name: `Open ${FIRST_EDITED}` }).waitFor();
  await other.getByRole('link', { name: `Open ${SECOND}` }).waitFor();
  await other.getByRole('link', { name: `Open ${FIRST_EDITED}` }).click();
  await other.getByTestId('readout-crossings-count').getByText('4 crossings').waitFor();
  await shoot(other, 'sync-02-second-browser');
  await laptop.close();
});
