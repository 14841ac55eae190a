import { beforeAll, expect, it } from 'vitest';
import { signIn } from '../support/app';
import { browserHarness, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

it('a tablet shows the live state and picks up a change made on another device without reloading', async () => {
  const context = await harness.browser.newContext({ viewport: { width: 800, height: 1280 }, hasTouch: true });
  try {
    const page = await context.newPage();
    await fillSignIn(page, harness.baseUrl, team.emails.crew, PASSWORD);
    await page.getByText('Live', { exact: true }).waitFor();
    await page.getByTestId('shell-current-event').getByText(team.event.name).waitFor();

    const mentor = await signIn(harness.app, team.emails.admin, PASSWORD);
    const renamed = await mentor.patch(`/api/events/${team.event.id}`, { name: 'Renamed from the mentor phone' });
    expect(renamed.status).toBe(200);

    await page.getByTestId('shell-current-event').getByText('Renamed from the mentor phone').waitFor({ timeout: 10_000 });
  } finally {
    await context.close();
  }
});
