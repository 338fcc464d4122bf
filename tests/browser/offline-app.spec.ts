// The app itself loads with no network (docs/product.md journey 1: at a talk, offline, on a phone):
// opened once online, its service worker (server/web/service-worker.js) has the build cached;
// offline, a reload still opens it cross-origin isolated (expo-sqlite on web needs that,
// docs/stack.md), a sketch made then survives another offline reload, and back online it syncs.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { SESSION_KEY } from '@/lib/stored-session';
import { PHONE, baseUrl, launch, newTitledSketch, person, shoot } from './helpers';

const who = person('Tomas Talk', 'tomas.talk', 'seminar room no wifi 3');
const TITLE = 'Kinked loop drawn at the talk';

let browser: Browser;
let context: BrowserContext;
let page: Page;
let token = '';
let precached: string[] = [];

async function serverTitles(): Promise<string[]> {
  const res = await fetch(baseUrl + '/api/sketches', { headers: { Authorization: `Bearer ${token}` } });
  if (!res.ok) throw new Error(`GET /api/sketches: ${res.status}`);
  return ((await res.json()) as { title: string }[]).map((s) => s.title);
}

/** Reloads and checks that the page came from the service worker and opened the sketch list. */
async function reloadFromWorker(): Promise<void> {
  const response = await page.reload();
  expect(response?.fromServiceWorker()).toBe(true);
  await page.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
}

/** The figure-eight curve (cos t, sin 2t) (common practice): one closed stroke crossing itself once. */
function loop(centre: { x: number; y: number }, r: number, samples = 120) {
  return Array.from({ length: samples + 1 }, (_, i) => {
    const t = (2 * Math.PI * i) / samples;
    return { x: centre.x + r * Math.cos(t), y: centre.y + r * Math.sin(2 * t) };
  });
}

beforeAll(async () => {
  browser = await launch();
  context = await browser.newContext({ viewport: PHONE });
  context.setDefaultTimeout(15_000);
  page = await context.newPage();
  // Opened online once: a new account through the form, which leaves the app signed in.
  await page.goto(baseUrl + '/sign-up');
  await page.getByLabel('Name').fill(who.name);
  await page.getByLabel('E-mail').fill(who.email);
  await page.getByLabel('Password').fill(who.password);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
  token = await page.evaluate((key) => (JSON.parse(localStorage.getItem(key)!) as { token: string }).token, SESSION_KEY);
});

afterAll(async () => {
  await browser?.close();
});

test('opened online: the service worker controls the page with the whole build cached', async () => {
  await page.getByText('Draw your first link').waitFor();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
  const cached = await page.evaluate(async () => {
    const manifest = (await (await fetch('/sw-manifest.json')).json()) as { version: string; files: { url: string }[] };
    const cache = await caches.open('overstrand-shell-' + manifest.version);
    const urls = (await cache.keys()).map((r) => new URL(r.url).pathname).sort();
    return { want: manifest.files.map((f) => f.url).sort(), urls };
  });
  expect(cached.want).toContain('/index.html');
  expect(cached.want.some((u) => u.endsWith('.wasm'))).toBe(true);
  expect(cached.urls).toEqual(cached.want);
  precached = cached.want;
});

/** Offline for the page and its service worker; the URLs they still tried to fetch. */
const attempts: string[] = [];
async function goOffline(): Promise<void> {
  await context.setOffline(true);
  // The offline emulation can miss a service worker that the browser restarts, so the network
  // is also cut at the context's router, which sees the worker's requests too.
  await context.route('**/*', (route) => {
    attempts.push(route.request().url());
    return route.abort('internetdisconnected');
  });
}

async function goOnline(): Promise<void> {
  await context.unrouteAll();
  await context.setOffline(false);
}

test('offline: a reload opens the app from the cache, cross-origin isolated', async () => {
  await goOffline();
  // Both the page and its service worker are cut off from the server.
  expect(await page.evaluate(() => fetch('/api/health').then(() => 'reached', () => 'offline'))).toBe('offline');
  const [worker] = context.serviceWorkers();
  expect(await worker.evaluate(() => fetch('/sw-manifest.json').then(() => 'reached', () => 'offline'))).toBe('offline');

  await reloadFromWorker();
  expect(await page.evaluate(() => crossOriginIsolated)).toBe(true);
  await page.getByText('Draw your first link').waitFor(); // the device store opened: its worker and wasm came from the cache
});

test('offline: a sketch made after the offline reload survives another one', async () => {
  // Details before drawing: saving details while the drawing waits for its autosave dropped the
  // drawing in this spec's first version (reported to the lead, not this spec's subject).
  await newTitledSketch(page, TITLE);
  const box = (await page.getByTestId('slate-canvas').boundingBox())!;
  const points = loop({ x: box.x + box.width / 2, y: box.y + box.height / 2 }, Math.min(box.width, box.height) / 3);
  await page.mouse.move(points[0].x, points[0].y);
  await page.mouse.down();
  for (const p of points.slice(1)) await page.mouse.move(p.x, p.y);
  await page.mouse.up();
  await page.getByTestId('readout-crossings-count').getByText('1 crossing', { exact: true }).waitFor();
  await page.goBack();
  await page.getByText(/1 crossing · .*not synced/).waitFor();

  await reloadFromWorker();
  expect(await page.evaluate(() => crossOriginIsolated)).toBe(true);
  await page.getByRole('link', { name: `Open ${TITLE}` }).waitFor();
  await page.getByText(/1 crossing · .*not synced/).waitFor();
  await shoot(page, 'offline-app-01-reloaded-offline');
  await page.getByRole('link', { name: `Open ${TITLE}` }).click();
  await page.getByTestId('readout-crossings-count').getByText('1 crossing', { exact: true }).waitFor();
  await shoot(page, 'offline-app-02-slate-offline');
  await page.goBack();
  expect(await serverTitles()).toEqual([]);
});

test('back online: the sketch reaches the server and the status is up to date', async () => {
  // Every file of the build came from the cache: none was even asked of the network.
  const tried = new Set(attempts.map((u) => new URL(u).pathname));
  expect(precached.filter((u) => tried.has(u))).toEqual([]);
  await goOnline();
  await page.evaluate(() => window.dispatchEvent(new Event('online')));
  await page.getByTestId('sync-status').getByText('Up to date').waitFor({ timeout: 20_000 });
  await page.getByText(/not synced/).waitFor({ state: 'detached' });
  expect(await serverTitles()).toEqual([TITLE]);
});
