import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { BatteryJson } from '../../shared/schemas/batteries';
import type { IncidentJson } from '../../shared/schemas/incidents';
import { signIn, type SignedIn } from '../support/app';
import { makeBattery } from '../support/batteries';
import { browserHarness, fillSignIn, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { editIncident, reportIncident } from '../support/incidents';
import { mailTo } from '../support/mail';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let crew: SignedIn;
let safety: SignedIn;
let admin: SignedIn;

const LANDSCAPE = { width: 1280, height: 800 };
const TABLET = { width: 800, height: 1280 };
const shot = (page: Page, name: string, fullPage = true) => page.screenshot({ path: path.join(SCREENSHOT_DIR, `safety-${name}.png`), fullPage });
// The SMTP fake stores what the dispatcher sends after the commit; a bound, not a timing check.
const MAIL_WAIT = { timeout: 20_000, interval: 100 };
const subjectsTo = async (address: string) => (await mailTo(address)).map((mail) => mail.subject);
const daysFromNow = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

beforeAll(async () => {
  team = await makeTeam();
  crew = await signIn(harness.app, team.emails.crew, PASSWORD);
  safety = await signIn(harness.app, team.emails.safety, PASSWORD);
  admin = await signIn(harness.app, team.emails.admin, PASSWORD);
});

async function withPage(viewport: { width: number; height: number }, email: string, test: (page: Page, problems: string[]) => Promise<void>) {
  const context = await harness.browser.newContext({ viewport, hasTouch: true, acceptDownloads: true });
  try {
    const page = await context.newPage();
    const problems: string[] = [];
    page.on('pageerror', (error) => problems.push(error.message));
    await fillSignIn(page, harness.baseUrl, email, PASSWORD);
    await page.getByText('Live', { exact: true }).waitFor();
    // From here on: the sign-in page's own question for a session answers 401 before signing in.
    page.on('console', (message) => message.type() === 'error' && problems.push(message.text()));
    await test(page, problems);
  } finally {
    await context.close();
  }
}

const onServer = async (id: string) => {
  const answer = await safety.get(`/api/incidents/${id}`);
  expect(answer.status).toBe(200);
  return answer.body as IncidentJson;
};

it('a safety captain sees a new report arrive in the log live, adds a follow-up with owner and due day, ticks it, and closes the report with a note', async () => {
  await withPage(LANDSCAPE, team.emails.safety, async (page, problems) => {
    await page.goto(`${harness.baseUrl}/safety`);
    await page.getByRole('heading', { name: 'Safety log' }).waitFor();
    await page.getByText('No incidents here. Good.').waitFor();

    const report = await reportIncident(crew, {
      kind: 'tool_or_machine',
      description: 'Cut on a finger from a sheet-metal edge while deburring.',
      involved: [{ initials: 'AK', role: 'student' }],
      treatments: ['wound_cleaning', 'wound_covering'],
    });
    // Announced to the safety captain's socket: no reload.
    const row = page.getByRole('list', { name: 'Incidents' }).getByRole('link', { name: /Tool or machine · Pit/ });
    await row.waitFor();
    expect(await row.innerText()).toMatch(/First aid only[\s\S]*Open[\s\S]*1 person · reported by Factory crew/);
    await shot(page, 'log-landscape');

    await row.click();
    await page.getByRole('heading', { level: 1, name: 'Tool or machine · Pit' }).waitFor();
    await page.getByText('First aid only. Because of: Cleaning, flushing or soaking a surface wound; Bandage, plaster or butterfly strip.').waitFor();
    const addForm = page.getByRole('form', { name: 'Add a follow-up' });
    await addForm.getByRole('button', { name: 'Add the follow-up' }).click();
    await addForm.getByText('Say what is to be done').waitFor();
    await addForm.getByText('Choose who does it').waitFor();
    await addForm.getByLabel('Follow-up to do').fill('Deburr every new plate before it reaches the pit');
    await addForm.getByLabel('Who does it').selectOption({ label: 'Factory lead' });
    await addForm.getByLabel('Due by').fill(daysFromNow(2));
    await addForm.getByRole('button', { name: 'Add the follow-up' }).click();
    const followUp = page.getByRole('checkbox', { name: /Deburr every new plate/ });
    await followUp.waitFor();
    await page.getByText(/Factory lead · due/).waitFor();
    expect(await addForm.getByLabel('Follow-up to do').inputValue()).toBe('');

    await followUp.check();
    await page.getByText(/Factory lead · due .* · done/).waitFor();
    await shot(page, 'incident-follow-ups-landscape');

    const closeForm = page.getByRole('form', { name: 'Close the report' });
    await closeForm.getByRole('button', { name: 'Close the report' }).click();
    await closeForm.getByText('Write what was done before closing').waitFor();
    await closeForm.getByLabel('Closing note').fill('Deburring added to the plate checklist; gloves at the bench.');
    await closeForm.getByRole('button', { name: 'Close the report' }).click();
    await page.getByRole('heading', { level: 2, name: 'Closed' }).waitFor();
    await page.getByRole('button', { name: 'Reopen the report' }).waitFor();
    await shot(page, 'incident-closed-landscape');

    const saved = await onServer(report.id);
    expect(saved).toMatchObject({ status: 'closed', closingNote: 'Deburring added to the plate checklist; gloves at the bench.' });
    expect(saved.followUps).toMatchObject([{ text: 'Deburr every new plate before it reaches the pit', ownerName: 'Factory lead', dueOn: daysFromNow(2), done: true }]);

    await page.getByRole('link', { name: 'Safety log' }).click();
    await page.getByRole('group', { name: 'Status' }).getByText('Open', { exact: true }).click();
    await page.getByText('No open incidents here.').waitFor();
    await page.getByRole('group', { name: 'Status' }).getByText('Closed', { exact: true }).click();
    await page.getByRole('list', { name: 'Incidents' }).getByRole('link', { name: /Tool or machine · Pit/ }).waitFor();
    expect(problems).toEqual([]);
  });
});

it('a follow-up ticked over a newer version shows what they changed; Keep mine ticks it on theirs, keeping their new one', async () => {
  const report = await reportIncident(crew, { description: 'Robot rolled off the cart when the brake was not set.' });
  const first = await editIncident(safety, report, {
    followUps: [{ text: 'Brake check on the cart list', ownerId: team.memberships.lead.id, dueOn: daysFromNow(1) }],
  });
  await withPage(TABLET, team.emails.safety, async (page, problems) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    const tick = page.getByRole('checkbox', { name: /Brake check on the cart list/ });
    await tick.waitFor();
    // This tablet stays on the version it loaded, as one whose socket dropped would: otherwise the
    // announcement of the mentor's change could refresh it before the tick.
    const reads = `**/api/incidents/${report.id}`;
    await page.route(reads, (route) => (route.request().method() === 'GET' ? route.fulfill({ json: first }) : route.fallback()));
    // Meanwhile a mentor adds another follow-up from their phone.
    await editIncident(admin, first, {
      followUps: [
        { id: first.followUps[0].id, text: 'Brake check on the cart list', ownerId: team.memberships.lead.id, dueOn: daysFromNow(1), done: false },
        { text: 'Buy a cart with a dead-man brake', ownerId: team.memberships.admin.id, dueOn: daysFromNow(7) },
      ],
    });
    await tick.check();
    const notice = page.getByRole('alert').filter({ hasText: 'Someone else changed this report' });
    await notice.waitFor();
    await notice.getByText(/Buy a cart with a dead-man brake/).waitFor();
    await notice.getByText('Your change: tick ‘Brake check on the cart list’.', { exact: false }).waitFor();
    await shot(page, 'incident-stale-tablet');
    await page.unroute(reads);
    await notice.getByRole('button', { name: 'Keep mine' }).click();
    await notice.waitFor({ state: 'detached' });
    await page.getByText(/Factory lead · due .* · done/).waitFor();
    await page.getByRole('checkbox', { name: /Buy a cart with a dead-man brake/ }).waitFor();
    // The browser logs the 409 it was answered; that refusal is this test's point, anything else is not.
    expect(problems.filter((problem) => !problem.includes('status of 409'))).toEqual([]);
  });
  const saved = await onServer(report.id);
  expect(saved.followUps.map((item) => [item.text, item.done])).toEqual([
    ['Brake check on the cart list', true],
    ['Buy a cart with a dead-man brake', false],
  ]);
});

