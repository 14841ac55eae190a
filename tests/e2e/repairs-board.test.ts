import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import sharp from 'sharp';
import type { Browser, Page } from 'playwright-core';
import type { RepairDetailJson, RepairJson } from '../../shared/schemas/repairs';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, fillSignIn, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { boardOf, makeRepair } from '../support/repairs';
import { matchBody } from '../support/schedule';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let crew: SignedIn;

const TABLET = { width: 800, height: 1280 };
const DESKTOP = { width: 1280, height: 800 };
const minutesFromNow = (minutes: number) => new Date(Date.now() + minutes * 60_000).toISOString();

beforeAll(async () => {
  team = await makeTeam();
  crew = await signIn(harness.app, team.emails.crew, PASSWORD);
  const lead = await signIn(harness.app, team.emails.lead, PASSWORD);
  // One match of ours ahead, so that the cards count minutes to its queue call.
  const ours = matchBody({ number: 1, scheduledStart: minutesFromNow(90), red: [team.team.number, 21002, 21003] });
  expect((await lead.post(`/api/events/${team.event.id}/matches`, ours)).status).toBe(201);
});

async function openPage(browser: Browser, viewport: { width: number; height: number }, at: string, email = team.emails.crew) {
  const context = await browser.newContext({ viewport, hasTouch: viewport.width < 1024 });
  const page = await context.newPage();
  await fillSignIn(page, harness.baseUrl, email, PASSWORD);
  await page.getByText('Live', { exact: true }).waitFor();
  await page.goto(`${harness.baseUrl}${at}`);
  // The socket is signed in again after the page load: changes from now on reach the page.
  await page.getByText('Live', { exact: true }).waitFor();
  return { context, page };
}

const column = (page: Page, name: string) => page.getByRole('region', { name, exact: true });
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SCREENSHOT_DIR, name), fullPage: true });

async function ticketOnServer(id: string): Promise<RepairDetailJson> {
  const answer = await crew.get(`/api/repairs/${id}`);
  expect(answer.status).toBe(200);
  return answer.body as RepairDetailJson;
}

it('a card dragged from Reported to In progress with the mouse moves on the server and on a second tablet, live', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Arm chain off', subsystem: 'arm', severity: 'blocks_match', estimateMinutes: 15 });
  const other = await makeRepair(crew, team.event.id, { title: 'Intake roller rubs the bumper', subsystem: 'intake', severity: 'degraded' });
  const one = await openPage(harness.browser, DESKTOP, '/repairs');
  const two = await openPage(harness.browser, DESKTOP, '/repairs');
  try {
    await column(one.page, 'Reported').getByRole('link', { name: 'Arm chain off' }).waitFor();
    await column(two.page, 'Reported').getByRole('link', { name: 'Arm chain off' }).waitFor();
    await column(one.page, 'Reported').getByText(/min to queue/).first().waitFor();
    await shot(one.page, 'repairs-board-desktop.png');

    const handle = one.page.getByRole('button', { name: 'Move ‘Arm chain off’' });
    const from = (await handle.boundingBox())!;
    const to = (await column(one.page, 'In progress').boundingBox())!;
    await one.page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await one.page.mouse.down();
    // In steps: the sensor waits for a few pixels of movement before it lifts the card.
    await one.page.mouse.move(to.x + to.width / 2, to.y + 120, { steps: 16 });
    // Where it will land shows while it is held over the column.
    await one.page.locator('[data-column="in_progress"] [data-lands-here]').waitFor({ state: 'attached' });
    await one.page.screenshot({ path: path.join(SCREENSHOT_DIR, 'repairs-board-dragging-desktop.png') });
    await one.page.mouse.up();

    await column(one.page, 'In progress').getByRole('link', { name: 'Arm chain off' }).waitFor();
    await expect.poll(async () => (await ticketOnServer(ticket.id)).status).toBe('in_progress');
    const moved = await ticketOnServer(ticket.id);
    expect(moved.version).toBe(ticket.version + 1);
    // The crew's drop lets urgency place it; only leads place by hand.
    expect(moved.placedByHand).toBe(false);
    expect(moved.history[0]).toMatchObject({ kind: 'moved', changes: { status: ['reported', 'in_progress'] } });
    // The other card was not touched.
    expect((await ticketOnServer(other.id)).version).toBe(other.version);

    // The second tablet follows without a reload.
    await column(two.page, 'In progress').getByRole('link', { name: 'Arm chain off' }).waitFor({ timeout: 10_000 });
    expect(await column(two.page, 'Reported').getByRole('link', { name: 'Arm chain off' }).count()).toBe(0);
    await shot(two.page, 'repairs-board-after-move-desktop.png');
  } finally {
    await one.context.close();
    await two.context.close();
  }
});

