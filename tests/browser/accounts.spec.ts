// The accounts-and-groups journey in a real browser against the real server and web export:
// sign up, sign out, sign in, create a group, invite, read the kept mail, accept as the invited
// person, and see their role enforced in the UI.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { PHONE, WIDE, baseUrl, launch, person, shoot } from './helpers';

const owner = person('Ada Lindgren', 'ada', 'correct horse 1');
const guest = person('Bruno Sato', 'bruno', 'battery staple 2');
const groupName = 'Thursday knot seminar';

let browser: Browser;
let ownerContext: BrowserContext;
let guestContext: BrowserContext;
let page: Page; // the owner's tab
let guestPage: Page;
let inviteLink = '';

const heading = (p: Page, name: string | RegExp) => p.getByRole('heading', { name, exact: typeof name === 'string' });

beforeAll(async () => {
  browser = await launch();
  ownerContext = await browser.newContext({ viewport: PHONE });
  guestContext = await browser.newContext({ viewport: WIDE });
  // Fail in seconds, not half a minute: every step here is a local round trip.
  for (const c of [ownerContext, guestContext]) c.setDefaultTimeout(10_000);
  page = await ownerContext.newPage();
  guestPage = await guestContext.newPage();
});

afterAll(async () => {
  await browser?.close();
});

test('a signed-out visitor lands on sign-in; sign-up validates inline, then creates the account', async () => {
  await page.goto(baseUrl + '/');
  await heading(page, 'Sign in').waitFor();
  expect(new URL(page.url()).pathname).toBe('/sign-in');
  await shoot(page, '01-sign-in');

  await page.getByRole('link', { name: 'Create an account' }).click();
  await heading(page, 'Create your account').waitFor();
  await page.getByLabel('E-mail').fill('not-an-address');
  await page.getByLabel('Password').fill('short');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByText('Name is required').isVisible()).resolves.toBe(true);
  await expect(page.getByText('Enter a valid e-mail address').isVisible()).resolves.toBe(true);
  await expect(page.getByText('Password must be at least 8 characters').isVisible()).resolves.toBe(true);
  await shoot(page, '02-sign-up-errors');

  await page.getByLabel('Name').fill(owner.name);
  await page.getByLabel('E-mail').fill(owner.email);
  await page.getByLabel('Password').fill(owner.password);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.getByRole('tab', { name: 'Sketches', selected: true }).waitFor();
  expect(new URL(page.url()).pathname).toBe('/sketches');
  await shoot(page, '03-sketches');
});

test('a reload stays signed in', async () => {
  await page.reload();
  await page.getByRole('tab', { name: 'Sketches', selected: true }).waitFor();
  await expect(page.getByRole('button', { name: 'Sign in' }).count()).resolves.toBe(0);
  expect(new URL(page.url()).pathname).toBe('/sketches');
});

test('the tabs reach Feed, Runs and Account', async () => {
  // Only the shell is checked here; each tab's own content has its own spec.
  for (const [tab, path] of [['Feed', '/feed'], ['Runs', '/runs'], ['Account', '/account']]) {
    await page.getByRole('tab', { name: tab }).click();
    await page.getByRole('tab', { name: tab, selected: true }).waitFor();
    expect(new URL(page.url()).pathname).toBe(path);
  }
  await heading(page, 'Account').waitFor();
  await expect(page.getByText(owner.email).first().isVisible()).resolves.toBe(true);
});

test('sign out forgets the session', async () => {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await heading(page, 'You are signed out').waitFor();
  await shoot(page, '05-signed-out');
  await page.goto(baseUrl + '/account');
  await heading(page, 'Sign in').waitFor();
});

test('sign in shows the server error for a wrong password, then signs in', async () => {
  await page.getByLabel('E-mail').fill(owner.email);
  await page.getByLabel('Password').fill('wrong password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByText('Could not sign in').waitFor();
  await shoot(page, '06-sign-in-error');
  await page.getByLabel('Password').fill(owner.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // Signed out from /account, so signing in returns there (?next=/account).
  await heading(page, 'Account').waitFor();
});

test('create a group and become its owner', async () => {
  await page.getByLabel('New group').fill(groupName);
  await page.getByRole('button', { name: 'Create group' }).click();
  await heading(page, groupName).waitFor();
  await expect(page.getByText('Invite someone').isVisible()).resolves.toBe(true);
  await expect(page.getByTestId(`member-${owner.email}`).getByText('owner').isVisible()).resolves.toBe(true);
});

test('invite someone by e-mail as a viewer', async () => {
  await page.getByLabel('E-mail').fill(guest.email);
  await page.getByRole('radio', { name: 'viewer' }).click();
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await page.getByText(`Invitation sent to ${guest.email} as viewer.`).waitFor();
  await shoot(page, '07-group-owner');
});

test('the kept mail page has the invitation link', async () => {
  const mail = await ownerContext.newPage();
  await mail.goto(baseUrl + '/dev/mail');
  await mail.getByText(`To ${guest.email}`, { exact: false }).first().waitFor();
  inviteLink = (await mail.locator('a[href*="/invite/"]').first().getAttribute('href')) ?? '';
  expect(inviteLink).toMatch(/\/invite\/[^/]+$/);
  await shoot(mail, '08-kept-mail');
  await mail.close();
});

test('the invited person signs up from the link and accepts', async () => {
  await guestPage.goto(inviteLink);
  await heading(guestPage, `Join ${groupName}`).waitFor();
  await expect(guestPage.getByText('viewer', { exact: true }).isVisible()).resolves.toBe(true);
  await shoot(guestPage, '09-invitation');

  await guestPage.getByRole('button', { name: 'Create an account to join' }).click();
  await heading(guestPage, 'Create your account').waitFor();
  await expect(guestPage.getByLabel('E-mail').inputValue()).resolves.toBe(guest.email);
  await guestPage.getByLabel('Name').fill(guest.name);
  await guestPage.getByLabel('Password').fill(guest.password);
  await guestPage.getByRole('button', { name: 'Create account' }).click();

  // Back on the invitation, now signed in.
  await guestPage.getByRole('button', { name: 'Accept and join' }).click();
  await guestPage.getByText(`You joined ${groupName}`).waitFor();
  await guestPage.getByRole('button', { name: 'Open the group' }).click();
  await heading(guestPage, groupName).waitFor();
});

test('the viewer sees the role enforced: no invite form, no member controls', async () => {
  await guestPage.getByText('Invitations are for owners and admins').waitFor();
  expect(await guestPage.getByTestId('invite-form').count()).toBe(0);
  expect(await guestPage.getByRole('button', { name: 'Change role' }).count()).toBe(0);
  expect(await guestPage.getByRole('button', { name: 'Remove' }).count()).toBe(0);
  await expect(guestPage.getByTestId(`member-${guest.email}`).getByText('viewer').isVisible()).resolves.toBe(true);
  await shoot(guestPage, '10-group-viewer');
});

test('the owner sees the new viewer with controls; the used link says so', async () => {
  await page.reload();
  const row = page.getByTestId(`member-${guest.email}`);
  await row.waitFor();
  await expect(row.getByText('viewer').isVisible()).resolves.toBe(true);
  await expect(row.getByRole('button', { name: 'Change role' }).isVisible()).resolves.toBe(true);

  await guestPage.goto(inviteLink);
  await guestPage.getByText('This invitation was already used').waitFor();
  await shoot(guestPage, '11-invitation-used');
});
