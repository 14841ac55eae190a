import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { TemplateJson } from '../../shared/schemas/checks';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, fillSignIn, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';

// The tests run in order on one checklist: each starts from the version the one before saved.
const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let lead: SignedIn;

beforeAll(async () => {
  team = await makeTeam();
  lead = await signIn(harness.app, team.emails.lead, PASSWORD);
});

const TABLET = { viewport: { width: 800, height: 1280 }, hasTouch: true };
const PHONE = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true };

async function withPage(options: Parameters<typeof harness.browser.newContext>[0], email: string, test: (page: Page) => Promise<void>) {
  const context: BrowserContext = await harness.browser.newContext(options);
  try {
    const page = await context.newPage();
    await fillSignIn(page, harness.baseUrl, email, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await test(page);
  } finally {
    await context.close();
  }
}

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SCREENSHOT_DIR, name), fullPage: true });
const item = (page: Page, position: number) => page.getByRole('group', { name: `Item ${position}`, exact: true });
const labels = (template: TemplateJson) => template.items.map((entry) => entry.label);

async function templateNamed(name: string): Promise<TemplateJson> {
  const list = await lead.get('/api/checklist-templates');
  expect(list.status).toBe(200);
  const found = (list.body as TemplateJson[]).find((template) => template.name === name);
  if (!found) throw new Error(`No template named ${name}`);
  return found;
}