it('a card moves with the keyboard: Space on its handle, an arrow to the next column, Space', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Loose zip ties on the board', subsystem: 'electrical', severity: 'cosmetic' });
  const { context, page } = await openPage(harness.browser, DESKTOP, '/repairs');
  try {
    const handle = page.getByRole('button', { name: 'Move ‘Loose zip ties on the board’' });
    await handle.focus();
    await page.keyboard.press('Space');
    await page.getByText(/^Picked up ticket Loose zip ties on the board in Reported, position \d+ of \d+\.$/).waitFor({ state: 'attached' });
    // The keyboard sensor listens for arrows a tick after the lift (a setTimeout in @dnd-kit).
    await page.evaluate(() => new Promise((resolve) => setTimeout(resolve, 50)));
    await page.keyboard.press('ArrowRight');
    await page.getByText(/^Moved Loose zip ties on the board to In progress, position \d+ of \d+\.$/).waitFor({ state: 'attached' });
    await page.keyboard.press('Space');
    await page.getByText(/^Loose zip ties on the board dropped in In progress, position \d+ of \d+\.$/).waitFor({ state: 'attached' });

    await expect.poll(async () => (await ticketOnServer(ticket.id)).status).toBe('in_progress');
    const board = await boardOf(crew, team.event.id);
    const inProgress = board.repairs.filter((repair) => repair.status === 'in_progress').map((repair) => repair.title);
    expect(inProgress).toContain('Loose zip ties on the board');
    // A cosmetic ticket goes below the blocking one (urgency), on the server as on the page.
    expect(inProgress.indexOf('Arm chain off')).toBeLessThan(inProgress.indexOf('Loose zip ties on the board'));
    const titles = await column(page, 'In progress').getByRole('heading', { level: 3 }).allInnerTexts();
    expect(titles).toEqual(inProgress);
    // The focus stays on the handle, to move it on.
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe('Move ‘Loose zip ties on the board’');
  } finally {
    await context.close();
  }
});

it('on a tablet, a finger held on the handle drags a card into Needs test; a quick swipe over it moves nothing', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Elevator cable frayed', subsystem: 'elevator', severity: 'degraded' });
  const { context, page } = await openPage(harness.browser, TABLET, '/repairs');
  try {
    const cdp = await context.newCDPSession(page);
    const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', x: number, y: number) =>
      cdp.send('Input.dispatchTouchEvent', { type, touchPoints: type === 'touchEnd' ? [] : [{ x, y }] });
    const slide = async (from: { x: number; y: number }, to: { x: number; y: number }) => {
      for (let step = 1; step <= 12; step += 1) await touch('touchMove', from.x + ((to.x - from.x) * step) / 12, from.y + ((to.y - from.y) * step) / 12);
      await touch('touchEnd', to.x, to.y);
    };
    // Measured each time: the swipe scrolls the page.
    const handleMiddle = async () => {
      const handle = page.getByRole('button', { name: 'Move ‘Elevator cable frayed’' });
      await handle.scrollIntoViewIfNeeded();
      const box = (await handle.boundingBox())!;
      return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    };

    // A swipe up that starts on the handle at once is a scroll, not a drag: nothing moves.
    const swipeFrom = await handleMiddle();
    await touch('touchStart', swipeFrom.x, swipeFrom.y);
    await slide(swipeFrom, { x: swipeFrom.x, y: swipeFrom.y - 200 });
    await page.waitForTimeout(500);
    expect((await ticketOnServer(ticket.id)).status).toBe('reported');

    // Held still past the sensor's delay, then moved across: the card goes.
    const start = await handleMiddle();
    const target = (await column(page, 'Needs test').boundingBox())!;
    await touch('touchStart', start.x, start.y);
    await page.waitForTimeout(400);
    await slide(start, { x: target.x + target.width / 2, y: start.y });
    await column(page, 'Needs test').getByRole('link', { name: 'Elevator cable frayed' }).waitFor();
    await expect.poll(async () => (await ticketOnServer(ticket.id)).status).toBe('needs_test');
  } finally {
    await context.close();
  }
});

