import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import type { BatteryJson, BatteryPlanJson } from '../../shared/schemas/batteries';
import { signIn, type SignedIn } from '../support/app';
import { logReading, makeBattery, makeCharger } from '../support/batteries';
import { browserHarness, fillSignIn, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { matchBody } from '../support/schedule';

const harness = browserHarness();
const TABLET = { width: 800, height: 1280 };
const PHONE = { width: 390, height: 844 };
// The factories' events are in Berlin; the tablets are too, so every clock on screen reads one way.
const TIME_ZONE = 'Europe/Berlin';

const minutesFromNow = (minutes: number) => new Date(Date.now() + minutes * 60_000).toISOString();
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });

/** "2:05 PM" as the page writes a wall-clock time (date-fns `h:mm a`, en-US) in the event's zone. */
const wallClock = (at: string) =>
  new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit', timeZone: TIME_ZONE }).format(new Date(at)).replace(/\s/g, ' ');

type Team = Awaited<ReturnType<typeof makeTeam>>;

/** A battery with one rested reading at these volts (BCI: 12.65 V and up is full). */
async function addBattery(admin: SignedIn, label: string, voltage: number) {
  const battery = await makeBattery(admin, { label });
  await logReading(admin, battery.id, { voltage });
  return battery;
}

async function addMatch(lead: SignedIn, team: Team, number: number, startsInMinutes: number, ours: boolean) {
  const seats = ours ? { red: [team.team.number, 21002, 21003] } : {};
  const made = await lead.post(`/api/events/${team.event.id}/matches`, matchBody({ number, scheduledStart: minutesFromNow(startsInMinutes), ...seats }));
  expect(made.status, JSON.stringify(made.body)).toBe(201);
  return made.body as { id: string };
}

async function openPage(browser: Browser, viewport: { width: number; height: number }, email: string, at: string) {
  const context = await browser.newContext({ viewport, hasTouch: true, locale: 'en-US', timezoneId: TIME_ZONE });
  const page = await context.newPage();
  await fillSignIn(page, harness.baseUrl, email, PASSWORD);
  await page.getByText('Live', { exact: true }).waitFor();
  await page.goto(`${harness.baseUrl}${at}`);
  await page.getByText('Live', { exact: true }).waitFor();
  return { context, page };
}

let team: Team;
let admin: SignedIn;
let batteries: Record<'A' | 'B' | 'C' | 'D', BatteryJson>;
let ourNext: string;

beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(harness.app, team.emails.admin, PASSWORD);
  const lead = await signIn(harness.app, team.emails.lead, PASSWORD);
  // Ours is the third match, about an hour away (queue call two matches before: 40 minutes away).
  await addMatch(lead, team, 1, 40, false);
  await addMatch(lead, team, 2, 47, false);
  ourNext = (await addMatch(lead, team, 3, 54, true)).id;
  await addMatch(lead, team, 4, 61, false);
  await addMatch(lead, team, 5, 95, true);
  // Full (BCI 12.65 V and up), half empty, full, and one retired.
  batteries = {
    A: await addBattery(admin, 'A', 12.8),
    B: await addBattery(admin, 'B', 12.3),
    C: await addBattery(admin, 'C', 12.75),
    D: await addBattery(admin, 'D', 12.7),
  };
  expect((await admin.patch(`/api/batteries/${batteries.D.id}`, { status: 'retired' })).status).toBe(200);
  await makeCharger(admin, { name: 'Bench charger', bays: 2, currentPerBayA: 6 });
});

