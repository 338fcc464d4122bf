// Sharing from the Slate and commenting offline (docs/product.md journey 4; sync/SPEC.md S8, S23,
// S34), two people at once: Ada pastes a trefoil on the Slate and shares it to the group from
// the Slate's Share dialog (a local write that syncs); Bruno finds it in the Feed, writes a
// comment with his browser offline (it waits on his device), goes online, and Ada reads it.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { PHONE, call, groupOfTwo, person, shoot, signedInPair } from './helpers';

const ada = person('Ada Sharewell', 'ada.share', 'correct horse 5');
const bruno = person('Bruno Offline', 'bruno.share', 'battery staple 6');
const GROUP = 'Knot lunch';
const TITLE = 'Trefoil shared from the Slate';
const COMMENT = 'Written on the train: is this the *positive* trefoil?';

let browser: Browser;
let adaPage: Page;
let brunoContext: BrowserContext;
let brunoPage: Page;
let adaToken = '';
let sketchId = '';

/** Until `check` holds or `ms` pass, reloading the page between tries (the feed is fetched, not pushed). */
async function eventually(page: Page, check: () => Promise<boolean>, ms = 20_000) {
  const deadline = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error('timed out');
    await page.reload();
  }
}

/** Screenshots with the discussion in view: on a phone it is below the sketch. */
async function shootThread(page: Page, name: string) {
  const own = page.viewportSize() ?? PHONE;
  await page.setViewportSize(PHONE);
  await page.waitForTimeout(250); // the wide layout (rail, two panes) gives way to the phone one
  await page.getByRole('button', { name: 'Post comment' }).scrollIntoViewIfNeeded();
  await shoot(page, name);
  await page.setViewportSize(own);
}

beforeAll(async () => {
  adaToken = (await groupOfTwo(ada, bruno, GROUP)).ownerToken;
  ({ browser, phone: { page: adaPage }, wide: { context: brunoContext, page: brunoPage } } = await signedInPair(ada, bruno, 15_000));
});

afterAll(async () => {
  await browser?.close();
});

test('Ada pastes a trefoil on the Slate and shares it to the group from there', async () => {
  await adaPage.getByText('Draw your first link').waitFor(); // the device store is open
  await adaPage.getByRole('button', { name: 'New sketch' }).first().click();
  await adaPage.getByTestId('slate-canvas').waitFor();
  await adaPage.getByRole('button', { name: 'Paste a code' }).click();
  // The positive trefoil's PD code (docs/conventions.md, from memory; feed.spec.ts uses it too).
  await adaPage.getByRole('textbox', { name: 'PD code' }).fill('[[1,5,2,4],[3,1,4,6],[5,3,6,2]]');
  await adaPage.getByRole('button', { name: 'Draw it' }).click();
  await adaPage.getByTestId('readout-crossings-count').getByText('3 crossings').waitFor();
  await adaPage.getByRole('button', { name: 'Details', exact: true }).click();
  await adaPage.getByRole('textbox', { name: 'Title' }).fill(TITLE);
  await adaPage.getByRole('button', { name: 'Save details' }).click();
  await adaPage.getByRole('heading', { name: TITLE }).waitFor();
  sketchId = new URL(adaPage.url()).pathname.split('/').pop()!;

  await adaPage.getByRole('button', { name: 'Share', exact: true }).click();
  await adaPage.getByText('Private: only you see it').waitFor();
  await adaPage.getByRole('button', { name: `Share to ${GROUP}` }).click();
  await adaPage.getByTestId('share-state').getByText(`Shared to ${GROUP}`, { exact: false }).waitFor();
  await adaPage.getByRole('button', { name: 'Stop sharing' }).waitFor();
  await shoot(adaPage, 'share-01-slate-share-dialog');
  await adaPage.getByRole('button', { name: 'Close' }).last().click();
  await adaPage.getByRole('button', { name: 'Sketch details' }).getByText(`Shared to ${GROUP}`).waitFor(); // the Slate's header

  await adaPage.goBack();
  const row = adaPage.getByRole('link', { name: `Open ${TITLE}` });
  await expect(row.innerText()).resolves.toContain(`Shared to ${GROUP}`);
  await row.getByText('not synced', { exact: false }).waitFor({ state: 'detached', timeout: 20_000 }); // S29: pushed soon
  await shoot(adaPage, 'share-02-sketchbook-shared');
  const onServer = (await call('GET', `/api/sketches/${sketchId}`, adaToken)) as { groupId: string | null; title: string };
  expect(onServer.title).toBe(TITLE);
  expect(onServer.groupId).not.toBeNull();
});