it('closing a battery incident can retire the battery; the CSV downloads and the print view lists the report', async () => {
  const battery = await makeBattery(admin, { label: 'C7' });
  const report = await reportIncident(crew, {
    kind: 'battery_or_chemical',
    batteryId: battery.id,
    description: 'Cracked case leaked acid onto the cart; a drop reached a mentor\'s eye.',
    involved: [{ initials: 'MR', role: 'mentor' }],
    treatments: ['eye_flush_or_swab'],
  });
  await withPage(TABLET, team.emails.admin, async (page, problems) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    await page.getByText('Safety contacts alerted at once: battery acid or a chemical.').waitFor();
    const closeForm = page.getByRole('form', { name: 'Close the report' });
    await closeForm.getByLabel('Closing note').fill('Battery bagged and returned to the supplier.');
    await closeForm.getByText('Retire battery C7: it leaves the rotation for good').click();
    await shot(page, 'incident-retire-tablet');
    await closeForm.getByRole('button', { name: 'Close the report' }).click();
    await page.getByRole('heading', { level: 2, name: 'Closed' }).waitFor();
    const retired = (await admin.get(`/api/batteries/${battery.id}`)).body as BatteryJson;
    expect(retired.status).toBe('retired');

    await page.getByRole('link', { name: 'Safety log' }).click();
    const csvLink = page.getByRole('link', { name: 'Download CSV' });
    expect(await csvLink.getAttribute('href')).toBe(`/api/incidents.csv?eventId=${team.event.id}`);
    const answer = await page.request.get(`${harness.baseUrl}/api/incidents.csv?eventId=${team.event.id}`);
    expect(answer.status()).toBe(200);
    expect(answer.headers()['content-type']).toBe('text/csv; charset=utf-8');
    expect(answer.headers()['content-disposition']).toMatch(/^attachment; filename="incidents-.+\.csv"$/);
    const [download] = await Promise.all([page.waitForEvent('download'), csvLink.click()]);
    expect(download.suggestedFilename()).toMatch(/^incidents-.+\.csv$/);
    const csv = fs.readFileSync((await download.path()) ?? '', 'utf8');
    expect(csv.split('\n').length).toBeGreaterThanOrEqual(2);
    expect(csv).toContain('Cracked case leaked acid onto the cart');
    expect(csv).toContain('MR');

    await page.getByRole('link', { name: 'Print view' }).click();
    const table = page.getByRole('table', { name: 'Incidents, newest first' });
    await table.getByText(/Cracked case leaked acid/).waitFor();
    await table.getByText('MR (Mentor)').waitFor();
    await page.getByRole('heading', { level: 1, name: `Safety log: ${team.team.name}` }).waitFor();
    await shot(page, 'print-tablet');
    await page.emulateMedia({ media: 'print' });
    await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    await shot(page, 'print-paper');
    expect(problems).toEqual([]);
  });
});

