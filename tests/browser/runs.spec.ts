// The runs journey in a real browser against the real server: start a run from a pasted braid
// word, watch the progress bar move, open the result table; a second run from a PD code shows
// the trefoil's torsion typeset; on a wide screen the runs table stays beside the run or the form.
// Screenshots at phone and wide size (tests/artifacts/runs-*).
import type { Browser, Page } from 'playwright-core';
import { fromBraid } from '@/shared/knot/braid';
import { PHONE, WIDE, baseUrl, launch, shoot, uniqueEmail } from './helpers';

let browser: Browser;
let page: Page;
const me = { email: uniqueEmail('runa'), password: 'correct horse 3' };

beforeAll(async () => {
  browser = await launch();
  page = await (await browser.newContext({ viewport: PHONE })).newPage();
  await page.goto(baseUrl + '/');
  await page.getByRole('heading', { name: 'Sign in', exact: true }).waitFor();
  await page.getByRole('link', { name: 'Create an account' }).click();
  await page.getByLabel('Name').fill('Runa Okafor');
  await page.getByLabel('E-mail').fill(me.email);
  await page.getByLabel('Password').fill(me.password);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
});

afterAll(async () => {
  await browser?.close();
});

/**
 * T(7,8) as a braid word: (1 2 3 4 5 6)^8, 48 crossings, several seconds of work over Q: long
 * enough that the page, polling once a second, sees the bar between 0 and 100.
 */
const T78 = Array.from({ length: 8 }, () => '1 2 3 4 5 6').join(' ');

test('start a run from a braid word, watch its progress, read the table', async () => {
  await page.getByRole('tab', { name: 'Runs' }).click();
  await page.getByRole('heading', { name: 'No runs yet' }).waitFor();
  await page.getByRole('radio', { name: 'Braid word' }).click();
  await page.getByLabel('Braid word').fill(T78);
  await page.getByRole('radio', { name: 'ℚ' }).click();
  // The rings typeset (KaTeX's fonts), not drawn from whatever fallback font has ℚ and 𝔽ₚ.
  for (const ring of ['ℤ', 'ℚ', '𝔽₂', '𝔽₃', '𝔽ₚ']) await page.getByRole('radio', { name: ring, exact: true }).locator('.katex').waitFor();
  await shoot(page, 'runs-01-form');
  await page.getByRole('button', { name: 'Start run' }).click();

  await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
  const bar = page.getByRole('progressbar', { name: 'Run progress' });
  await bar.waitFor();
  // The bar moves while the server computes: some value strictly between 0 and 100 is seen.
  let seen = 0;
  for (let k = 0; k < 600 && !(seen > 0 && seen < 100); k++) {
    seen = Number(await bar.getAttribute('aria-valuenow'));
    if (seen > 0 && seen < 100) await shoot(page, 'runs-02-progress');
    else await page.waitForTimeout(50);
  }
  expect(seen).toBeGreaterThan(0);
  expect(seen).toBeLessThan(100);

  await page.getByTestId('run-status').getByText('Done').waitFor({ timeout: 90_000 });
  const table = page.getByRole('table', { name: 'Khovanov homology' });
  await table.waitFor();
  // T(7,8) is a positive braid knot: Kh^{0,*} over Q is Q at j = s -+ 1 (from memory, Stosic on
  // positive braid knots), s = (p-1)(q-1) = 42 (Rasmussen 2004, math/0402131).
  await expect(table.getByRole('rowheader', { name: '41', exact: true }).isVisible()).resolves.toBe(true);
  await expect(page.getByText('as the Jones polynomial says ✓').isVisible()).resolves.toBe(true);
  // The substitution typeset, as the polynomials beside it are, not written t^(1/2).
  expect(await page.getByTestId('run-euler-check').locator('.katex').count()).toBe(1);
  await shoot(page, 'runs-03-result');
}, 150_000);

