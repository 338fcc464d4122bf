// A newcomer's walk from a pasted code to a run, checking what a first try found rough: a group
// with a long name, a titled sketch's header, the run form's note, the table's note on a phone,
// the runs table's Time column, the feed picture's labels. Screenshots in tests/artifacts/walk-*.
import type { Browser, Locator, Page } from 'playwright-core';
import { PHONE, WIDE, baseUrl, call, launch, newTitledSketch, person, register, shoot, signIn } from './helpers';

const ada = person('Ada Longname', 'ada.walk', 'correct horse 8');
const GROUP = 'Low-Dimensional Topology and Quantum Invariants Reading Seminar, Harrowgate';
const TITLE = 'Mirror five-two from the board';
// 5_2 as the closure of the 3-braid 1 1 1 2 -1 2 (from memory; the Readout names it).
const BRAID = '1 1 1 2 -1 2';

let browser: Browser;
let page: Page;
let token = '';
let sketchId = '';

/** Whether an element's content runs past its own box (cut off or spilling out). */
const overflows = (l: Locator) => l.evaluate((e) => e.scrollWidth > e.clientWidth + 1);

beforeAll(async () => {
  token = await register(ada);
  await call('POST', '/api/groups', token, { name: GROUP });
  browser = await launch();
  page = await (await browser.newContext({ viewport: PHONE })).newPage();
  page.setDefaultTimeout(20_000);
  await signIn(page, ada);
});

afterAll(async () => {
  await browser?.close();
});

test('a titled sketch is not asked for a title; the share button with a long group name stays inside its dialog', async () => {
  await page.getByText('Draw your first link').waitFor(); // the device store is open
  await newTitledSketch(page, TITLE);
  sketchId = new URL(page.url()).pathname.split('/').pop()!;
  const header = page.getByRole('button', { name: 'Sketch details' });
  await expect(header.innerText()).resolves.toContain('Add where it was seen, notes, a photo');
  await page.getByRole('button', { name: 'Paste a code' }).click();
  await page.getByRole('radio', { name: 'Braid word' }).click();
  await page.getByRole('textbox', { name: 'Braid word' }).fill(BRAID);
  await page.getByRole('button', { name: 'Draw it' }).click();
  await page.getByTestId('readout-crossings-count').getByText('6 crossings').waitFor();

  await page.getByRole('button', { name: 'Share', exact: true }).click();
  const dialog = page.getByRole('dialog', { name: 'Share to a group' });
  const share = dialog.getByRole('button', { name: `Share to ${GROUP}` });
  await share.waitFor();
  for (const size of [PHONE, WIDE]) {
    await page.setViewportSize(size);
    await page.waitForTimeout(250);
    const [d, b] = [(await dialog.boundingBox())!, (await share.boundingBox())!];
    expect(b.x + b.width).toBeLessThanOrEqual(d.x + d.width);
    expect(await overflows(share)).toBe(false);
  }
  await page.setViewportSize(PHONE);
  await shoot(page, 'walk-01-share-long-group');
  await share.click();
  await dialog.getByTestId('share-state').getByText(`Shared to ${GROUP}`, { exact: false }).waitFor();
  await dialog.getByRole('button', { name: 'Close' }).click();
}, 60_000);

test('the Runs form names all three codes; a run page on a phone never points to a Focus button it lacks', async () => {
  await page.getByRole('tab', { name: 'Runs' }).click();
  await page.getByText('Paste a PD code, DT code or braid word', { exact: false }).waitFor();

  // The form runs the sketch as the server has it: back in the list, wait for the sync.
  await page.getByRole('tab', { name: 'Sketches' }).click();
  await page.getByRole('link', { name: 'Sketches' }).click();
  const row = page.getByRole('link', { name: `Open ${TITLE}` });
  await row.waitFor();
  await row.getByText('not synced', { exact: false }).waitFor({ state: 'detached' });
  await row.click();
  await page.getByRole('button', { name: 'Start a heavy run' }).click();
  await page.getByRole('button', { name: 'Start run' }).click();
  await page.getByTestId('run-status').getByText('Done').waitFor({ timeout: 60_000 });
  // Six columns of groups are wider than a phone: the note says so, and offers only scrolling.
  const note = page.getByRole('note').filter({ hasText: 'Larger than this view' });
  await note.waitFor();
  expect(await note.innerText()).not.toContain('Focus');
  await shoot(page, 'walk-02-run-phone');

  await page.setViewportSize(WIDE);
  await page.getByRole('button', { name: 'Focus: use the whole width' }).waitFor();
  // Every Time cell of the runs list shows its whole text ("847 ms", never "847 …").
  const times = page.getByRole('table', { name: 'Runs' }).getByRole('row').locator('[role=cell]:last-child');
  expect(await times.count()).toBeGreaterThan(0);
  for (const cell of await times.all()) expect(await overflows(cell.locator('div').first())).toBe(false);
  await page.setViewportSize(PHONE);
}, 90_000);

test("the feed picture draws each component's label after every strand, so none is drawn over", async () => {
  await page.getByRole('tab', { name: 'Feed' }).click();
  await page.getByRole('link', { name: `Open ${TITLE}` }).click();
  await page.getByRole('heading', { name: TITLE }).waitFor();
  const svg = page.getByRole('img').filter({ has: page.locator('svg text') }).first().locator('svg');
  await svg.locator('text').first().waitFor();
  const order = await svg.evaluate((s) => Array.from(s.querySelectorAll('path, text'), (e) => e.tagName));
  expect(order.lastIndexOf('path')).toBeLessThan(order.indexOf('text'));
  await shoot(page, 'walk-03-feed-picture');
}, 60_000);

test("on a sketch's run form, a code typed over the sketch's is the one run (never silently the sketch)", async () => {
  // The pd parameter is the positive trefoil's code (docs/conventions.md, from memory), as the Slate sends it.
  await page.goto(`${baseUrl}/runs?sketchId=${sketchId}&pd=${encodeURIComponent('[[1,5,2,4],[3,1,4,6],[5,3,6,2]]')}`);
  const banner = page.getByText('On the sketch as it was last synced', { exact: false });
  await banner.waitFor();
  await page.getByRole('radio', { name: 'Braid word' }).click();
  await page.getByRole('textbox', { name: 'Braid word' }).fill('1 1 1');
  await banner.waitFor({ state: 'detached' });
  await page.getByRole('radio', { name: 'ℚ', exact: true }).click();
  await page.getByRole('button', { name: 'Start run' }).click();
  await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId('run-source').innerText()).resolves.toBe('braid 1 1 1');
  // Named by its code, shown once (under "Given as"), not by the sketch.
  await page.getByRole('heading', { name: 'Khovanov homology' }).waitFor();
  const text = await page.locator('body').innerText();
  expect(text.split('braid 1 1 1').length - 1).toBe(1);
  expect(text).not.toContain(TITLE);
  await shoot(page, 'walk-04-run-typed-over-sketch');
}, 60_000);
