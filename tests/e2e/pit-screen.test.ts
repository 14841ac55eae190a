import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { matchBody } from '../support/schedule';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let admin: SignedIn;
let token: string;
let screenId: string;
const minutesFromNow = (minutes: number) => new Date(Date.now() + minutes * 60_000).toISOString();

beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(harness.app, team.emails.admin, PASSWORD);
  const lead = await signIn(harness.app, team.emails.lead, PASSWORD);
  const us = team.team.number;
  const url = `/api/events/${team.event.id}/matches`;
  expect((await lead.post(url, matchBody({ number: 1, scheduledStart: minutesFromNow(20) }))).status).toBe(201);
  expect((await lead.post(url, matchBody({ number: 2, scheduledStart: minutesFromNow(27), red: [us, 21002, 21003] }))).status).toBe(201);
  expect((await lead.post(url, matchBody({ number: 9, scheduledStart: minutesFromNow(41), blue: [21004, us, 21006] }))).status).toBe(201);
  const screen = await admin.post('/api/team/screens', { name: 'Pit TV' });
  expect(screen.status).toBe(201);
  token = screen.body.token;
  screenId = screen.body.id;
});

it('a TV opens the screen link without signing in, sees the team and our next match, and goes blank when revoked', async () => {
  const context = await harness.browser.newContext({ viewport: { width: 1920, height: 1080 } });
  try {
    const page = await context.newPage();
    await page.goto(`${harness.baseUrl}/screen/${token}`);
    await page.getByRole('heading', { level: 1, name: `${team.team.number} ${team.team.name}` }).waitFor();
    await page.getByText(team.event.name).waitFor();
    await page.getByRole('heading', { name: 'Qualification 2' }).waitFor();
    await page.getByText('RED', { exact: true }).waitFor();
    await page.getByText('Live', { exact: true }).waitFor();
    await expect.poll(() => page.getByText('Qualification 9').count()).toBe(1);
    expect(await context.cookies()).toEqual([]);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'pit-screen-tv.png') });

    expect((await admin.delete(`/api/team/screens/${screenId}`)).status).toBe(204);
    await page.getByText('This screen link was revoked or is wrong — ask a mentor for a new one').waitFor({ timeout: 15_000 });
  } finally {
    await context.close();
  }
});

it('the pit screen hears a battery go into the robot at once, not at its next minute refresh', async () => {
  const own = await makeTeam();
  const ownAdmin = await signIn(harness.app, own.emails.admin, PASSWORD);
  const ours = await ownAdmin.post(`/api/events/${own.event.id}/matches`, matchBody({ number: 1, scheduledStart: minutesFromNow(30), red: [own.team.number, 21002, 21003] }));
  expect(ours.status).toBe(201);
  const battery = await ownAdmin.post('/api/batteries', { label: 'TV', yearInService: 2026 });
  expect(battery.status).toBe(201);
  const screen = await ownAdmin.post('/api/team/screens', { name: 'Pit TV' });
  expect(screen.status).toBe(201);

  const context = await harness.browser.newContext({ viewport: { width: 1920, height: 1080 } });
  try {
    const page = await context.newPage();
    await page.goto(`${harness.baseUrl}/screen/${screen.body.token}`);
    await page.getByText('Live', { exact: true }).waitFor();
    const notInstalled = page.getByText('No battery is recorded as installed for this match');
    await notInstalled.waitFor();
    expect((await ownAdmin.post(`/api/batteries/${battery.body.id}/uses`, { matchId: ours.body.id })).status).toBe(201);
    // Well inside the screen's one-minute refresh: only the 'batteries:used' message can do it.
    await expect.poll(() => notInstalled.count(), { timeout: 10_000 }).toBe(0);
  } finally {
    await context.close();
  }
});
