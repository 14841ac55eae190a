import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { AlertRulesJson } from '../../shared/schemas/mail';
import { signIn, type SignedIn } from '../support/app';
import { browserHarness, fillSignIn, SCREENSHOT_DIR } from '../support/browser';
import { makeTeam, PASSWORD, uniqueEmail } from '../support/factories';
import { OutboxMail } from '../../server/models';
import { linkTokenIn, waitForMailTo } from '../support/mail';
import { loseFirstAnswer } from '../support/flaky-network';
import { watchedPage } from '../support/watched-page';

// The Team page and the account-link page on the arena Wi-Fi: an answer that never comes back
// must not make a saved change look refused, and a refetch that fails must not drop a change
// being made.

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let admin: SignedIn;

beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(harness.app, team.emails.admin, PASSWORD);
});

/**
 * A fresh tablet for the body. The browser logs each request the test cuts on `path`, and the
 * refusals that follow a lost answer there (409 stale; for a link, 403 for the CSRF token the
 * session set by the lost answer wants, then 404 for the used link): those are the point, and
 * leave the list before the usual check for none.
 */
async function onTablet(path: string, body: (page: Page, problems: string[]) => Promise<void>) {
  const tablet = await watchedPage(harness.browser);
  try {
    await body(tablet.page, tablet.problems);
    await tablet.settled();
  } catch (error) {
    await tablet.context.close();
    throw error;
  }
  const expected = (problem: string) => problem.includes(path) && /net::ERR_CONNECTION_RESET|status of 40[349]/.test(problem);
  tablet.problems.splice(0, tablet.problems.length, ...tablet.problems.filter((problem) => !expected(problem)));
  await tablet.close();
}

it('a new password sent twice because the first answer was lost: the page says the first went through, and it did', async () => {
  const invitee = uniqueEmail('late-joiner');
  expect((await admin.post('/api/team/invites', { name: 'Late Joiner', email: invitee, roles: ['crew'] })).status).toBe(202);
  const token = linkTokenIn((await waitForMailTo(invitee))[0].text);
  const password = 'joined from the arena wifi';
  await onTablet('/api/account-links/use', async (page) => {
    await page.goto(`${harness.baseUrl}/account-link#token=${token}`);
    await page.getByLabel('Choose a password', { exact: true }).fill(password);
    await loseFirstAnswer(page, '**/api/account-links/use', 'POST');
    await page.getByRole('button', { name: 'Join the team' }).click();
    await page.getByText(/Cannot reach the Pitwright server/).waitFor();
    await page.getByRole('button', { name: 'Join the team' }).click();
    // Not "this link is no longer valid … used already": it was used, by that first send.
    await page.getByRole('heading', { level: 1, name: 'Your first try most likely went through' }).waitFor();
    await page.getByText('Sign in with the password you just entered.', { exact: false }).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'account-link-after-lost-answer-tablet.png'), fullPage: true });
  });
  // And so it did: the account exists with the password typed.
  const joined = await signIn(harness.app, invitee, password);
  expect(joined.session.memberships.map((membership: { teamId: string }) => membership.teamId)).toEqual([team.team.id]);
});