it('a lead writes a checklist with items of every kind, reorders it with the keyboard, and saving makes version 2', async () => {
  await withPage(TABLET, team.emails.lead, async (page) => {
    await page.goto(`${harness.baseUrl}/checks/templates`);
    await page.getByRole('link', { name: 'New checklist' }).click();

    // Mistakes are named beside their fields before anything is sent.
    await page.getByRole('button', { name: 'Create checklist' }).click();
    await page.getByText('Give the checklist a name').waitFor();
    await item(page, 1).getByText('Give the item a label').waitFor();

    await page.getByLabel('Name').fill('Pre-match check');
    await item(page, 1).getByLabel('Label').fill('Main breaker on');
    // A fixed field loses its message at once.
    await page.getByText('Give the checklist a name').waitFor({ state: 'detached' });
    await page.getByText('Give the item a label').waitFor({ state: 'detached' });

    await page.getByRole('button', { name: 'Add an item' }).click();
    // The new item's label has the focus.
    await page.keyboard.type('Air pressure');
    await item(page, 2).getByRole('radio', { name: 'Number' }).check();
    await item(page, 2).getByLabel('Minimum').fill('100');
    await item(page, 2).getByLabel('Maximum').fill('120');
    await item(page, 2).getByLabel('Unit').fill('psi');
    expect(await item(page, 2).getByLabel('Minimum').getAttribute('inputmode')).toBe('decimal');

    await page.getByRole('button', { name: 'Add an item' }).click();
    await item(page, 3).getByLabel('Label').fill('Bumpers match the alliance');
    await item(page, 3).getByRole('radio', { name: 'Choice' }).check();
    await item(page, 3).getByLabel("This confirms the bumper colour (Red/Blue) for the match's alliance").check();
    await item(page, 3).getByText('Blue', { exact: true }).waitFor();

    await page.getByRole('button', { name: 'Add an item' }).click();
    await item(page, 4).getByLabel('Label').fill('Code version deployed');
    await item(page, 4).getByRole('radio', { name: 'Text' }).check();
    await item(page, 4).getByLabel('Required').uncheck();
    await item(page, 4).getByLabel('Usually done by').selectOption({ label: 'Pit crew' });

    // Removing asks for nothing but can be undone.
    await page.getByRole('button', { name: 'Add an item' }).click();
    await item(page, 5).getByLabel('Label').fill('Spare item');
    await item(page, 5).getByRole('button', { name: 'Remove item ‘Spare item’' }).click();
    await page.getByRole('button', { name: 'Undo' }).click();
    await item(page, 5).getByRole('button', { name: 'Remove item ‘Spare item’' }).click();
    await shot(page, 'checklist-template-new-tablet.png');

    await page.getByRole('button', { name: 'Create checklist' }).click();
    await page.getByRole('link', { name: 'Pre-match check' }).waitFor();
    const created = await templateNamed('Pre-match check');
    expect(created.version).toBe(1);
    expect(labels(created)).toEqual(['Main breaker on', 'Air pressure', 'Bumpers match the alliance', 'Code version deployed']);
    expect(created.items[1]).toMatchObject({ kind: 'number', min: 100, max: 120, unit: 'psi', required: true });
    expect(created.items[2]).toMatchObject({ kind: 'choice', options: ['Red', 'Blue'], purpose: 'bumper_colour' });
    expect(created.items[3]).toMatchObject({ kind: 'text', required: false, role: 'crew' });
    await shot(page, 'checklist-templates-list-tablet.png');

    // Keyboard reorder: focus the handle, Space to lift, ArrowDown, Space to drop.
    await page.getByRole('link', { name: 'Pre-match check' }).click();
    await page.getByRole('heading', { name: 'Edit checklist' }).waitFor();
    await page.getByRole('button', { name: 'Move ‘Main breaker on’' }).focus();
    await page.keyboard.press('Space');
    await page.getByText('Picked up ‘Main breaker on’, at position 1 of 4.').waitFor({ state: 'attached' });
    // The keyboard sensor starts listening for arrows a tick after the lift (a setTimeout in
    // @dnd-kit); a person is never that quick, a test is.
    await page.evaluate(() => new Promise((resolve) => setTimeout(resolve, 50)));
    await page.keyboard.press('ArrowDown');
    await page.getByText('‘Main breaker on’ would go to position 2 of 4.').waitFor({ state: 'attached' });
    await page.keyboard.press('Space');
    await page.getByText('Moved ‘Main breaker on’ to position 2 of 4.').waitFor({ state: 'attached' });
    await item(page, 2).getByText('Main breaker on', { exact: true }).waitFor();
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe('Move ‘Main breaker on’');
    await page.getByText('Saving makes version 2.').waitFor();
    await shot(page, 'checklist-template-edit-tablet.png');

    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(/Version 2 · edited/).waitFor();
    const saved = await templateNamed('Pre-match check');
    expect(saved.version).toBe(2);
    expect(labels(saved)).toEqual(['Air pressure', 'Main breaker on', 'Bumpers match the alliance', 'Code version deployed']);
    // The items kept their ids: runs and marks can follow them from version to version.
    expect(saved.items.map((entry) => entry.id).sort()).toEqual(created.items.map((entry) => entry.id).sort());
  });
});

