// The group journey (docs/product.md journey 4) in a real browser, two people at once: Ada shares a
// sketch to the group feed and adds a board photo; Bruno (wide screen) finds it in the feed,
// comments and forks it; Ada sees the notification in the app and the e-mail in the kept mail.
// Accounts, the group and Ada's synced sketch are set up through the API (their UI is covered
// by accounts.spec.ts and the sync tests); everything after sign-in goes through the screens.
import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import type { Browser, Page } from 'playwright-core';
import { baseUrl, call, groupOfTwo, person, shoot, signedInPair } from './helpers';

const ada = person('Ada Feedwright', 'ada.feed', 'correct horse 3');
const bruno = person('Bruno Commenter', 'bruno.feed', 'battery staple 4');
const title = 'Trefoil from the colloquium';

let browser: Browser;
let adaPage: Page;
let brunoPage: Page;

/** A circle-ish stroke set, as the Slate would store it. */
const strokes = [
  { points: Array.from({ length: 60 }, (_, i) => [100 + 80 * Math.cos((i / 60) * 6 * Math.PI) + 30 * Math.cos((i / 60) * 4 * Math.PI), 100 + 80 * Math.sin((i / 60) * 6 * Math.PI) - 30 * Math.sin((i / 60) * 4 * Math.PI)]), closed: true },
];

beforeAll(async () => {
  const { ownerToken } = await groupOfTwo(ada, bruno, 'Knot lunch');
  const now = new Date().toISOString();
  // Ada's sketch as her phone would have synced it: the positive trefoil (docs/conventions.md, PD code, from memory).
  await call('POST', '/api/sync/push', ownerToken, {
    deviceId: 'ada-phone',
    mutations: [{
      mutationId: randomUUID(), deviceId: 'ada-phone', clock: 1, recordId: randomUUID(), type: 'sketch', op: 'add', baseVersion: 0,
      fields: { title, seenAt: 'Colloquium, room 3', notes: 'Drawn during the talk.', tags: ['knot', 'torus'], attachments: [], groupId: null, deleted: false, createdAt: now, updatedAt: now,
        diagram: { pd: [[1, 5, 2, 4], [3, 1, 4, 6], [5, 3, 6, 2]], unknots: 0, framings: [null], strokes } },
    }],
  });

  ({ browser, phone: { page: adaPage }, wide: { page: brunoPage } } = await signedInPair(ada, bruno, 10_000));
});

afterAll(async () => {
  await browser?.close();
});

test('Ada shares her sketch to the group and adds a board photo', async () => {
  await adaPage.getByRole('tab', { name: 'Feed' }).click();
  await adaPage.getByText('Nothing shared in this group yet.').waitFor();
  await adaPage.getByRole('button', { name: 'Share a sketch' }).click();
  await adaPage.getByRole('button', { name: `Share ${title}` }).click();
  await adaPage.getByRole('heading', { name: title }).waitFor();
  // Readout summary of the positive trefoil: Jones t + t^3 - t^4 (docs/conventions.md).
  // Typeset; its text is the label. The server computes it off its request thread once the
  // share arrives (a worker thread that may still be starting), and the page asks every 3 s.
  await adaPage.getByRole('math', { name: 'V(t) = t + t³ − t⁴' }).waitFor({ timeout: 30_000 });

  // A "photo of the board": chalk curves on slate, with a GPS position in its EXIF as a phone would write.
  const board = `<svg xmlns="http://www.w3.org/2000/svg" width="800" height="600"><rect width="800" height="600" fill="#2b3a36"/>
    <path d="M400 120 C 620 120 640 420 470 470 C 300 520 160 300 300 200 C 420 120 560 300 480 400 C 400 500 220 420 260 300 C 300 180 400 120 400 120"
      stroke="#eeeae0" stroke-width="9" fill="none" stroke-linecap="round"/><text x="60" y="560" fill="#d9d4c7" font-size="34" font-family="sans-serif">3_1 ?</text></svg>`;
  const photo = await sharp(Buffer.from(board)).jpeg().withExif({ IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '48/1 51/1 24/1' } }).toBuffer();
  const chooser = adaPage.waitForEvent('filechooser');
  await adaPage.getByRole('button', { name: 'Add a board photo' }).click();
  await (await chooser).setFiles({ name: 'board.jpg', mimeType: 'image/jpeg', buffer: photo });
  await adaPage.getByText('Board photos · 1').waitFor();
  await adaPage.getByLabel(`Board photo by ${ada.name}`).waitFor();
  await shoot(adaPage, '20-feed-shared-sketch');
});

test('Bruno sees it in the feed, comments and forks it', async () => {
  await brunoPage.getByRole('tab', { name: 'Feed' }).click();
  const card = brunoPage.getByRole('link', { name: `Open ${title}` });
  await card.waitFor();
  await expect(card.innerText()).resolves.toContain(ada.name);
  await expect(card.innerText()).resolves.toContain('3 crossings');
  await shoot(brunoPage, '21-feed-list');
  await card.click();
  await brunoPage.getByRole('heading', { name: title }).waitFor();
  await brunoPage.getByRole('textbox', { name: 'Comment', exact: true }).fill('Is this the **positive** trefoil? Check `X[1,5,2,4]`.');
  await brunoPage.getByRole('button', { name: 'Post comment' }).click();
  await brunoPage.getByText('Discussion · 1').waitFor();
  await brunoPage.getByText('positive', { exact: true }).waitFor(); // the bold span, rendered as text
  await brunoPage.getByRole('button', { name: 'Fork into my sketchbook' }).click();
  await brunoPage.getByText('A private copy is in your sketchbook').waitFor();
  await shoot(brunoPage, '22-feed-sketch-discussion');
});

test('Ada sees the notification in the app and the e-mail in the kept mail', async () => {
  await adaPage.getByRole('tab', { name: 'Account' }).click();
  await adaPage.getByRole('link', { name: 'Open notifications' }).click();
  const note = adaPage.getByTestId('notification-comment');
  await note.waitFor();
  await expect(note.innerText()).resolves.toContain(`${bruno.name} commented on “${title}”`);
  await shoot(adaPage, '23-notifications');
  await adaPage.goto(baseUrl + '/dev/mail');
  await adaPage.getByText(`${bruno.name} commented on "${title}"`).first().waitFor();
  await shoot(adaPage, '24-kept-mail-comment');
});

test('Ada opens the members table: roles, joined, last active', async () => {
  await adaPage.goto(baseUrl + '/account');
  await adaPage.getByRole('link', { name: 'Open Knot lunch' }).click();
  await adaPage.getByRole('button', { name: 'Members table' }).click();
  await adaPage.getByRole('heading', { name: 'Members', exact: true }).waitFor();
  const row = adaPage.getByTestId(`roster-${bruno.email}`);
  await row.waitFor();
  await expect(row.innerText()).resolves.toMatch(/ago|just now/); // Bruno was active in this run
  await shoot(adaPage, '25-members-table');
});
