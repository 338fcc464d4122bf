// A shared sketch whose Jones polynomial the server is still computing (off its request
// thread): the feed card says so, and the card of a sketch computed already shows its
// polynomial.
import { randomUUID } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { fromBraid } from '@/shared/knot/braid';
import { baseUrl, call, launch, person, PHONE, shoot, signIn } from './helpers';

const ada = person('Ada Waitwell', 'ada.computing', 'correct horse 5');

let browser: Browser;
let page: Page;

/** The torus link T(p, q) as the closure of (sigma_1 ... sigma_{p-1})^q, as a PD code (common practice; the knot core's braid closure). */
function torusPD(p: number, q: number) {
  const word: number[] = [];
  for (let k = 0; k < q; k++) for (let s = 1; s < p; s++) word.push(s);
  return fromBraid(word).pd;
}

let slowOnes: () => Promise<unknown>;

beforeAll(async () => {
  const { token } = await call('POST', '/api/auth/register', null, { email: ada.email, password: ada.password, displayName: ada.name });
  const group = await call('POST', '/api/groups', token, { name: 'Slow invariants' });
  const now = new Date().toISOString();
  const sketch = (title: string, pd: unknown) => ({
    mutationId: randomUUID(), deviceId: 'ada-phone', clock: Date.now(), recordId: randomUUID(), type: 'sketch', op: 'add', baseVersion: 0,
    fields: { title, seenAt: '', notes: '', tags: [], attachments: [], groupId: group.id, deleted: false, createdAt: now, updatedAt: now, diagram: { pd, unknots: 0, framings: [null], strokes: [] } },
  });
  // The trefoil first: its summary is in while the browser starts and Ada signs in.
  await call('POST', '/api/sync/push', token, { deviceId: 'ada-phone', mutations: [sketch('Trefoil', torusPD(2, 3))] });
  // Then four copies of T(11,12) (120 crossings, 1 component as gcd(11, 12) = 1; about a second
  // of Jones polynomial each), summarised one after another: seconds in which some still compute.
  slowOnes = () => call('POST', '/api/sync/push', token, { deviceId: 'ada-phone', mutations: [1, 2, 3, 4].map((k) => sketch(`T(11,12), copy ${k}`, torusPD(11, 12))) });
  browser = await launch();
  const context = await browser.newContext({ viewport: PHONE });
  context.setDefaultTimeout(15_000);
  page = await context.newPage();
  await signIn(page, ada);
});

afterAll(async () => {
  await browser?.close();
});

test('the feed card of a sketch still being computed says so, the computed one shows V', async () => {
  await slowOnes();
  await page.goto(baseUrl + '/feed');
  await page.getByText('Jones polynomial: computing…').first().waitFor();
  // The positive trefoil: V = t + t^3 - t^4 (docs/conventions.md).
  await page.getByRole('math', { name: 'V = t + t³ − t⁴' }).waitFor();
  expect(await page.getByRole('math', { name: 'V = t + t³ − t⁴' }).count()).toBe(1); // the trefoil's card alone
  await shoot(page, '40-feed-computing');
});
