import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserHarness, SCREENSHOT_DIR, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD, uniqueEmail } from '../support/factories';
import { watchedPage } from '../support/watched-page';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

const NEW_PASSWORD = 'a brand new pit password';
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SCREENSHOT_DIR, `password-reset-${name}.png`), fullPage: true });

/** The board has its timeline (the factory team's event has no matches): nothing left loading. */
const boardLoaded = (page: Page) => page.getByText('No matches yet — a lead imports the schedule').waitFor();

/** The neutral answer without the address it names. */
const answerOf = async (page: Page, email: string) => (await page.getByRole('status').filter({ hasText: 'belongs to a Pitwright account' }).innerText()).replace(email, '<address>');

it('a member who forgot their password gets a link by e-mail, chooses a new password and is signed in; the old one stops working', async () => {
  const member = await watchedPage(harness.browser);
  let link = '';
  try {
    const { page } = member;
    await page.goto(`${harness.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(team.emails.crew);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByRole('heading', { level: 1, name: 'Forgot your password?' }).waitFor();
    // What was typed on the sign-in page comes along.
    expect(await page.getByLabel('E-mail').inputValue()).toBe(team.emails.crew);
    await shot(page, 'form-tablet');
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await page.getByRole('heading', { level: 1, name: 'Check your e-mail' }).waitFor();
    const known = await answerOf(page, team.emails.crew);
    await shot(page, 'sent-tablet');

    // An address without an account gets the very same answer: the page tells a stranger nothing.
    const stranger = uniqueEmail('nobody');
    await page.getByRole('button', { name: 'Use another address' }).click();
    await page.getByLabel('E-mail').fill(stranger);
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await page.getByRole('heading', { level: 1, name: 'Check your e-mail' }).waitFor();
    expect(await answerOf(page, stranger)).toBe(known);
  } finally {
    await member.close();
  }

  const admin = await watchedPage(harness.browser);
  try {
    const { page } = admin;
    await fillSignIn(page, harness.baseUrl, team.emails.admin, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${harness.baseUrl}/mailbox`);
    const message = page.getByRole('link', { name: new RegExp(`Choose a new Pitwright password[\\s\\S]*To ${team.emails.crew}`) });
    await message.waitFor();
    await message.click();
    link = (await page.getByRole('article').getByRole('link', { name: /\/account-link#token=/ }).getAttribute('href')) ?? '';
    await shot(page, 'mailbox-tablet');
  } finally {
    await admin.close();
  }

  const back = await watchedPage(harness.browser);
  try {
    const { page } = back;
    // PUBLIC_URL is not this test's server: keep the link's fragment, which carries the token.
    await page.goto(`${harness.baseUrl}/account-link${new URL(link).hash}`);
    await page.getByRole('heading', { level: 1, name: 'Choose a new password' }).waitFor();
    await page.getByText(`For ${team.emails.crew}.`).waitFor();
    await page.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
    await shot(page, 'choose-tablet');
    await page.getByRole('button', { name: 'Save and sign in' }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    // Signing out while the board still loads would have the server refuse those calls (401).
    await boardLoaded(page);
    await back.settled();
    await page.getByRole('button', { name: 'Sign out' }).click();

    await fillSignIn(page, harness.baseUrl, team.emails.crew, PASSWORD);
    await page.getByText('Wrong e-mail or password').waitFor();
    await fillSignIn(page, harness.baseUrl, team.emails.crew, NEW_PASSWORD);
    await boardLoaded(page);
  } finally {
    await back.close();
  }
});
