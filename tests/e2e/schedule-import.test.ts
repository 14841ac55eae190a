import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import { browserHarness, SCREENSHOT_DIR, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { csv } from '../support/schedule';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;

beforeAll(async () => {
  team = await makeTeam();
});

it('a lead previews a schedule file, applies it and sees its matches', async () => {
  const context = await harness.browser.newContext({ viewport: { width: 800, height: 1280 }, hasTouch: true });
  try {
    const page = await context.newPage();
    await fillSignIn(page, harness.baseUrl, team.emails.lead, PASSWORD);
    await page.getByText('Live', { exact: true }).waitFor();
    await page.goto(`${harness.baseUrl}/schedule`);

    // With no matches yet, the import panel is open on the page.
    const file = csv(
      'qualification,1,2026-12-05 09:00,24011,24012,24013,24014,24015,24016',
      'qualification,2,2026-12-05 09:07,24021,24022,24023,24024,24025,24026',
    );
    await page.locator('input[type=file]').setInputFiles({ name: 'schedule.csv', mimeType: 'text/csv', buffer: Buffer.from(file) });
    const preview = page.getByText('Preview: nothing is saved until you apply it');
    await preview.waitFor();
    await expect.poll(() => page.getByLabel('What the import does').innerText()).toMatch(/2\s*new\s*0\s*changed\s*0\s*unchanged/);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'schedule-import-preview.png') });

    await page.getByRole('button', { name: 'Apply import' }).click();
    // The first import replaces the empty page with the list, so the rows are the confirmation.
    await page.getByRole('heading', { name: 'Qualification 2' }).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'schedule-import-applied.png') });
  } finally {
    await context.close();
  }
});
