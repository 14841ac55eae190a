import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { IncidentJson } from '../../shared/schemas/incidents';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, fillSignIn, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { editIncident, reportIncident } from '../support/incidents';
import { loseFirstAnswer } from '../support/flaky-network';
import { watchedPage } from '../support/watched-page';

// Saturday morning on the arena Wi-Fi: answers that never come back, refetches that fail. What was
// sent must not be made twice, and what is being typed must stay on the screen.

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let crew: SignedIn;
let safety: SignedIn;
let admin: SignedIn;

beforeAll(async () => {
  team = await makeTeam();
  crew = await signIn(harness.app, team.emails.crew, PASSWORD);
  safety = await signIn(harness.app, team.emails.safety, PASSWORD);
  admin = await signIn(harness.app, team.emails.admin, PASSWORD);
});

const daysFromNow = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
const onServer = async (id: string) => (await safety.get(`/api/incidents/${id}`)).body as IncidentJson;
// The browser logs each connection the test cuts; those cuts are the point, anything else is not.
const LOST = ['/api/incidents/', '/api/events'];

/**
 * A signed-in tablet for the test's body. The browser logs each request the test cuts (and the
 * 409 that may follow); those are the point, and leave the list before the usual check for none.
 */
async function onTablet(email: string, body: (page: Page, problems: string[]) => Promise<void>) {
  const tablet = await watchedPage(harness.browser);
  try {
    await fillSignIn(tablet.page, harness.baseUrl, email, PASSWORD);
    await tablet.page.getByText('Live', { exact: true }).waitFor();
    await body(tablet.page, tablet.problems);
    await tablet.settled();
  } catch (error) {
    await tablet.context.close();
    throw error;
  }
  const expected = (problem: string) => (problem.includes('net::ERR_CONNECTION_RESET') && LOST.some((path) => problem.includes(path))) || problem.includes('status of 409');
  tablet.problems.splice(0, tablet.problems.length, ...tablet.problems.filter((problem) => !expected(problem)));
  await tablet.close();
}

async function fillFollowUp(page: Page, text: string) {
  const form = page.getByRole('form', { name: 'Add a follow-up' });
  await form.getByLabel('Follow-up to do').fill(text);
  await form.getByLabel('Who does it').selectOption({ label: 'Factory lead' });
  await form.getByLabel('Due by').fill(daysFromNow(2));
  return form;
}

it('a follow-up whose answer was lost, sent again once the page shows it arrived, is not added twice', async () => {
  const report = await reportIncident(crew, { description: 'Loose cable tie cut a wrist on the bumper.' });
  await onTablet(team.emails.safety, async (page) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    const form = await fillFollowUp(page, 'Trim cable ties flush on the bumpers');
    await loseFirstAnswer(page, `**/api/incidents/${report.id}`, 'PATCH');
    await form.getByRole('button', { name: 'Add the follow-up' }).click();
    await form.getByText(/Cannot reach the Pitwright server/).waitFor();
    // The socket announced the change: the list shows it, while the form still holds it with the error.
    await page.getByRole('checkbox', { name: /Trim cable ties flush/ }).waitFor();
    await form.getByRole('button', { name: 'Add the follow-up' }).click();
    await expect.poll(() => form.getByLabel('Follow-up to do').inputValue()).toBe('');
    expect(await page.getByRole('checkbox', { name: /Trim cable ties flush/ }).count()).toBe(1);
  });
  expect((await onServer(report.id)).followUps.map((item) => item.text)).toEqual(['Trim cable ties flush on the bumpers']);
});

it('a follow-up sent again on the version the page still had: the stale answer holds it, so it is saved, not offered as their change', async () => {
  const report = await onServer((await reportIncident(crew, { description: 'Battery strap snapped while lifting the robot.' })).id);
  await onTablet(team.emails.safety, async (page) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    const form = await fillFollowUp(page, 'Replace every strap older than a season');
    // This tablet's reads keep answering the version it loaded, as one whose socket dropped would.
    await page.route(`**/api/incidents/${report.id}`, (route) => (route.request().method() === 'GET' ? route.fulfill({ json: report }) : route.fallback()));
    await loseFirstAnswer(page, `**/api/incidents/${report.id}`, 'PATCH');
    await form.getByRole('button', { name: 'Add the follow-up' }).click();
    await form.getByText(/Cannot reach the Pitwright server/).waitFor();
    await form.getByRole('button', { name: 'Add the follow-up' }).click();
    await page.getByRole('checkbox', { name: /Replace every strap/ }).waitFor();
    await expect.poll(() => form.getByLabel('Follow-up to do').inputValue()).toBe('');
    expect(await page.getByRole('alert').filter({ hasText: 'Someone else changed this report' }).count()).toBe(0);
  });
  expect((await onServer(report.id)).followUps.map((item) => item.text)).toEqual(['Replace every strap older than a season']);
});

