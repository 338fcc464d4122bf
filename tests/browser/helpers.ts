// Shared by the browser specs: the browser (Debian chromium via playwright-core), the server URL
// from run.mjs, screenshots at the two sizes the app is designed for, and test accounts.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type CDPSession, type Page } from 'playwright-core';

export const baseUrl = process.env.BROWSER_BASE_URL ?? '';
if (!baseUrl) throw new Error('Run the browser specs with `npm run test:browser` (it starts the server).');

/** docs/stack.md: the flags Debian chromium needs here when run as root in a container. */
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync'];

export function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: ARGS });
}

export const PHONE = { width: 390, height: 844 };
export const WIDE = { width: 1440, height: 900 };

const ARTIFACTS = join(__dirname, '../artifacts');
mkdirSync(ARTIFACTS, { recursive: true });

/**
 * Screenshots of the current page at phone and wide size, then back to the page's own size;
 * `frame` runs after each resize (to scroll what the shot is about into view).
 */
export async function shoot(page: Page, name: string, frame?: () => Promise<void>): Promise<void> {
  const own = page.viewportSize() ?? PHONE;
  for (const size of [PHONE, WIDE]) {
    await page.setViewportSize(size);
    await page.waitForTimeout(250); // let the layout switch (tabs <-> rail) settle
    await frame?.();
    await page.screenshot({ path: join(ARTIFACTS, `${name}-${size.width}x${size.height}.png`) });
  }
  await page.setViewportSize(own);
}

/** A unique address per run, so specs never depend on each other's leftovers. */
export function uniqueEmail(who: string): string {
  return `${who}.${Date.now().toString(36)}@seminar.example`;
}

/** A test account: the display name, a unique address and the password it signs up with. */
export interface Person {
  name: string;
  email: string;
  password: string;
}

export function person(name: string, who: string, password: string): Person {
  return { name, email: uniqueEmail(who), password };
}

/** Signs in through the form and waits for the landing page, the sketch list. */
export async function signIn(page: Page, who: Person): Promise<void> {
  await page.goto(baseUrl + '/sign-in');
  await page.getByLabel('E-mail').fill(who.email);
  await page.getByLabel('Password').fill(who.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Sketches', exact: true }).waitFor();
}

/** The server's JSON API straight (for setting up what a spec does not test through the screens). */
export async function call(method: string, path: string, token: string | null, body?: unknown) {
  const res = await fetch(baseUrl + path, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token && { Authorization: `Bearer ${token}` }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const json = await res.json().catch(() => null);
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${JSON.stringify(json)}`);
  return json;
}

/** Signs `who` up through the API; answers the token. */
export async function register(who: Person): Promise<string> {
  return ((await call('POST', '/api/auth/register', null, { email: who.email, password: who.password, displayName: who.name })) as { token: string }).token;
}

/**
 * Registers both people, makes `owner` the owner of a new group named `name` and `member` a
 * member of it (invited by e-mail, accepted through the kept mail's link). Answers their tokens.
 */
export async function groupOfTwo(owner: Person, member: Person, name: string) {
  const [ownerToken, memberToken] = [await register(owner), await register(member)];
  const group = await call('POST', '/api/groups', ownerToken, { name });
  await call('POST', `/api/groups/${group.id}/invitations`, ownerToken, { email: member.email, role: 'member' });
  const mail = (await call('GET', '/api/dev/mail', null)) as { to: string[]; links: string[] }[];
  const link = mail.filter((m) => m.to.includes(member.email)).pop()!.links.find((l) => l.includes('/invite/'))!;
  await call('POST', `/api/invitations/${new URL(link).pathname.split('/').pop()}/accept`, memberToken);
  return { ownerToken, memberToken, groupId: group.id as string };
}

/**
 * A browser with two people signed in at once: the first on a phone, the second on a wide
 * screen (so a two-person spec shoots both layouts as it goes).
 */
export async function signedInPair(phoneUser: Person, wideUser: Person, timeoutMs: number) {
  const browser = await launch();
  const contexts = [await browser.newContext({ viewport: PHONE }), await browser.newContext({ viewport: WIDE })];
  for (const c of contexts) c.setDefaultTimeout(timeoutMs);
  const pages = [await contexts[0].newPage(), await contexts[1].newPage()];
  await signIn(pages[0], phoneUser);
  await signIn(pages[1], wideUser);
  return { browser, phone: { context: contexts[0], page: pages[0] }, wide: { context: contexts[1], page: pages[1] } };
}

/** "New sketch", then a title through Details: the Slate is open on the titled sketch. */
export async function newTitledSketch(page: Page, title: string): Promise<void> {
  await page.getByRole('button', { name: 'New sketch' }).first().click();
  await page.getByTestId('slate-canvas').waitFor();
  await page.getByRole('button', { name: 'Details', exact: true }).click();
  await page.getByRole('textbox', { name: 'Title' }).fill(title);
  await page.getByRole('button', { name: 'Save details' }).click();
  await page.getByRole('heading', { name: title }).waitFor();
}

/** A new account signed in on a phone with touch; `touch` sends raw touch events (CDP). */
export async function phoneWithTouch(who: Person, timeoutMs: number): Promise<{ browser: Browser; page: Page; touch: CDPSession }> {
  await register(who);
  const browser = await launch();
  const context = await browser.newContext({ viewport: PHONE, hasTouch: true, isMobile: true });
  context.setDefaultTimeout(timeoutMs);
  const page = await context.newPage();
  const touch = await context.newCDPSession(page);
  await signIn(page, who);
  return { browser, page, touch };
}

export type ScreenPoint = { x: number; y: number };

/** One finger stroke: down at the first point, a move per further point, up at the last. */
export async function swipe(touch: CDPSession, points: ScreenPoint[]): Promise<void> {
  const at = (p: ScreenPoint) => [{ x: Math.round(p.x), y: Math.round(p.y) }];
  await touch.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: at(points[0]) });
  for (const p of points.slice(1)) await touch.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: at(p) });
  await touch.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
}