it('a mouse drag by the handle reorders too', async () => {
  const template = await templateNamed('Pre-match check');
  await withPage({ viewport: { width: 1280, height: 900 } }, team.emails.lead, async (page) => {
    await page.goto(`${harness.baseUrl}/checks/templates/${template.id}`);
    const handle = page.getByRole('button', { name: 'Move ‘Code version deployed’' });
    const from = (await handle.boundingBox())!;
    const to = (await item(page, 1).boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await page.mouse.down();
    // In steps: the sensor waits for a few pixels of movement before it lifts the item.
    await page.mouse.move(from.x + from.width / 2, to.y + 10, { steps: 12 });
    await page.mouse.up();
    await item(page, 1).getByText('Code version deployed', { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(/Version 3 · edited/).waitFor();
  });
  expect(labels(await templateNamed('Pre-match check'))[0]).toBe('Code version deployed');
});

it('on a tablet, a press and hold on the handle lifts the item and a finger drag moves it', async () => {
  const template = await templateNamed('Pre-match check');
  expect(labels(template)[0]).toBe('Code version deployed');
  await withPage(TABLET, team.emails.lead, async (page) => {
    await page.goto(`${harness.baseUrl}/checks/templates/${template.id}`);
    const handle = page.getByRole('button', { name: 'Move ‘Code version deployed’' });
    const from = (await handle.boundingBox())!;
    const to = (await item(page, 3).boundingBox())!;
    const x = from.x + from.width / 2;
    const cdp = await page.context().newCDPSession(page);
    const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', y: number) => cdp.send('Input.dispatchTouchEvent', { type, touchPoints: type === 'touchEnd' ? [] : [{ x, y }] });
    await touch('touchStart', from.y + from.height / 2);
    // Held still past the sensor's delay: a swipe would scroll instead.
    await page.waitForTimeout(400);
    for (let step = 1; step <= 10; step += 1) await touch('touchMove', from.y + from.height / 2 + ((to.y + to.height / 2 - from.y - from.height / 2) * step) / 10);
    await touch('touchEnd', 0);
    await item(page, 3).getByText('Code version deployed', { exact: true }).waitFor();
  });
});

it('a save on top of another lead’s newer version shows what they changed and keeps the edits', async () => {
  const template = await templateNamed('Pre-match check');
  await withPage(PHONE, team.emails.lead, async (page) => {
    await page.goto(`${harness.baseUrl}/checks/templates/${template.id}`);
    await page.getByRole('heading', { name: 'Edit checklist' }).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'checklist-template-edit-phone.png') });
    await page.getByRole('button', { name: 'Edit ‘Air pressure’' }).click();
    await page.getByLabel('Minimum').scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'checklist-template-item-phone.png') });
    await page.getByLabel('Name').fill('Pre-match check (quick)');

    // Meanwhile, on another tablet:
    const theirs = await lead.patch(`/api/checklist-templates/${template.id}`, {
      version: template.version,
      items: [...template.items, { label: 'Radio light solid', kind: 'tick', required: true }],
    });
    expect(theirs.status).toBe(200);

    await page.getByRole('button', { name: 'Save changes' }).click();
    const notice = page.getByRole('alert').filter({ hasText: 'Someone else changed this checklist' });
    await notice.getByText('‘Radio light solid’').waitFor();
    await expect.poll(() => page.getByLabel('Name').inputValue()).toBe('Pre-match check (quick)');
    await notice.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'checklist-template-stale-phone.png') });

    // Only the name was changed here: their new item survives.
    await notice.getByRole('button', { name: 'Save mine over theirs' }).click();
    await page.getByRole('link', { name: 'Pre-match check (quick)' }).waitFor();
  });
  const merged = await templateNamed('Pre-match check (quick)');
  expect(merged.version).toBe(template.version + 2);
  expect(labels(merged)).toContain('Radio light solid');
});

it('a crew member reads a checklist but cannot edit it', async () => {
  const template = await templateNamed('Pre-match check (quick)');
  await withPage(PHONE, team.emails.crew, async (page) => {
    await page.goto(`${harness.baseUrl}/checks/templates`);
    await page.getByRole('heading', { name: 'Before a match' }).waitFor();
    expect(await page.getByRole('link', { name: 'New checklist' }).count()).toBe(0);
    await shot(page, 'checklist-templates-list-phone.png');

    await page.getByRole('link', { name: 'Pre-match check (quick)' }).click();
    await page.getByRole('heading', { name: 'Pre-match check (quick)' }).waitFor();
    await page.getByText('Air pressure').waitFor();
    await page.getByText('Number: 100 – 120 psi').waitFor();
    expect(await page.getByRole('textbox').count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Move / }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Save changes' }).count()).toBe(0);
    await shot(page, 'checklist-template-view-phone.png');
  });
  // And the server agrees.
  const crew = await signIn(harness.app, team.emails.crew, PASSWORD);
  expect((await crew.patch(`/api/checklist-templates/${template.id}`, { name: 'Nope' })).status).toBe(403);
});
