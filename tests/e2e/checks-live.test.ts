import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, SCREENSHOT_DIR, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD, uniqueEmail } from '../support/factories';
import { matchBody } from '../support/schedule';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let lead: SignedIn;
let admin: SignedIn;
let ana: { email: string; password: string; membershipId: string };
let inspectionRunId: string;
let postMatchRunId: string;
let screenToken: string;
let packOutRunId: string;
const minutesFromNow = (minutes: number) => new Date(Date.now() + minutes * 60_000).toISOString();
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });

const TABLET = { width: 800, height: 1280 };
const PHONE = { width: 390, height: 844 };

const PRE_MATCH_ITEMS = [
  { label: 'Bumpers match the alliance', kind: 'choice', options: ['Red', 'Blue'], required: true, purpose: 'bumper_colour' },
  { label: 'Battery latched and strapped', kind: 'tick', required: true, role: 'battery' },
  { label: 'Main breaker on', kind: 'tick', required: true },
  { label: 'Air pressure', kind: 'number', required: true, min: 100, max: 120, unit: 'psi', help: 'Read the gauge once the compressor has stopped.' },
  { label: 'Code version on the driver station', kind: 'text', required: false },
  { label: 'Radio and cables secured', kind: 'tick', required: true },
];

beforeAll(async () => {
  team = await makeTeam();
  lead = await signIn(harness.app, team.emails.lead, PASSWORD);
  admin = await signIn(harness.app, team.emails.admin, PASSWORD);
  // A second crew member, so that two people mark the same run from two tablets.
  const email = uniqueEmail('ana');
  const added = await admin.post('/api/team/members', { name: 'Ana Ortiz', email, roles: ['crew'] });
  expect(added.status).toBe(201);
  ana = { email, password: added.body.temporaryPassword, membershipId: added.body.id };
  const screen = await admin.post('/api/team/screens', { name: 'Pit TV' });
  expect(screen.status).toBe(201);
  screenToken = screen.body.token;

  // Ours is the third match, about an hour away: the queue call (two matches before) is far off,
  // so open work makes the robot "at risk", not "not ready".
  const url = `/api/events/${team.event.id}/matches`;
  expect((await lead.post(url, matchBody({ number: 1, scheduledStart: minutesFromNow(40) }))).status).toBe(201);
  expect((await lead.post(url, matchBody({ number: 2, scheduledStart: minutesFromNow(47) }))).status).toBe(201);
  const ours = await lead.post(url, matchBody({ number: 3, scheduledStart: minutesFromNow(54), red: [team.team.number, 21002, 21003] }));
  expect(ours.status).toBe(201);
  const later = matchBody({ number: 4, scheduledStart: minutesFromNow(80), blue: [21004, team.team.number, 21006] });
  expect((await lead.post(url, later)).status).toBe(201);

  const template = await lead.post('/api/checklist-templates', { name: 'Pre-match check', phase: 'pre_match', items: PRE_MATCH_ITEMS });
  expect(template.status).toBe(201);
  const run = await lead.post(`/api/events/${team.event.id}/checklist-runs`, { templateId: template.body.id, matchId: ours.body.id });
  expect(run.status).toBe(201);
  // Everything but two ticks is done already, by the lead's phone.
  const itemId = (label: string) => run.body.items.find((item: { label: string }) => item.label === label).id;
  const mark = (label: string, value: unknown) => lead.put(`/api/checklist-runs/${run.body.id}/items/${itemId(label)}`, { value });
  expect((await mark('Bumpers match the alliance', 'Red')).status).toBe(200);
  expect((await mark('Battery latched and strapped', true)).status).toBe(200);
  expect((await mark('Air pressure', 112)).status).toBe(200);
  expect((await mark('Code version on the driver station', '2027.3.1')).status).toBe(200);

  const packOut = await lead.post('/api/checklist-templates', {
    name: 'Pack-out',
    phase: 'pack_out',
    items: [
      { label: 'Spare battery charger in the crate', kind: 'tick', required: true },
      { label: 'Tool chest locked', kind: 'tick', required: true },
    ],
  });
  expect(packOut.status).toBe(201);
  const packOutRun = await lead.post(`/api/events/${team.event.id}/checklist-runs`, { templateId: packOut.body.id });
  expect(packOutRun.status).toBe(201);
  packOutRunId = packOutRun.body.id;

  const inspection = await lead.post('/api/checklist-templates', {
    name: 'Robot inspection',
    phase: 'inspection',
    items: [{ label: 'Frame perimeter within the rules', kind: 'tick', required: true }],
  });
  expect(inspection.status).toBe(201);
  const inspectionRun = await lead.post(`/api/events/${team.event.id}/checklist-runs`, { templateId: inspection.body.id });
  expect(inspectionRun.status).toBe(201);
  inspectionRunId = inspectionRun.body.id;

  const postMatch = await lead.post('/api/checklist-templates', {
    name: 'After the match',
    phase: 'post_match',
    items: ['Robot back on the cart', 'Battery out', 'Bumpers off', 'Air released', 'Driver notes taken', 'Damage looked over'].map((label) => ({ label, kind: 'tick', required: true })),
  });
  expect(postMatch.status).toBe(201);
  const postMatchRun = await lead.post(`/api/events/${team.event.id}/checklist-runs`, { templateId: postMatch.body.id });
  expect(postMatchRun.status).toBe(201);
  postMatchRunId = postMatchRun.body.id;
});