test('a PD code run shows torsion typeset, and the runs table lists both', async () => {
  await page.getByRole('link', { name: 'Runs', exact: true }).click();
  await page.getByRole('heading', { name: 'Runs', exact: true }).waitFor();
  await page.getByRole('radio', { name: 'PD code' }).click();
  await page.getByLabel('PD code').fill('[[4,2,5,1],[2,6,3,5],[6,4,1,3]]');
  await page.getByRole('radio', { name: 'ℤ', exact: true }).click();
  await page.getByRole('button', { name: 'Start run' }).click();
  await page.getByTestId('run-status').getByText('Done').waitFor({ timeout: 60_000 });
  // The positive trefoil over Z has Z/2 at (3,7) (Bar-Natan 2002, math/0201043).
  await expect(page.getByRole('math', { name: 'Z/2' }).isVisible()).resolves.toBe(true);
  await expect(page.getByText('2 diagonals: thin').isVisible()).resolves.toBe(true);
  await shoot(page, 'runs-04-trefoil');

  await page.getByRole('link', { name: 'Runs', exact: true }).click();
  const runs = page.getByRole('table', { name: 'Runs' });
  await runs.waitFor();
  await expect(runs.getByRole('row').count()).resolves.toBe(3); // header + two runs
  await page.getByLabel('Filter runs').fill('braid');
  await expect(runs.getByRole('row').count()).resolves.toBe(2);
  await page.getByLabel('Filter runs').fill('');
  await shoot(page, 'runs-05-table');
}, 120_000);

test('a cable sweep shows a grid of small tables', async () => {
  await page.getByRole('radio', { name: 'PD code' }).click();
  await page.getByLabel('PD code').fill('[[4,2,5,1],[2,6,3,5],[6,4,1,3]]');
  await page.getByRole('radio', { name: 'Cable sweep, up to 2 strands' }).click();
  const note = page.getByText(/^Each component takes every/);
  // (r₊, r₋) typeset: the interface faces have no subscript plus or minus.
  await note.getByRole('math', { name: '(r₊, r₋)' }).waitFor();
  await note.scrollIntoViewIfNeeded();
  await shoot(page, 'runs-06-sweep-choice');
  await page.getByRole('button', { name: 'Start run' }).click();
  await page.getByTestId('run-status').getByText('Done').waitFor({ timeout: 90_000 });
  await page.getByRole('math', { name: '(r₊, r₋)' }).waitFor(); // the grid's note, as the form wrote it
  // What was computed names the ring as the tables below do (ℤ), not as the API spells it (Z).
  await page.getByText(/^Cable sweep over/).getByRole('math', { name: 'ℤ' }).waitFor();
  await shoot(page, 'runs-06-cable-sweep');
  for (const [p, m] of [[1, 0], [0, 1], [2, 0], [1, 1], [0, 2]]) {
    await page.getByRole('table', { name: `Khovanov homology of the (${p}, ${m}) cable` }).waitFor();
  }
  await shoot(page, 'runs-06-cable-sweep');
}, 120_000);

test('offline, a small diagram is computed on the device in a web worker', async () => {
  await page.getByRole('link', { name: 'Runs', exact: true }).click();
  await page.getByRole('heading', { name: 'Runs', exact: true }).waitFor();
  await page.context().setOffline(true);
  try {
    await page.getByRole('radio', { name: 'Braid word' }).click();
    await page.getByLabel('Braid word').fill('-1 -1 -1');
    await page.getByRole('radio', { name: 'ℤ', exact: true }).click();
    await page.getByRole('radio', { name: 'Khovanov homology' }).click();
    await page.getByRole('button', { name: /Compute on this device/ }).click();
    const table = page.getByRole('table', { name: 'Khovanov homology on this device' });
    await table.waitFor({ timeout: 30_000 });
    expect(page.workers().length).toBeGreaterThan(0); // the engine runs in a web worker, not on the page
    // The negative trefoil is the mirror: torsion Z/2 moves from (3,7) to (1-3,-7) = (-2,-7)
    // (mirror duality of Kh over Z, Khovanov 2000, math/9908171).
    await expect(table.getByRole('math', { name: 'Z/2' }).isVisible()).resolves.toBe(true);
    await expect(table.getByRole('rowheader', { name: '-7', exact: true }).isVisible()).resolves.toBe(true);
    await shoot(page, 'runs-07-on-device');
  } finally {
    await page.context().setOffline(false);
  }
}, 90_000);