it('a lead drags a cosmetic card above a degraded one in its column, and it stays there, placed by hand', async () => {
  const upper = await makeRepair(crew, team.event.id, { title: 'Wheel hub bolt loose', subsystem: 'drivetrain', severity: 'degraded' });
  const lower = await makeRepair(crew, team.event.id, { title: 'Scratched side panel', subsystem: 'other', severity: 'cosmetic' });
  const reported = async () => (await boardOf(crew, team.event.id)).repairs.filter((repair) => repair.status === 'reported').map((repair) => repair.title);
  // Urgency puts the cosmetic card below the degraded one.
  const before = await reported();
  expect(before.indexOf('Scratched side panel')).toBeGreaterThan(before.indexOf('Wheel hub bolt loose'));
  // Tall enough that both cards are in view without scrolling: the drag goes by screen position.
  const { context, page } = await openPage(harness.browser, { width: 1280, height: 1600 }, '/repairs', team.emails.lead);
  try {
    const from = (await page.getByRole('button', { name: 'Move ‘Scratched side panel’' }).boundingBox())!;
    const card = (await column(page, 'Reported').locator(`[data-repair-card="${upper.id}"]`).boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await page.mouse.down();
    // Up by the distance between the two cards' tops and a little more: its middle is then above the other's.
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2 - (from.y - card.y) - 40, { steps: 16 });
    await page.locator('[data-column="reported"] [data-lands-here]').waitFor({ state: 'attached' });
    await page.mouse.up();

    await expect.poll(async () => (await ticketOnServer(lower.id)).placedByHand).toBe(true);
    const after = await reported();
    expect(after.indexOf('Scratched side panel')).toBe(after.indexOf('Wheel hub bolt loose') - 1);
    expect((await ticketOnServer(lower.id)).history[0]).toMatchObject({ kind: 'placed' });
    await column(page, 'Reported').locator(`[data-repair-card="${lower.id}"]`).getByText('Placed here by a lead').waitFor();
    // The page shows the server's order.
    const titles = await column(page, 'Reported').getByRole('heading', { level: 3 }).allInnerTexts();
    expect(titles).toEqual(after);
  } finally {
    await context.close();
  }
});