async function openPage(browser: Browser, viewport: { width: number; height: number }, email: string, password: string, at: string) {
  const context = await browser.newContext({ viewport, hasTouch: true });
  const page = await context.newPage();
  await fillSignIn(page, harness.baseUrl, email, password);
  await page.getByText('Live', { exact: true }).waitFor();
  await page.goto(`${harness.baseUrl}${at}`);
  await page.getByText('Live', { exact: true }).waitFor();
  return { context, page };
}

const light = (page: Page) => page.getByRole('region', { name: 'Readiness' }).first();

it('two crew members tick one pre-match run live; the board and the pit screen turn Ready with the last required item', async () => {
  const [a, b, board] = await Promise.all([
    openPage(harness.browser, TABLET, ana.email, ana.password, '/checks'),
    openPage(harness.browser, TABLET, team.emails.crew, PASSWORD, '/checks'),
    openPage(harness.browser, PHONE, team.emails.lead, PASSWORD, '/'),
  ]);
  const tv = await harness.browser.newContext({ viewport: { width: 1920, height: 1080 } });
  try {
    const screen = await tv.newPage();
    await screen.goto(`${harness.baseUrl}/screen/${screenToken}`);
    await screen.getByText('Live', { exact: true }).waitFor();
    await screen.getByText('At risk', { exact: true }).waitFor();

    const breakerOnA = a.page.getByRole('checkbox', { name: 'Main breaker on' });
    const breakerOnB = b.page.getByRole('checkbox', { name: 'Main breaker on' });
    await breakerOnA.waitFor();
    await breakerOnB.waitFor();
    expect(await breakerOnB.getAttribute('aria-checked')).toBe('false');
    await light(board.page).getByText('At risk', { exact: true }).waitFor();
    await shot(a.page, 'checks-next-match-tablet');
    await shot(board.page, 'board-readiness-at-risk-phone');

    // Ana ticks on her tablet: it shows at once there and, without a reload, on the other tablet.
    await breakerOnA.click();
    expect(await breakerOnA.getAttribute('aria-checked')).toBe('true');
    await expect.poll(() => breakerOnB.getAttribute('aria-checked'), { timeout: 10_000 }).toBe('true');
    await b.page.locator('li', { has: breakerOnB }).getByText('Ana Ortiz').waitFor();

    // A pressure out of limits is stored but failed, in words, and the robot is not ready.
    const pressure = a.page.getByRole('textbox', { name: 'Air pressure' });
    await pressure.fill('130');
    await pressure.press('Enter');
    const pressureRow = b.page.locator('li', { has: b.page.getByRole('textbox', { name: 'Air pressure' }) });
    await pressureRow.getByText('Failed: 130 psi is outside the limits (100 – 120 psi)').waitFor({ timeout: 10_000 });
    await light(board.page).getByText('Not ready', { exact: true }).waitFor({ timeout: 10_000 });
    await screen.getByText('Not ready', { exact: true }).waitFor({ timeout: 15_000 });
    await screen.screenshot({ path: path.join(SCREENSHOT_DIR, 'pit-screen-not-ready-tv.png') });
    await shot(b.page, 'checks-failed-number-tablet');
    await pressure.fill('114');
    await a.page.locator('li', { has: pressure }).getByRole('button', { name: 'Save' }).click();
    await light(board.page).getByText('At risk', { exact: true }).waitFor({ timeout: 10_000 });

    // The other crew member ticks the last required item: the board and the TV say Ready.
    await b.page.getByRole('checkbox', { name: 'Radio and cables secured' }).click();
    await light(board.page).getByText('Ready', { exact: true }).waitFor({ timeout: 10_000 });
    await screen.getByText('Ready', { exact: true }).waitFor({ timeout: 15_000 });
    await expect.poll(() => a.page.getByRole('checkbox', { name: 'Radio and cables secured' }).getAttribute('aria-checked')).toBe('true');
    await a.page.getByText('5 of 5 required done').first().waitFor();
    await shot(board.page, 'board-readiness-ready-phone');
    await shot(a.page, 'checks-complete-tablet');
    await screen.screenshot({ path: path.join(SCREENSHOT_DIR, 'pit-screen-readiness-tv.png') });

    await board.page.setViewportSize(TABLET);
    await shot(board.page, 'board-readiness-ready-tablet');
    await board.page.goto(`${harness.baseUrl}/checks`);
    await board.page.setViewportSize(PHONE);
    await board.page.getByRole('checkbox', { name: 'Main breaker on' }).waitFor();
    await shot(board.page, 'checks-next-match-phone');
    await board.page.emulateMedia({ colorScheme: 'dark' });
    await shot(board.page, 'checks-next-match-phone-dark');
  } finally {
    await Promise.all([a.context.close(), b.context.close(), board.context.close(), tv.close()]);
  }
});

