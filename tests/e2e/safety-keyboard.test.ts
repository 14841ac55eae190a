import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { signIn } from '../support/app';
import { browserHarness, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { reportIncident } from '../support/incidents';
import { watchedPage } from '../support/watched-page';

// Where the focus goes on the safety pages: never lost with an element that goes away, and moved
// to what needs the person next.

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

async function onTablet(email: string, body: (page: Page) => Promise<void>) {
  const tablet = await watchedPage(harness.browser);
  try {
    await fillSignIn(tablet.page, harness.baseUrl, email, PASSWORD);
    await tablet.page.getByText('Live', { exact: true }).waitFor();
    await body(tablet.page);
  } catch (error) {
    // The test's own failure, not the page's console, is the one to read.
    await tablet.context.close();
    throw error;
  }
  await tablet.close();
}

/** The focused element as a person finds it: its label's words, or its own. */
const focused = (page: Page) =>
  page.evaluate(() => {
    const element = document.activeElement as HTMLInputElement | null;
    return (element?.labels?.[0]?.textContent ?? element?.textContent ?? '').trim();
  });

it('on a long form, a send with answers missing moves to the first one; a person added takes the focus, a person removed hands it back', async () => {
  await onTablet(team.emails.crew, async (page) => {
    await page.goto(`${harness.baseUrl}/safety/report`);
    await page.getByRole('button', { name: 'Send the report' }).click();
    await page.getByText('Tap where it happened').waitFor();
    await expect.poll(() => focused(page)).toBe('Pit');
    await page.getByRole('group', { name: 'Where did it happen?' }).getByText('Field', { exact: true }).click();
    await page.getByRole('group', { name: 'What kind of incident?' }).getByText('Something else', { exact: true }).click();
    await page.getByRole('button', { name: 'Send the report' }).click();
    await expect.poll(() => focused(page)).toBe('What happened?');

    await page.getByRole('button', { name: 'Add a person' }).click();
    await expect.poll(() => focused(page)).toBe('Person 1: initials');
    await page.keyboard.type('AB');
    expect(await page.getByLabel('Person 1: initials').inputValue()).toBe('AB');
    await page.getByRole('button', { name: 'Remove person 1' }).click();
    await expect.poll(() => focused(page)).toBe('Add a person');
  });
});

it('opening the correction form from the keyboard moves into it, and closing it goes back to its button', async () => {
  const crew = await signIn(harness.app, team.emails.crew, PASSWORD);
  const report = await reportIncident(crew, { description: 'Tripped over the battery cart handle.' });
  await onTablet(team.emails.safety, async (page) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    await page.getByRole('button', { name: 'Edit the report' }).focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => focused(page)).toBe('Day');
    await page.getByRole('form', { name: 'Edit the report' }).getByRole('button', { name: 'Cancel' }).focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => focused(page)).toBe('Edit the report');
  });
});