it('a rule saved twice because the first answer was lost says Saved, not that someone else changed it', async () => {
  await onTablet('/api/team/alert-rules/first_aid_only', async (page) => {
    await fillSignIn(page, harness.baseUrl, team.emails.admin, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${harness.baseUrl}/team`);
    const rule = page.getByRole('form', { name: 'First aid only' });
    await rule.getByRole('checkbox', { name: 'Pit lead' }).check();
    await loseFirstAnswer(page, '**/api/team/alert-rules/first_aid_only', 'PUT');
    await rule.getByRole('button', { name: 'Save' }).click();
    await rule.getByText(/Cannot reach the Pitwright server/).waitFor();
    await rule.getByRole('button', { name: 'Save' }).click();
    await rule.getByRole('status').filter({ hasText: 'Saved.' }).waitFor();
    expect(await rule.getByText('Someone else changed this rule').count()).toBe(0);
    expect(await rule.getByRole('checkbox', { name: 'Pit lead' }).isChecked()).toBe(true);
  });
  const { rules } = (await admin.get('/api/team/alert-rules')).body as AlertRulesJson;
  expect(rules.find((rule) => rule.key === 'first_aid_only')).toMatchObject({ roles: ['admin', 'lead', 'safety'], version: 1 });
});

it('a rule being changed stays when the rules fail to reload behind it', async () => {
  await onTablet('/api/team/alert-rules', async (page) => {
    // The tablet's own clock, so that the rules can go stale without a half-minute wait.
    await page.clock.install();
    await fillSignIn(page, harness.baseUrl, team.emails.safety, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${harness.baseUrl}/team`);
    const rule = page.getByRole('form', { name: 'Near misses' });
    await rule.getByRole('checkbox', { name: 'Safety captain' }).check();
    await rule.getByLabel('Add an address').fill('parent.on.call@example.org');
    await page.route('**/api/team/alert-rules', (route) => route.abort('connectionreset'));
    // The tablet is put down for a minute and picked up again: what is on screen is reloaded, and that fails.
    await page.clock.fastForward('01:00');
    await page.evaluate(() => document.dispatchEvent(new Event('visibilitychange', { bubbles: true })));
    // The rules are reloaded, and that fails (after the query's own retries): the card says so, and keeps the rule as changed.
    await page.getByText(/Could not (re)?load the alert rules/).waitFor({ timeout: 15_000 });
    expect(await rule.getByRole('checkbox', { name: 'Safety captain' }).isChecked({ timeout: 5_000 })).toBe(true);
    expect(await rule.getByLabel('Add an address').inputValue()).toBe('parent.on.call@example.org');
    await page.getByText('Could not reload the alert rules: these are as they were').waitFor();
    await rule.screenshot({ path: path.join(SCREENSHOT_DIR, 'alert-rules-reload-failed-tablet.png') });
  });
});

it('an undelivered mail retried twice because the first answer was lost: the second tap says it was handled, not "not found"', async () => {
  const to = uniqueEmail('far-away');
  // What the sender leaves after its last attempt (server/mail/dispatcher.ts).
  const failure = await OutboxMail.create({
    teamId: team.team.id,
    kind: 'invite',
    toAddress: to,
    subject: `Join ${team.team.name} on Pitwright`,
    text: 'Hello',
    status: 'failed',
    attempts: 4,
    lastError: 'connect ECONNREFUSED 127.0.0.1:1',
    nextAttemptAt: new Date(),
    claimedUntil: null,
    failedAt: new Date(),
  });
  await onTablet(`/api/team/mail-failures/${failure.id}/retry`, async (page) => {
    await fillSignIn(page, harness.baseUrl, team.emails.admin, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${harness.baseUrl}/team`);
    const card = page.getByRole('region', { name: 'Mail not delivered' });
    const row = card.getByRole('listitem').filter({ hasText: `To ${to}` });
    await loseFirstAnswer(page, `**/api/team/mail-failures/${failure.id}/retry`, 'POST');
    await row.getByRole('button', { name: 'Retry' }).click();
    await row.getByText(/Cannot reach the Pitwright server/).waitFor();
    await row.getByRole('button', { name: 'Retry' }).click();
    await card.getByRole('status').filter({ hasText: `The mail to ${to} was retried or dismissed already.` }).waitFor();
    await row.waitFor({ state: 'detached' });
  });
  expect((await waitForMailTo(to))[0].subject).toBe(`Join ${team.team.name} on Pitwright`);
});

it('an invite revoked twice because the first answer was lost: the second tap closes the question and the invite is gone', async () => {
  const invitee = uniqueEmail('not-coming');
  expect((await admin.post('/api/team/invites', { name: 'Not Coming', email: invitee, roles: ['crew'] })).status).toBe(202);
  await onTablet('/api/team/invites/', async (page) => {
    await fillSignIn(page, harness.baseUrl, team.emails.admin, PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.goto(`${harness.baseUrl}/team`);
    const pending = page.getByRole('region', { name: 'Invited, not joined yet' });
    await pending.getByRole('listitem').filter({ hasText: invitee }).getByRole('button', { name: 'Revoke' }).click();
    const question = page.getByRole('dialog', { name: 'Revoke the invite for Not Coming?' });
    await loseFirstAnswer(page, '**/api/team/invites/*', 'DELETE');
    await question.getByRole('button', { name: 'Revoke' }).click();
    await question.getByText(/Cannot reach the Pitwright server/).waitFor();
    await question.getByRole('button', { name: 'Revoke' }).click();
    await question.waitFor({ state: 'hidden' });
    await expect.poll(() => page.getByText(invitee).count()).toBe(0);
  });
  const { invites } = (await admin.get('/api/team/invites')).body as { invites: { email: string }[] };
  expect(invites.map((invite) => invite.email)).not.toContain(invitee);
});
