import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import sharp from 'sharp';
import type { Page } from 'playwright-core';
import type { RepairDetailJson, SubsystemsJson } from '../../shared/schemas/repairs';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, fillSignIn, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { makeRepair } from '../support/repairs';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let crew: SignedIn;
let lead: SignedIn;

beforeAll(async () => {
  team = await makeTeam();
  crew = await signIn(harness.app, team.emails.crew, PASSWORD);
  lead = await signIn(harness.app, team.emails.lead, PASSWORD);
});

async function withPage(viewport: { width: number; height: number }, test: (page: Page) => Promise<void>, email = team.emails.crew) {
  const context = await harness.browser.newContext({ viewport, hasTouch: true });
  try {
    const page = await context.newPage();
    await fillSignIn(page, harness.baseUrl, email, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await test(page);
  } finally {
    await context.close();
  }
}

async function onServer(id: string): Promise<RepairDetailJson> {
  const answer = await crew.get(`/api/repairs/${id}`);
  expect(answer.status).toBe(200);
  return answer.body as RepairDetailJson;
}

it('an edit saved over another person’s newer version shows theirs beside mine, keeps my text, and Keep mine saves only my fields', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Intake belt slips', subsystem: 'intake', severity: 'degraded' });
  await withPage({ width: 390, height: 844 }, async (page) => {
    await page.goto(`${harness.baseUrl}/repairs/${ticket.id}`);
    await page.getByRole('heading', { level: 1, name: 'Intake belt slips' }).waitFor();
    await page.getByRole('button', { name: 'Edit the ticket' }).click();
    await page.getByLabel('Description').fill('Belt tension screw backed out; needs threadlocker.');
    await page.getByLabel('Parts used').fill('Threadlocker\nM4 screw');

    // Meanwhile a lead renames it and makes it blocking.
    const theirs = await lead.patch(`/api/repairs/${ticket.id}`, { version: ticket.version, title: 'Intake belt slips off', severity: 'blocks_match' });
    expect(theirs.status).toBe(200);

    await page.getByRole('button', { name: 'Save changes' }).click();
    const notice = page.getByRole('alert').filter({ hasText: 'Someone else changed this ticket' });
    await notice.waitFor();
    await notice.getByRole('row', { name: /Title.*Intake belt slips off.*Intake belt slips/ }).waitFor();
    await notice.getByRole('row', { name: /Severity.*Blocks match.*Degraded/ }).waitFor();
    // The text typed here is still in the form.
    expect(await page.getByLabel('Description').inputValue()).toBe('Belt tension screw backed out; needs threadlocker.');
    await notice.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'repairs-ticket-stale-phone.png') });

    await notice.getByRole('button', { name: 'Keep mine' }).click();
    await page.getByRole('button', { name: 'Edit the ticket' }).waitFor();
  });
  const saved = await onServer(ticket.id);
  // Mine: the description and parts. Theirs: the title and severity, which this form did not change.
  expect(saved).toMatchObject({
    title: 'Intake belt slips off',
    severity: 'blocks_match',
    description: 'Belt tension screw backed out; needs threadlocker.',
    partsUsed: ['Threadlocker', 'M4 screw'],
    version: ticket.version + 2,
  });
});

it('moving a ticket to Done by button asks how it was fixed, and the history says who moved it', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Camera mount loose', subsystem: 'software', severity: 'cosmetic' });
  await withPage({ width: 800, height: 1280 }, async (page) => {
    await page.goto(`${harness.baseUrl}/repairs/${ticket.id}`);
    await page.getByRole('heading', { level: 1, name: 'Camera mount loose' }).waitFor();
    await page.getByRole('button', { name: 'Move to In progress' }).click();
    await page.getByText('Factory crew moved it from Reported to In progress').waitFor();

    await page.getByRole('button', { name: 'Move to Done' }).click();
    const dialog = page.getByRole('dialog', { name: 'Done: ‘Camera mount loose’' });
    await dialog.getByLabel('How was it fixed? (optional)').fill('Tightened the two mount screws.');
    await dialog.getByLabel('Time spent in minutes').fill('6');
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'repairs-ticket-done-tablet.png') });
    await dialog.getByRole('button', { name: 'Move to Done' }).click();
    await page.getByText('Factory crew moved it from In progress to Done').waitFor();
    await page.getByText('Tightened the two mount screws.').waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'repairs-ticket-tablet.png'), fullPage: true });
  });
  const done = await onServer(ticket.id);
  expect(done).toMatchObject({ status: 'done', resolutionNote: 'Tightened the two mount screws.', timeSpentMinutes: 6 });
  expect(done.doneAt).not.toBeNull();
  expect(done.history.filter((change) => change.kind === 'moved')).toHaveLength(2);
});