it('prints one label per battery in service, each with a QR code of its page, and hides the navigation on paper', async () => {
  const { context, page } = await openPage(harness.browser, TABLET, team.emails.viewer, '/batteries/labels');
  try {
    const labels = page.getByRole('list', { name: 'Labels' }).locator('li[data-battery-id]');
    await expect.poll(() => labels.count()).toBe(3);
    // Each code is drawn (lazily) and carries the address it encodes.
    for (const label of ['A', 'B', 'C']) {
      const id = batteries[label as 'A' | 'B' | 'C'].id;
      const card = page.locator(`li[data-battery-id="${id}"]`);
      await card.getByText(`Battery ${label}`, { exact: true }).waitFor();
      await card.getByText(`Team ${team.team.number}`).waitFor();
      const code = card.getByRole('img', { name: `QR code to the page of battery ${label}` });
      await code.waitFor();
      expect(await code.getAttribute('data-value')).toBe(`${harness.baseUrl}/batteries/${id}`);
    }
    await shot(page, 'batteries-labels-tablet');

    await page.getByRole('checkbox', { name: /Include retired batteries/ }).check();
    await expect.poll(() => labels.count()).toBe(4);
    await page.getByRole('checkbox', { name: /Include retired batteries/ }).uncheck();
    await expect.poll(() => labels.count()).toBe(3);

    const nav = page.getByRole('navigation', { name: 'Main' });
    const signOut = page.getByRole('button', { name: 'Sign out' });
    expect(await nav.isVisible()).toBe(true);
    await page.emulateMedia({ media: 'print' });
    await expect.poll(() => nav.isVisible()).toBe(false);
    expect(await signOut.isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    expect(await labels.first().isVisible()).toBe(true);
    await shot(page, 'batteries-labels-print-tablet');
    await page.emulateMedia({ media: 'screen' });

    await page.setViewportSize(PHONE);
    await shot(page, 'batteries-labels-phone');
  } finally {
    await context.close();
  }
});

it('a battery handler puts a battery on a charger bay and sees when it will be done', async () => {
  const { context, page } = await openPage(harness.browser, TABLET, team.emails.battery, '/batteries');
  try {
    const chargers = page.getByRole('region', { name: 'Chargers' });
    // The charging cautions stand beside the bays.
    await chargers.getByText(/hydrogen/).waitFor();
    const bay = chargers.getByRole('listitem', { name: 'Bench charger · bay 1' });
    await bay.getByRole('button', { name: /Put a battery on/ }).click();
    await bay.getByLabel('Battery', { exact: true }).selectOption({ label: 'B' });
    await bay.getByRole('button', { name: 'Put it on' }).click();
    await bay.getByRole('link', { name: 'Battery B' }).waitFor();

    const list = (await admin.get('/api/batteries')).body as BatteryJson[];
    const session = list.find((battery) => battery.id === batteries.B.id)?.charging;
    expect(session).toMatchObject({ chargerId: expect.any(String), bay: 1, expectedEndAt: expect.any(String) });
    await bay.getByText(`at ${wallClock(session?.expectedEndAt as string)}`).waitFor();
    await bay.getByRole('button', { name: 'Take it off (battery B)' }).waitFor();
    await chargers.screenshot({ path: path.join(SCREENSHOT_DIR, 'batteries-plan-chargers-tablet.png') });

    await page.setViewportSize(PHONE);
    await chargers.screenshot({ path: path.join(SCREENSHOT_DIR, 'batteries-plan-chargers-phone.png') });
  } finally {
    await context.close();
  }
});

it("the plan gives our next match a battery, which the board's next-match card shows; installing it shows there too", async () => {
  const plan = (await admin.get(`/api/events/${team.event.id}/battery-plan`)).body as BatteryPlanJson;
  const assignment = plan.assignments.find((entry) => entry.matchId === ourNext);
  expect(assignment).toBeDefined();
  const label = Object.values(batteries).find((battery) => battery.id === assignment?.batteryId)?.label as string;
  const percent = `${Math.round(assignment?.expectedChargePercent as number)} % expected`;

  const { context, page } = await openPage(harness.browser, TABLET, team.emails.crew, '/batteries');
  try {
    const rotation = page.getByRole('region', { name: 'Rotation plan' });
    const row = rotation.locator(`li[data-match-id="${ourNext}"]`);
    await row.getByText(`Battery ${label}`, { exact: true }).waitFor();
    await row.getByText(percent).waitFor();
    await rotation.getByText('Charging', { exact: true }).waitFor();
    await rotation.screenshot({ path: path.join(SCREENSHOT_DIR, 'batteries-plan-tablet.png') });

    await page.goto(harness.baseUrl);
    const card = page.getByRole('region', { name: 'Battery for this match' });
    await card.getByText(`Battery ${label} — ${percent}`).waitFor();
    await card.getByText('Not in the robot yet').waitFor();
    await shot(page, 'batteries-plan-board-tablet');

    // The crew installs it from the plan; the plan and the board both say it is in.
    await page.goto(`${harness.baseUrl}/batteries`);
    await rotation.getByLabel('Battery for Qualification 3', { exact: true }).waitFor();
    expect(await rotation.getByLabel('Battery for Qualification 3', { exact: true }).inputValue()).toBe(assignment?.batteryId);
    await rotation.getByRole('button', { name: 'Install for this match' }).click();
    await row.getByText(`${label} in the robot`).waitFor();
    const inRobot = rotation.getByRole('list', { name: 'In the robot' });
    await inRobot.getByText('is in the robot for Qualification 3').waitFor();
    await page.setViewportSize(PHONE);
    await rotation.screenshot({ path: path.join(SCREENSHOT_DIR, 'batteries-plan-installed-phone.png') });

    await page.goto(harness.baseUrl);
    await card.getByText('In the robot', { exact: true }).waitFor();
    await shot(page, 'batteries-plan-board-phone');

    // Out again (say the wrong one went in): the plan no longer lists it as in the robot.
    await page.goto(`${harness.baseUrl}/batteries`);
    await inRobot.getByRole('button', { name: `Out of the robot (battery ${label})` }).click();
    await expect.poll(() => inRobot.count(), { timeout: 10_000 }).toBe(0);
    const after = (await admin.get(`/api/batteries/${assignment?.batteryId}`)).body as BatteryJson;
    expect(after.status).toBe('spent');
  } finally {
    await context.close();
  }
});

it('warns loudly, with the shortfall, when no battery will be ready for a match', async () => {
  // One battery and two matches of ours seven minutes apart: the second cannot have a full one.
  const small = await makeTeam();
  const smallAdmin = await signIn(harness.app, small.emails.admin, PASSWORD);
  await addMatch(smallAdmin, small, 1, 30, true);
  await addMatch(smallAdmin, small, 2, 37, true);
  await addBattery(smallAdmin, 'Solo', 12.8);
  await makeCharger(smallAdmin, { name: 'Travel charger', bays: 1, currentPerBayA: 2 });
  const plan = (await smallAdmin.get(`/api/events/${small.event.id}/battery-plan`)).body as BatteryPlanJson;
  const warning = plan.warnings.find((entry) => entry.code === 'no_battery_ready');
  expect(warning).toBeDefined();

  const { context, page } = await openPage(harness.browser, TABLET, small.emails.battery, '/batteries');
  try {
    const rotation = page.getByRole('region', { name: 'Rotation plan' });
    const card = rotation.getByRole('list', { name: 'Plan warnings' }).locator('[data-code="no_battery_ready"]');
    await card.getByText('No battery ready · Qualification 2').waitFor();
    if ((warning?.shortfallMinutes ?? 0) > 0) await card.getByText(`${warning?.shortfallMinutes} min short`).waitFor();
    await card.getByText(/Would help/).waitFor();
    await rotation.screenshot({ path: path.join(SCREENSHOT_DIR, 'batteries-plan-warning-tablet.png') });
    await page.setViewportSize(PHONE);
    await rotation.screenshot({ path: path.join(SCREENSHOT_DIR, 'batteries-plan-warning-phone.png') });
    await page.emulateMedia({ colorScheme: 'dark' });
    await rotation.screenshot({ path: path.join(SCREENSHOT_DIR, 'batteries-plan-warning-phone-dark.png') });
  } finally {
    await context.close();
  }
});