test('on the device, s of a knot with its slice-genus bounds; a link is told s is for knots', async () => {
  await page.goto(baseUrl + '/runs');
  await page.getByRole('heading', { name: 'Runs', exact: true }).waitFor();
  await page.getByRole('radio', { name: 'Braid word' }).click();
  await page.getByLabel('Braid word').fill('-1 -1 -1');
  await page.getByRole('radio', { name: 'ℚ', exact: true }).click();
  await page.getByRole('radio', { name: 'Khovanov homology' }).click();
  const alsoS = page.getByRole('checkbox', { name: 'Also compute s' });
  if ((await alsoS.getAttribute('aria-checked')) !== 'true') await alsoS.click();
  await alsoS.scrollIntoViewIfNeeded();
  await shoot(page, 'runs-07-also-s');
  await page.getByRole('button', { name: /Compute on this device/ }).click();
  // The closure of [-1,-1,-1] is the negative trefoil: s = -2 (the positive one has s = 2,
  // docs/conventions.md, and s of a mirror is -s, Rasmussen 2004, math/0402131), signature +2.
  const s = page.getByTestId('local-s');
  await s.getByText('s = −2 over Q (Rasmussen)').waitFor({ timeout: 30_000 });
  await s.getByText('Slice genus ≥ 1: |s|/2 = 1, |σ|/2 = 1, the same bound').waitFor();
  await s.scrollIntoViewIfNeeded();
  await shoot(page, 'runs-08-on-device-s');
  // The closure of [1,1] is the Hopf link, two components (docs/conventions.md, Braid word).
  await page.getByLabel('Braid word').fill('1 1');
  await page.getByRole('button', { name: /Compute on this device/ }).click();
  await page.getByText('s is defined for knots here; this diagram is a link.').waitFor({ timeout: 30_000 });
}, 90_000);

test('from a sketch on the server: the Slate opens Runs with the sketch, the run carries its title', async () => {
  const post = (path: string, body: unknown, token?: string) =>
    fetch(baseUrl + path, { method: 'POST', headers: { 'Content-Type': 'application/json', ...(token && { Authorization: `Bearer ${token}` }) }, body: JSON.stringify(body) });
  const { token } = await (await post('/api/auth/login', me)).json();
  const id = `sketch-${Date.now().toString(36)}`;
  const now = new Date().toISOString();
  const pd = fromBraid([1, -2, 1, -2]).pd; // the figure-eight knot as a closed braid (common practice)
  const fields = { title: 'Figure-eight from the board', seenAt: '', notes: '', tags: [], diagram: { pd, unknots: 0, framings: [null], strokes: [] }, attachments: [], createdAt: now, updatedAt: now, groupId: null, deleted: false };
  const pushed = await post('/api/sync/push', { deviceId: 'browser-spec', mutations: [{ mutationId: crypto.randomUUID(), deviceId: 'browser-spec', clock: 1, recordId: id, type: 'sketch', op: 'add', baseVersion: 0, fields }] }, token);
  expect(pushed.status).toBe(200);

  await page.goto(`${baseUrl}/runs?sketchId=${id}&pd=${encodeURIComponent(JSON.stringify(pd))}`);
  await page.getByText('On the sketch as it was last synced to the server').waitFor();
  await expect(page.getByLabel('PD code').inputValue()).resolves.toBe(JSON.stringify(pd));
  await page.getByRole('button', { name: 'Start run' }).click();
  await page.getByRole('heading', { name: 'Figure-eight from the board' }).waitFor();
  await page.getByTestId('run-status').getByText('Done').waitFor({ timeout: 60_000 });
  await page.getByRole('table', { name: 'Khovanov homology' }).waitFor();
  await shoot(page, 'runs-08-from-sketch');
}, 90_000);

test('wide: the runs stay on the left while a run or the start form shows on the right', async () => {
  await page.setViewportSize(WIDE);
  try {
    await page.goto(`${baseUrl}/runs`);
    const runs = page.getByRole('table', { name: 'Runs' });
    await runs.waitFor();
    await expect(page.getByLabel('PD code').isVisible()).resolves.toBe(true);
    await runs.getByRole('link', { name: /Figure-eight from the board/ }).click();
    await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Figure-eight from the board' }).waitFor();
    await expect(runs.isVisible()).resolves.toBe(true);
    await expect(runs.locator('[aria-current="true"]').count()).resolves.toBe(1); // the open run is marked
    await page.getByRole('button', { name: 'New run' }).click();
    await page.waitForURL((u) => u.pathname === '/runs');
    await page.getByLabel('PD code').waitFor();
    await expect(runs.isVisible()).resolves.toBe(true);
  } finally {
    await page.setViewportSize(PHONE);
  }
}, 60_000);
