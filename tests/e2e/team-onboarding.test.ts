import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserHarness, SCREENSHOT_DIR, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD, uniqueEmail } from '../support/factories';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

async function signInAs(page: Page, email: string, password: string) {
  await fillSignIn(page, harness.baseUrl, email, password);
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

it('a mentor adds a member on a tablet; the member signs in with the temporary password and picks their own', async () => {
  const context = await harness.browser.newContext({ viewport: { width: 800, height: 1280 }, hasTouch: true });
  try {
    await onboard(await context.newPage());
  } finally {
    await context.close();
  }
});

async function onboard(page: Page) {
  const newcomer = uniqueEmail('newcomer');

  await signInAs(page, team.emails.admin, PASSWORD);
  await page.getByRole('link', { name: 'Team' }).first().click();
  await page.getByRole('button', { name: 'Add a member' }).click();
  // An e-mailed invite is the way offered first (tests/e2e/team-invites.test.ts); this is the other.
  await page.getByText('Give a first password', { exact: true }).click();
  await page.getByLabel('Name', { exact: true }).fill('Newcomer N.');
  await page.getByLabel('E-mail', { exact: true }).fill(newcomer);
  await page.getByRole('button', { name: 'Add member' }).click();
  const passwordBox = page.getByLabel('Temporary password');
  await passwordBox.waitFor();
  const temporary = await passwordBox.inputValue();
  expect(temporary).toMatch(/^[a-zA-Z2-9]{4}(-[a-zA-Z2-9]{4}){3}$/);
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'team-temporary-password-tablet.png') });
  await page.getByRole('button', { name: 'Done' }).click();
  await page.getByRole('heading', { name: 'Newcomer N.' }).waitFor();
  await page.getByRole('button', { name: 'Sign out' }).click();

  await signInAs(page, newcomer, temporary);
  await page.getByRole('link', { name: 'Team' }).first().click();
  await page.getByLabel('Current password').fill(temporary);
  await page.getByLabel('New password').fill('my own pit password');
  await page.getByRole('button', { name: 'Change password' }).click();
  await page.getByText('Password changed.').waitFor();
  await page.getByRole('button', { name: 'Sign out' }).click();

  await signInAs(page, newcomer, 'my own pit password');
}