it('a correction saved again after its answer was lost is saved, not shown as someone else\'s change', async () => {
  const report = await reportIncident(crew, { kind: 'injury', description: 'Scraped knuckles on the frame.', involved: [{ initials: 'RT', role: 'student' }], treatments: ['wound_cleaning'] });
  await onTablet(team.emails.safety, async (page) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    await page.getByRole('button', { name: 'Edit the report' }).click();
    const form = page.getByRole('form', { name: 'Edit the report' });
    await form.getByLabel('What happened?').fill('Scraped knuckles on the frame while fitting the bumper.');
    await loseFirstAnswer(page, `**/api/incidents/${report.id}`, 'PATCH');
    // The socket announces the save the answer was lost of, and the page reloads the report.
    const reloaded = page.waitForResponse((answer) => answer.url().endsWith(`/api/incidents/${report.id}`) && answer.request().method() === 'GET');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await form.getByText(/Cannot reach the Pitwright server/).waitFor();
    await reloaded;
    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByRole('heading', { level: 2, name: 'What was reported' }).waitFor();
    expect(await page.getByRole('alert').filter({ hasText: 'Someone else changed this report' }).count()).toBe(0);
    await page.getByText('Scraped knuckles on the frame while fitting the bumper.', { exact: true }).waitFor();
  });
  expect((await onServer(report.id)).description).toBe('Scraped knuckles on the frame while fitting the bumper.');
});

it('the report being typed stays when the events fail to reload behind it', async () => {
  await onTablet(team.emails.crew, async (page, problems) => {
    await page.goto(`${harness.baseUrl}/safety/report`);
    await page.getByRole('group', { name: 'Where did it happen?' }).getByText('Stands', { exact: true }).click();
    await page.getByLabel('What happened?').fill('A visitor slipped on a spilled drink by the stairs.');
    await page.route('**/api/events', (route) => route.abort('connectionreset'));
    // A mentor renames the venue: every tablet is told to reload the events, and this one cannot.
    const event = (await admin.get(`/api/events/${team.event.id}`)).body as { version: number };
    expect((await admin.patch(`/api/events/${team.event.id}`, { venue: 'Hall B', version: event.version })).status).toBe(200);
    // The query gives up after its two retries; the form must still be there, as typed.
    await expect.poll(() => problems.filter((problem) => problem.includes('/api/events')).length, { timeout: 15_000 }).toBe(3);
    // Two frames: whatever the failure changes on the page is drawn by then.
    await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
    expect(await page.getByLabel('What happened?').inputValue()).toBe('A visitor slipped on a spilled drink by the stairs.');
    expect(await page.getByRole('radio', { name: 'Stands' }).isChecked()).toBe(true);
  });
});

it('a correction being typed stays when the report fails to reload behind it', async () => {
  const report = await reportIncident(crew, { kind: 'injury', description: 'Pinched finger in the intake rollers.', involved: [{ initials: 'KB', role: 'student' }] });
  await onTablet(team.emails.safety, async (page, problems) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    await page.getByRole('button', { name: 'Edit the report' }).click();
    const form = page.getByRole('form', { name: 'Edit the report' });
    await form.getByLabel('What happened?').fill('Pinched finger in the intake rollers; the guard was off.');
    await page.route(`**/api/incidents/${report.id}`, (route) => (route.request().method() === 'GET' ? route.abort('connectionreset') : route.fallback()));
    // A mentor adds a follow-up meanwhile: the page is told to reload the report, and cannot.
    await editIncident(admin, report, { followUps: [{ text: 'Guard back on before each match', ownerId: team.memberships.lead.id, dueOn: daysFromNow(1) }] });
    // The reload fails (after the query's own retries): the page says so, and keeps the report and the form.
    await page.getByText(/Could not (re)?load the report/).waitFor({ timeout: 15_000 });
    expect(problems.filter((problem) => problem.includes(`/api/incidents/${report.id}`))).toHaveLength(3);
    expect(await form.getByLabel('What happened?').inputValue({ timeout: 5_000 })).toBe('Pinched finger in the intake rollers; the guard was off.');
    await page.getByText('Could not reload the report: this is how it was').waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'safety-report-reload-failed-tablet.png') });
  });
});