it('a later hospital visit: the captain corrects the care given, the class goes up and the contacts are alerted again', async () => {
  const report = await reportIncident(crew, {
    kind: 'injury',
    location: 'field',
    description: 'Twisted an ankle stepping off the field border.',
    involved: [{ initials: 'LT', role: 'student' }],
    treatments: ['hot_cold_therapy'],
  });
  const firstAidSubject = `Incident logged, ${team.team.name}: first aid only, injury on the field`;
  await expect.poll(() => subjectsTo(team.emails.safety), MAIL_WAIT).toContain(firstAidSubject);
  await withPage(TABLET, team.emails.safety, async (page, problems) => {
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    await page.getByRole('heading', { level: 1, name: 'Injury · Field' }).waitFor();
    await page.getByRole('button', { name: 'Edit the report' }).click();
    const form = page.getByRole('form', { name: 'Edit the report' });
    await form.getByRole('group', { name: 'Beyond first aid', exact: true }).getByText('Rigid splint, cast or brace with stays').click();
    await form.getByText(/Saving makes it more serious than when it was reported\. The safety contacts get an e-mail at once when you save/).waitFor();
    await shot(page, 'incident-edit-tablet');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByRole('heading', { level: 2, name: 'What was reported' }).waitFor();
    await page.getByText('Safety contacts alerted at once: care beyond first aid.').waitFor();
    await page.getByText('Beyond first aid. Because of: Rigid splint, cast or brace with stays.').waitFor();
    expect(problems).toEqual([]);
  });
  expect(await onServer(report.id)).toMatchObject({ classification: { class: 'beyond_first_aid' }, treatments: expect.arrayContaining(['hot_cold_therapy', 'rigid_splint_or_cast']) });
  await expect.poll(() => subjectsTo(team.emails.safety), MAIL_WAIT).toContain(`Safety alert, ${team.team.name}: beyond first aid, injury on the field`);
});

it('on a 360 px phone the log, a report with follow-ups and the print view never scroll sideways', async () => {
  const report = await reportIncident(crew, { description: 'Extension cord across the aisle tripped a visitor; caught the table.', involved: [{ initials: 'VX', role: 'visitor' }] });
  await editIncident(safety, report, { followUps: [{ text: 'Tape every cord crossing the aisle with bright gaffer tape', ownerId: team.memberships.crew.id, dueOn: daysFromNow(1) }] });
  await withPage({ width: 360, height: 740 }, team.emails.safety, async (page, problems) => {
    const sideways = () => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    await page.goto(`${harness.baseUrl}/safety`);
    await page.getByRole('list', { name: 'Incidents' }).getByText(/Extension cord across the aisle/).waitFor();
    expect(await sideways()).toBe(0);
    await shot(page, 'log-phone');
    await page.goto(`${harness.baseUrl}/safety/incidents/${report.id}`);
    await page.getByRole('checkbox', { name: /Tape every cord/ }).waitFor();
    expect(await sideways()).toBe(0);
    await shot(page, 'incident-phone');
    await page.goto(`${harness.baseUrl}/safety/print`);
    await page.getByRole('table', { name: 'Incidents, newest first' }).waitFor();
    expect(await sideways()).toBe(0);
    expect(problems).toEqual([]);
  });
});