test('Bruno sees it in the Feed, writes a comment offline; it waits on his device', async () => {
  await brunoPage.getByRole('tab', { name: 'Feed' }).click();
  const card = brunoPage.getByRole('link', { name: `Open ${TITLE}` });
  await eventually(brunoPage, () => card.waitFor({ timeout: 5000 }).then(() => true, () => false));
  await expect(card.innerText()).resolves.toContain(ada.name);
  await expect(card.innerText()).resolves.toContain('3 crossings');
  await card.click();
  await brunoPage.getByRole('heading', { name: TITLE }).waitFor();

  await brunoContext.setOffline(true);
  await brunoPage.getByRole('textbox', { name: 'Comment', exact: true }).fill(COMMENT);
  await brunoPage.getByRole('button', { name: 'Post comment' }).click();
  await brunoPage.getByText('Waiting to send').waitFor();
  await brunoPage.getByText('positive', { exact: true }).waitFor(); // formatted while waiting
  await shootThread(brunoPage, 'share-03-comment-waiting');
  expect(await call('GET', `/api/sketches/${sketchId}/comments`, adaToken)).toEqual([]);
});

test('Bruno goes online: the comment is sent once and Ada reads it', async () => {
  await brunoContext.setOffline(false);
  await brunoPage.evaluate(() => window.dispatchEvent(new Event('online'))); // as offline-sync.spec.ts: the engine listens for it
  await brunoPage.getByText('Waiting to send').waitFor({ state: 'detached', timeout: 20_000 });
  await brunoPage.getByText('Discussion · 1').waitFor(); // reloaded from the server once sent
  await shootThread(brunoPage, 'share-04-comment-sent');
  const comments = (await call('GET', `/api/sketches/${sketchId}/comments`, adaToken)) as { body: string; author: { displayName: string } }[];
  expect(comments.map((c) => [c.author.displayName, c.body])).toEqual([[bruno.name, COMMENT]]);

  await adaPage.getByRole('tab', { name: 'Feed' }).click();
  await adaPage.getByRole('link', { name: `Open ${TITLE}` }).click();
  await adaPage.getByRole('heading', { name: TITLE }).waitFor();
  await adaPage.getByText('Discussion · 1').waitFor();
  await adaPage.getByText('positive', { exact: true }).waitFor();
  await shootThread(adaPage, 'share-05-ada-reads-comment');
});

test("Ada stops sharing from the feed page: the same local write, so her Sketchbook and Bruno's feed follow", async () => {
  await adaPage.getByRole('button', { name: 'Stop sharing' }).click();
  await adaPage.getByText('Nothing shared in this group yet.').filter({ visible: true }).waitFor(); // pushed before the feed reloads
  expect(((await call('GET', `/api/sketches/${sketchId}`, adaToken)) as { groupId: string | null }).groupId).toBeNull();
  await adaPage.getByRole('tab', { name: 'Sketches' }).click();
  const row = adaPage.getByRole('link', { name: `Open ${TITLE}` });
  await row.waitFor();
  await expect(row.innerText()).resolves.not.toContain('Shared to');
  await brunoPage.getByRole('tab', { name: 'Feed' }).click();
  const empty = brunoPage.getByText('Nothing shared in this group yet.').filter({ visible: true });
  await eventually(brunoPage, () => empty.waitFor({ timeout: 5000 }).then(() => true, () => false));
  expect(await brunoPage.getByRole('link', { name: `Open ${TITLE}` }).count()).toBe(0);
});
