import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { signIn } from '../support/app';
import { browserHarness, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { reportIncident } from '../support/incidents';
import { watchedPage } from '../support/watched-page';

// Wherever an incident's class shows, so does what it is and is not (DESIGN §7, REFERENCES §6):
// the team's own classification, not an official log; local rules, event staff and licensed
// medical advice come first.

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let incidentId = '';

beforeAll(async () => {
  team = await makeTeam();
  const crew = await signIn(harness.app, team.emails.crew, PASSWORD);
  incidentId = (await reportIncident(crew, { kind: 'injury', description: 'Bruised shin on the robot cart.', treatments: ['hot_cold_therapy'] })).id;
});

async function saysWhatTheClassIs(page: Page, where: string) {
  const main = page.getByRole('main');
  await main.getByText(/Local rules, event staff and licensed medical advice come first/).first().waitFor();
  expect(await main.getByText(/not an official log/).count(), where).toBeGreaterThan(0);
}

it('the log, a report, the form, the print view and the alert rules all say what the class is and is not', async () => {
  const tablet = await watchedPage(harness.browser);
  try {
    const { page } = tablet;
    await fillSignIn(page, harness.baseUrl, team.emails.admin, PASSWORD);
    await page.getByText('Live', { exact: true }).waitFor();
    const places: [string, string, () => Promise<unknown>][] = [
      ['the log', '/safety', () => page.getByRole('list', { name: 'Incidents' }).getByText('First aid only').waitFor()],
      ['a report', `/safety/incidents/${incidentId}`, () => page.getByRole('heading', { level: 1, name: 'Injury · Pit' }).waitFor()],
      ['the form', '/safety/report', () => page.getByRole('heading', { level: 1, name: 'Report an incident' }).waitFor()],
      ['the print view', '/safety/print', () => page.getByRole('table', { name: 'Incidents, newest first' }).waitFor()],
      // The rules are named after the classes ("First aid only", "Near misses").
      ['the alert rules', '/team', () => page.getByRole('form', { name: 'First aid only' }).waitFor()],
    ];
    for (const [where, path, shown] of places) {
      await page.goto(`${harness.baseUrl}${path}`);
      await shown();
      await saysWhatTheClassIs(page, where);
    }
  } finally {
    await tablet.close();
  }
});
