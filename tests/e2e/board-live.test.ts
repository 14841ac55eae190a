import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, SCREENSHOT_DIR, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { matchBody } from '../support/schedule';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let lead: SignedIn;
let first: string;
const minutesFromNow = (minutes: number) => new Date(Date.now() + minutes * 60_000).toISOString();

beforeAll(async () => {
  team = await makeTeam();
  lead = await signIn(harness.app, team.emails.lead, PASSWORD);
  // The field is late: match 1 was due 30 minutes ago and has not started, so ours (match 2,
  // due 23 minutes ago) is projected one cycle (7 min) from now.
  const one = await lead.post(`/api/events/${team.event.id}/matches`, matchBody({ number: 1, scheduledStart: minutesFromNow(-30) }));
  first = one.body.id;
  const ours = matchBody({ number: 2, scheduledStart: minutesFromNow(-23), red: [team.team.number, 21002, 21003] });
  expect((await lead.post(`/api/events/${team.event.id}/matches`, ours)).status).toBe(201);
});

it("the board's projected start moves when the lead marks the field on another device, without a reload", async () => {
  const context = await harness.browser.newContext({ viewport: { width: 800, height: 1280 }, hasTouch: true });
  try {
    const page = await context.newPage();
    await fillSignIn(page, harness.baseUrl, team.emails.crew, PASSWORD);
    await page.getByText('Live', { exact: true }).waitFor();
    await page.getByText('Qualification 2').first().waitFor();
    const projectedAt = page.getByRole('article').getByText(/^at /).nth(1);
    const before = await projectedAt.innerText();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'board-next-match-tablet.png') });

    // Match 1 started 25 minutes ago: ours could have gone 18 minutes ago, so it is due now.
    const marked = await lead.post(`/api/events/${team.event.id}/field-progress`, { matchId: first, startedAt: minutesFromNow(-25) });
    expect(marked.status).toBe(201);
    await expect.poll(() => projectedAt.innerText(), { timeout: 10_000 }).not.toBe(before);
  } finally {
    await context.close();
  }
});
