import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserHarness, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

async function onTablet(run: (page: Page) => Promise<void>) {
  const context = await harness.browser.newContext({ viewport: { width: 800, height: 1280 }, deviceScaleFactor: 1, hasTouch: true });
  const page = await context.newPage();
  const failures: string[] = [];
  page.on('pageerror', (error) => failures.push(error.message));
  try {
    await run(page);
  } finally {
    await context.close();
  }
  expect(failures, 'uncaught errors in the page').toEqual([]);
}

it('a lead signs in, sees the shell with the current event, and signs out', async () => {
  await onTablet(async (page) => {
    await page.goto(harness.baseUrl);
    await page.getByLabel('E-mail').waitFor();
    expect(page.url()).toContain('/sign-in');
    await page.getByLabel('E-mail').fill(team.emails.lead);
    await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();

    await page.getByRole('navigation').first().waitFor();
    await expect.poll(() => page.getByText(team.event.name).count()).toBeGreaterThan(0);
    await expect.poll(() => page.getByText('Factory lead').count()).toBeGreaterThan(0);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'board-lead-tablet.png'), fullPage: true });

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByLabel('E-mail').waitFor();
    expect(page.url()).toContain('/sign-in');
    // Signed out for the server too, not only on screen (the API tests check the session row is destroyed).
    const status = await page.evaluate(() => fetch('/api/session').then((answer) => answer.status));
    expect(status).toBe(401);
  });
});

it('a wrong password shows why, and the user stays on the sign-in page', async () => {
  await onTablet(async (page) => {
    await page.goto(`${harness.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(team.emails.crew);
    await page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Wrong e-mail or password').waitFor();
    expect(page.url()).toContain('/sign-in');
  });
});