it('a photo taken on the ticket page shows as a thumbnail, and its uploader removes it again', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Pneumatic fitting hisses', subsystem: 'pneumatics', severity: 'degraded' });
  const photo = await sharp({ create: { width: 400, height: 300, channels: 3, background: '#2b6cb0' } }).jpeg().toBuffer();
  await withPage({ width: 800, height: 1280 }, async (page) => {
    await page.goto(`${harness.baseUrl}/repairs/${ticket.id}`);
    await page.getByText('No photos yet.').waitFor();
    await page.getByLabel('Add a photo').setInputFiles({ name: 'fitting.jpg', mimeType: 'image/jpeg', buffer: photo });
    const thumb = page.getByRole('img', { name: 'Photo 1 of ‘Pneumatic fitting hisses’, added by Factory crew' });
    await thumb.waitFor();
    await expect.poll(() => thumb.evaluate((image: HTMLImageElement) => image.complete && image.naturalWidth)).toBeGreaterThan(0);
    await page.getByText('Factory crew added a photo').waitFor();
    expect((await onServer(ticket.id)).photos).toHaveLength(1);

    await page.getByRole('button', { name: 'Remove photo 1 of ‘pneumatic fitting hisses’' }).click();
    await page.getByRole('dialog', { name: 'Remove this photo?' }).getByRole('button', { name: 'Remove photo' }).click();
    await page.getByText('No photos yet.').waitFor();
    await page.getByText('Factory crew removed a photo').waitFor();
  });
  expect((await onServer(ticket.id)).photos).toHaveLength(0);
});

it('a lead adds, renames and reorders subsystems, and the report form offers them in that order', async () => {
  await withPage(
    { width: 800, height: 1280 },
    async (page) => {
      await page.goto(`${harness.baseUrl}/repairs`);
      await page.getByRole('link', { name: 'Subsystems' }).click();
      await page.getByRole('heading', { name: 'Subsystems' }).waitFor();
      await page.getByLabel('Subsystem 10').fill('Misc');
      await page.getByRole('button', { name: 'Add a subsystem' }).click();
      // The new row's field has the focus.
      await page.keyboard.type('Climber');
      await page.getByRole('button', { name: 'Move ‘Climber’', exact: true }).focus();
      await page.keyboard.press('Space');
      await page.getByText('Picked up ‘Climber’, at position 11 of 11.').waitFor({ state: 'attached' });
      await page.evaluate(() => new Promise((resolve) => setTimeout(resolve, 50)));
      await page.keyboard.press('ArrowUp');
      // Dropping before the sensor has found the new place would drop it where it was.
      await page.getByText('‘Climber’ would go to position 10 of 11.').waitFor({ state: 'attached' });
      await page.keyboard.press('Space');
      await page.getByText('Moved ‘Climber’ to position 10 of 11.').waitFor({ state: 'attached' });
      await page.getByRole('button', { name: 'Save the list' }).click();
      await page.getByText('Saved.').waitFor();

      await page.goto(`${harness.baseUrl}/repairs/new`);
      const tiles = page.getByRole('group', { name: 'Subsystem' }).getByRole('radio');
      await expect.poll(() => tiles.count()).toBe(11);
      expect(await page.getByRole('group', { name: 'Subsystem' }).locator('label').allInnerTexts()).toEqual([
        'Drivetrain',
        'Intake',
        'Elevator',
        'Arm',
        'End effector',
        'Electrical',
        'Pneumatics',
        'Software',
        'Bumpers',
        'Climber',
        'Misc',
      ]);
    },
    team.emails.lead,
  );
  const saved = (await crew.get('/api/team/repair-subsystems')).body as SubsystemsJson;
  expect(saved.subsystems.slice(-2)).toEqual([
    { key: 'climber', label: 'Climber' },
    // Renamed, the key stays: tickets filed under "other" keep their subsystem.
    { key: 'other', label: 'Misc' },
  ]);
});

it('after a move by button the focus stays among the move buttons (the pressed one is gone) and the move is announced', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Shooter flywheel wobbles', subsystem: 'arm', severity: 'degraded' });
  await withPage({ width: 1280, height: 800 }, async (page) => {
    await page.goto(`${harness.baseUrl}/repairs/${ticket.id}`);
    await page.getByRole('heading', { level: 1, name: 'Shooter flywheel wobbles' }).waitFor();
    await page.getByRole('button', { name: 'Move to In progress' }).focus();
    await page.keyboard.press('Enter');
    await page.getByRole('status').filter({ hasText: 'Moved to In progress.' }).waitFor();
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.closest('section[aria-label="Move to another column"]') !== null && document.activeElement?.tagName === 'BUTTON'))
      .toBe(true);
  });
  expect((await onServer(ticket.id)).status).toBe('in_progress');
});