it('on a tablet, a problem is reported from the board in two taps, with a photo from the camera, and its card shows the thumbnail', async () => {
  const photo = await sharp({ create: { width: 320, height: 240, channels: 3, background: '#b45309' } }).png().toBuffer();
  const { context, page } = await openPage(harness.browser, TABLET, '/');
  try {
    await page.getByRole('link', { name: 'Report a problem' }).tap();
    await page.getByRole('heading', { name: 'Report a problem' }).waitFor();
    // Our next match is the default "found in" before we have played any.
    expect(await page.getByLabel('Found in').inputValue()).not.toBe('');

    await page.getByLabel('What is wrong?').fill('Bumper bolt sheared');
    // Big tiles: the word is the target.
    await page.getByRole('group', { name: 'Subsystem' }).getByText('Bumpers', { exact: true }).tap();
    await page.getByRole('group', { name: 'How bad is it?' }).getByText('Blocks match', { exact: true }).tap();
    expect(await page.getByRole('radio', { name: 'Bumpers' }).isChecked()).toBe(true);
    await page.getByLabel('Estimate in minutes (optional)').fill('10');
    // The camera on a tablet: accept="image/*" capture="environment".
    const input = page.getByLabel('Take a photo');
    expect(await input.getAttribute('accept')).toBe('image/*');
    expect(await input.getAttribute('capture')).toBe('environment');
    await input.setInputFiles({ name: 'bumper.png', mimeType: 'image/png', buffer: photo });
    await page.locator('canvas[data-drawn="true"]').waitFor();
    await shot(page, 'repairs-report-tablet.png');

    await page.getByRole('button', { name: 'Report the problem' }).tap();
    await page.waitForURL(`${harness.baseUrl}/repairs`);
    const card = page.locator('[data-repair-card]', { has: page.getByRole('link', { name: 'Bumper bolt sheared' }) });
    await card.waitFor();
    expect(await column(page, 'Reported').getByRole('link', { name: 'Bumper bolt sheared' }).count()).toBe(1);
    const thumb = card.locator('img');
    await expect.poll(() => thumb.evaluate((image: HTMLImageElement) => image.complete && image.naturalWidth)).toBeGreaterThan(0);
    await card.getByText('1 photo').waitFor();
    await shot(page, 'repairs-board-tablet.png');

    // On the server: one ticket (the form's id), its photo and a thumbnail.
    const board = await boardOf(crew, team.event.id);
    const reported = (board.repairs as RepairJson[]).filter((repair) => repair.title === 'Bumper bolt sheared');
    expect(reported).toHaveLength(1);
    expect(reported[0]).toMatchObject({ status: 'reported', subsystem: 'bumpers', severity: 'blocks_match', estimateMinutes: 10, photoCount: 1 });
    expect(reported[0].reporter.displayName).toBe('Factory crew');
    expect(reported[0].foundInMatchId).not.toBeNull();
    expect(reported[0].coverThumbUrl).not.toBeNull();
    const thumbnail = await crew.get(reported[0].coverThumbUrl!);
    expect(thumbnail.status).toBe(200);
    expect(thumbnail.headers['content-type']).toBe('image/webp');
    expect(await thumb.getAttribute('src')).toBe(reported[0].coverThumbUrl);
  } finally {
    await context.close();
  }
});

it('a move based on an old version is not made: the card shows where the other person left it, and the move can be made from there', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Radio light blinking', subsystem: 'electrical', severity: 'degraded' });
  const context = await harness.browser.newContext({ viewport: DESKTOP });
  try {
    const page = await context.newPage();
    await fillSignIn(page, harness.baseUrl, team.emails.crew, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    // This tablet hears nothing (its socket is cut), so it moves the card on the version it loaded.
    await page.route('**/socket.io/**', (route) => route.abort());
    await page.goto(`${harness.baseUrl}/repairs`);
    await column(page, 'Reported').getByRole('link', { name: 'Radio light blinking' }).waitFor();

    // Meanwhile, on another tablet:
    const lead = await signIn(harness.app, team.emails.lead, PASSWORD);
    const theirs = await lead.patch(`/api/repairs/${ticket.id}`, { version: ticket.version, status: 'needs_test' });
    expect(theirs.status).toBe(200);

    await page.getByRole('button', { name: 'Move ‘Radio light blinking’' }).focus();
    await page.keyboard.press('Space');
    await page.getByText(/^Picked up ticket Radio light blinking/).waitFor({ state: 'attached' });
    await page.evaluate(() => new Promise((resolve) => setTimeout(resolve, 50)));
    await page.keyboard.press('ArrowRight');
    await page.getByText(/^Moved Radio light blinking to In progress/).waitFor({ state: 'attached' });
    await page.keyboard.press('Space');

    const notice = page.getByRole('alert').filter({ hasText: 'Someone else moved or changed ‘Radio light blinking’ first; it is now in Needs test. Your move was not made.' });
    await notice.waitFor();
    await column(page, 'Needs test').getByRole('link', { name: 'Radio light blinking' }).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'repairs-board-stale-move-desktop.png') });
    // Nothing was overwritten: the other person's move stands.
    expect((await ticketOnServer(ticket.id)).status).toBe('needs_test');

    await notice.getByRole('button', { name: 'Move it to In progress now' }).click();
    await column(page, 'In progress').getByRole('link', { name: 'Radio light blinking' }).waitFor();
    await expect.poll(async () => (await ticketOnServer(ticket.id)).status).toBe('in_progress');
    expect((await ticketOnServer(ticket.id)).version).toBe(ticket.version + 2);
  } finally {
    await context.close();
  }
});