it('a lead signs off a run with items open only with a written reason, which the run keeps', async () => {
  const { context, page } = await openPage(harness.browser, PHONE, team.emails.lead, PASSWORD, `/checks/runs/${packOutRunId}`);
  try {
    await page.getByRole('heading', { level: 1, name: 'Pack-out' }).waitFor();
    await page.getByRole('checkbox', { name: 'Tool chest locked' }).click();
    await page.getByRole('button', { name: 'Sign off with items open…' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('Spare battery charger in the crate').waitFor();
    await dialog.getByRole('button', { name: 'Sign off anyway' }).click();
    await dialog.getByText(/Say in a few words why/).waitFor();
    await shot(page, 'checks-sign-off-dialog-phone');
    await dialog.getByLabel('Why sign it off anyway?').fill('The charger travels in the van');
    await dialog.getByRole('button', { name: 'Sign off anyway' }).click();
    await page.getByText('“The charger travels in the van”').waitFor();
    await page.getByText(/Signed off by Factory lead/).waitFor();
    await shot(page, 'checks-run-signed-off-phone');
  } finally {
    await context.close();
  }
});

it('quick taps on two tablets all land, and a tick and an un-tick of one item end the same on both', async () => {
  const [a, b] = await Promise.all([
    openPage(harness.browser, TABLET, ana.email, ana.password, `/checks/runs/${postMatchRunId}`),
    openPage(harness.browser, TABLET, team.emails.crew, PASSWORD, `/checks/runs/${postMatchRunId}`),
  ]);
  try {
    const labels = ['Robot back on the cart', 'Battery out', 'Bumpers off', 'Air released', 'Driver notes taken', 'Damage looked over'];
    for (const page of [a.page, b.page]) await page.getByRole('checkbox', { name: labels[0] }).waitFor();
    // Each tablet taps three different items as fast as it can, both at once.
    await Promise.all([
      (async () => { for (const label of labels.slice(0, 3)) await a.page.getByRole('checkbox', { name: label }).click(); })(),
      (async () => { for (const label of labels.slice(3)) await b.page.getByRole('checkbox', { name: label }).click(); })(),
    ]);
    const states = (page: Page) => Promise.all(labels.map((label) => page.getByRole('checkbox', { name: label }).getAttribute('aria-checked')));
    for (const page of [a.page, b.page]) await expect.poll(() => states(page), { timeout: 10_000 }).toEqual(labels.map(() => 'true'));

    // Both tap the same item at once, one tablet twice: whatever order the server takes them in,
    // both tablets end on the value it kept.
    const itemA = a.page.getByRole('checkbox', { name: 'Bumpers off' });
    const itemB = b.page.getByRole('checkbox', { name: 'Bumpers off' });
    await Promise.all([itemA.click(), itemB.click(), itemB.click()]);
    await expect.poll(async () => {
      const [onA, onB] = await Promise.all([itemA.getAttribute('aria-checked'), itemB.getAttribute('aria-checked')]);
      const stored = (await lead.get(`/api/checklist-runs/${postMatchRunId}`)).body.items.find((item: { label: string }) => item.label === 'Bumpers off');
      return [onA, onB, String(stored.value === true)];
    }, { timeout: 10_000 }).toSatisfy(([onA, onB, server]: string[]) => onA === onB && onB === server);
  } finally {
    await Promise.all([a.context.close(), b.context.close()]);
  }
});

it('a tick the server refuses is taken back, with the reason next to the item', async () => {
  const { context, page } = await openPage(harness.browser, TABLET, ana.email, ana.password, `/checks/runs/${inspectionRunId}`);
  try {
    const tick = page.getByRole('checkbox', { name: 'Frame perimeter within the rules' });
    await tick.waitFor();
    // A mentor makes Ana a viewer while her tablet still shows the run as markable.
    expect((await admin.patch(`/api/team/members/${ana.membershipId}`, { roles: ['viewer'] })).status).toBe(200);
    await tick.click();
    const row = page.locator('li', { has: tick });
    await row.getByText('Not saved: Your role does not allow this').waitFor();
    expect(await tick.getAttribute('aria-checked')).toBe('false');
    await shot(page, 'checks-refused-tick-tablet');
  } finally {
    await context.close();
  }
});