it('two cards moved one after the other while the first move is still on its way both finish saving: neither stays stuck', async () => {
  const first = await makeRepair(crew, team.event.id, { title: 'Gear guard cracked', subsystem: 'drivetrain', severity: 'degraded' });
  const second = await makeRepair(crew, team.event.id, { title: 'Camera mount loose', subsystem: 'software', severity: 'cosmetic' });
  const { context, page } = await openPage(harness.browser, DESKTOP, '/repairs');
  try {
    // Arena Wi-Fi: the first move's answer is slow to come.
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(`**/api/repairs/${first.id}`, async (route) => {
      if (route.request().method() === 'PATCH') await held;
      await route.continue();
    });
    const moveRight = async (title: string) => {
      await page.getByRole('button', { name: `Move ‘${title}’` }).focus();
      await page.keyboard.press('Space');
      await page.getByText(new RegExp(`^Picked up ticket ${title}`)).waitFor({ state: 'attached' });
      await page.evaluate(() => new Promise((resolve) => setTimeout(resolve, 50)));
      await page.keyboard.press('ArrowRight');
      await page.getByText(new RegExp(`^Moved ${title} to In progress`)).waitFor({ state: 'attached' });
      await page.keyboard.press('Space');
    };
    const card = (id: string) => page.locator(`[data-repair-card="${id}"]`);

    await moveRight('Gear guard cracked');
    await card(first.id).getByText('Saving the move…').waitFor();
    await moveRight('Camera mount loose');
    await expect.poll(async () => (await ticketOnServer(second.id)).status).toBe('in_progress');
    await card(second.id).getByText('Saving the move…').waitFor({ state: 'detached' });

    release();
    await expect.poll(async () => (await ticketOnServer(first.id)).status).toBe('in_progress');
    await column(page, 'In progress').getByRole('link', { name: 'Gear guard cracked' }).waitFor();
    // The first card's move is confirmed: no spinner left, and its handle works again.
    await card(first.id).getByText('Saving the move…').waitFor({ state: 'detached', timeout: 5_000 });
    expect(await page.getByRole('button', { name: 'Move ‘Gear guard cracked’' }).getAttribute('aria-disabled')).toBeNull();
  } finally {
    await context.close();
  }
});

it('a move the server refuses goes back where it was and stays there, even after the board is read again', async () => {
  const ticket = await makeRepair(crew, team.event.id, { title: 'Limit switch wire cut', subsystem: 'electrical', severity: 'degraded' });
  const { context, page } = await openPage(harness.browser, DESKTOP, '/repairs');
  try {
    await page.route(`**/api/repairs/${ticket.id}`, (route) =>
      route.request().method() === 'PATCH'
        ? route.fulfill({ status: 500, contentType: 'application/json', body: JSON.stringify({ error: { code: 'internal', message: 'Something went wrong on the server.' } }) })
        : route.continue(),
    );
    await page.getByRole('button', { name: 'Move ‘Limit switch wire cut’' }).focus();
    await page.keyboard.press('Space');
    await page.getByText(/^Picked up ticket Limit switch wire cut/).waitFor({ state: 'attached' });
    await page.evaluate(() => new Promise((resolve) => setTimeout(resolve, 50)));
    await page.keyboard.press('ArrowRight');
    await page.getByText(/^Moved Limit switch wire cut to In progress/).waitFor({ state: 'attached' });
    await page.keyboard.press('Space');

    await page.getByRole('alert').filter({ hasText: '‘Limit switch wire cut’ was not moved to In progress. It is back where it was.' }).waitFor();
    // The notice comes once the board has been read again after the refusal: the card is in Reported, as on the server.
    await column(page, 'Reported').getByRole('link', { name: 'Limit switch wire cut' }).waitFor();
    expect(await column(page, 'In progress').getByRole('link', { name: 'Limit switch wire cut' }).count()).toBe(0);
    expect((await ticketOnServer(ticket.id)).status).toBe('reported');
  } finally {
    await context.close();
  }
});
