import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { SessionJson } from '../../shared/schemas/session';
import { signIn } from '../support/app';
import { browserHarness, SCREENSHOT_DIR, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD, uniqueEmail } from '../support/factories';
import { linkTokenIn, waitForMailTo } from '../support/mail';
import { PHONE, sidewaysOverflow, watchedPage } from '../support/watched-page';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SCREENSHOT_DIR, `team-invites-${name}.png`), fullPage: true });

async function signInAs(page: Page, email: string, password = PASSWORD) {
  await fillSignIn(page, harness.baseUrl, email, password);
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

it('a mentor invites a new member by e-mail; the link from the Mailbox makes their account and signs them in with the invited roles, once', async () => {
  const invitee = uniqueEmail('invitee');
  // The invite of someone already in the team is refused on purpose (409).
  const admin = await watchedPage(harness.browser, { refusals: ['/api/session', '/api/team/invites'] });
  let link = '';
  try {
    const { page } = admin;
    await signInAs(page, team.emails.admin);
    await page.getByRole('link', { name: 'Team' }).first().click();
    await page.getByRole('button', { name: 'Add a member' }).click();
    const form = page.getByRole('form', { name: 'Add a member' });
    // An invite is the way offered first; the temporary password stays one tap away.
    expect(await form.getByRole('radio', { name: 'Invite by e-mail' }).isChecked()).toBe(true);
    await form.getByLabel('Name', { exact: true }).fill('Invitee I.');
    await form.getByLabel('E-mail', { exact: true }).fill(invitee);
    await form.getByRole('checkbox', { name: 'Pit crew' }).uncheck();
    await form.getByRole('checkbox', { name: 'Battery handler' }).check();
    await form.getByRole('checkbox', { name: 'Safety captain' }).check();
    await shot(page, 'form-tablet');
    await form.getByRole('button', { name: 'Send invite' }).click();
    await page.getByRole('status').filter({ hasText: `Invite sent to Invitee I. (${invitee})` }).waitFor();
    const pending = page.getByRole('region', { name: 'Invited, not joined yet' });
    await pending.getByText(invitee).waitFor();
    await expect.poll(() => pending.innerText()).toMatch(/Battery handler, Safety captain · link works until/);
    await shot(page, 'pending-tablet');

    // An address already in the team is refused beside the field, not by a mail nobody needs.
    await page.getByRole('button', { name: 'Add a member' }).click();
    await page.getByLabel('Name', { exact: true }).fill('Crew again');
    await page.getByLabel('E-mail', { exact: true }).fill(team.emails.crew);
    await page.getByRole('button', { name: 'Send invite' }).click();
    await page.getByText('Already a member of the team', { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Cancel' }).click();

    await page.getByRole('link', { name: 'Mailbox' }).first().click();
    await page.getByRole('heading', { level: 1, name: 'Mailbox' }).waitFor();
    // The fake receives the mail a moment after the invite; the page looks again by itself.
    const message = page.getByRole('link', { name: new RegExp(`Join ${team.team.name} on Pitwright[\\s\\S]*To ${invitee}`) });
    await message.waitFor();
    await shot(page, 'mailbox-list-tablet');
    await message.click();
    const opened = page.getByRole('article');
    await opened.getByText('Hello Invitee I.,').waitFor();
    link = (await opened.getByRole('link', { name: /\/account-link#token=/ }).getAttribute('href')) ?? '';
    await shot(page, 'mailbox-tablet');
  } finally {
    await admin.close();
  }

  // PUBLIC_URL is not this test's server: keep the link's fragment, which carries the token.
  const url = `${harness.baseUrl}/account-link${new URL(link).hash}`;
  const newcomer = await watchedPage(harness.browser);
  try {
    const { page } = newcomer;
    await page.goto(url);
    await page.getByRole('heading', { level: 1, name: `Join ${team.team.name}` }).waitFor();
    await page.getByText(`invited ${invitee} to Pitwright`).waitFor();
    await page.getByLabel('Choose a password').fill('short');
    await page.getByRole('button', { name: 'Join the team' }).click();
    await page.getByText('At least 10 characters', { exact: true }).waitFor();
    await page.getByLabel('Choose a password').fill('my own pit password');
    await shot(page, 'choose-password-tablet');
    await page.getByRole('button', { name: 'Join the team' }).click();

    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    await page.getByText('No matches yet — a lead imports the schedule').waitFor();
    const session = (await page.evaluate(() => fetch('/api/session').then((answer) => answer.json()))) as SessionJson;
    expect(session.user).toMatchObject({ name: 'Invitee I.', email: invitee });
    expect(session.memberships).toEqual([expect.objectContaining({ teamId: team.team.id, roles: ['battery', 'safety'], active: true })]);
    await shot(page, 'joined-board-tablet');
  } finally {
    await newcomer.close();
  }

  const again = await watchedPage(harness.browser, { refusals: ['/api/account-links/check'] });
  try {
    const { page } = again;
    await page.goto(url);
    await page.getByRole('heading', { level: 1, name: 'This link is no longer valid' }).waitFor();
    await shot(page, 'used-link-tablet');
    await page.getByRole('link', { name: 'Get a new password link' }).click();
    await page.getByRole('heading', { level: 1, name: 'Forgot your password?' }).waitFor();
  } finally {
    await again.close();
  }

  const mentor = await signIn(harness.app, team.emails.admin, PASSWORD);
  expect((await mentor.get('/api/team/invites')).body.invites.map((invite: { email: string }) => invite.email)).not.toContain(invitee);
  expect((await mentor.get('/api/team/members')).body).toContainEqual(expect.objectContaining({ name: 'Invitee I.', roles: ['battery', 'safety'], active: true }));
});

it('someone with an account in another team joins with the password they have, and lands in the inviting team', async () => {
  const other = await makeTeam();
  const mentor = await signIn(harness.app, team.emails.admin, PASSWORD);
  const email = other.emails.lead;
  expect((await mentor.post('/api/team/invites', { name: 'Lead Elsewhere', email, roles: ['crew'] })).status).toBe(202);
  const token = linkTokenIn((await waitForMailTo(email))[0].text);

  // The wrong password is refused on purpose (400 beside the field).
  const guest = await watchedPage(harness.browser, { refusals: ['/api/account-links/use'] });
  try {
    const { page } = guest;
    await page.goto(`${harness.baseUrl}/account-link#token=${token}`);
    await page.getByRole('heading', { level: 1, name: `Join ${team.team.name}` }).waitFor();
    await page.getByText(`${email} has a Pitwright account already`).waitFor();
    await page.getByLabel('Your password').fill('not my password');
    await page.getByRole('button', { name: 'Join the team' }).click();
    // Said beside the field (whatever the server's wording), and the link stays usable.
    await expect.poll(() => page.getByLabel('Your password').getAttribute('aria-invalid')).toBe('true');
    await shot(page, 'existing-account-tablet');
    await page.getByLabel('Your password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Join the team' }).click();
    await page.getByText('No matches yet — a lead imports the schedule').waitFor();
    const session = (await page.evaluate(() => fetch('/api/session').then((answer) => answer.json()))) as SessionJson;
    expect(session.memberships.find((membership) => membership.active)).toMatchObject({ teamId: team.team.id, roles: ['crew'] });
    expect(session.memberships).toContainEqual(expect.objectContaining({ teamId: other.team.id, roles: ['lead'] }));
  } finally {
    await guest.close();
  }
});

it('a mentor revokes a pending invite, and its link stops working', async () => {
  const mentor = await signIn(harness.app, team.emails.admin, PASSWORD);
  const email = uniqueEmail('revoked');
  expect((await mentor.post('/api/team/invites', { name: 'Revoked R.', email, roles: ['crew'] })).status).toBe(202);
  const token = linkTokenIn((await waitForMailTo(email))[0].text);

  const admin = await watchedPage(harness.browser);
  try {
    const { page } = admin;
    await signInAs(page, team.emails.admin);
    await page.goto(`${harness.baseUrl}/team`);
    const pending = page.getByRole('region', { name: 'Invited, not joined yet' });
    const row = pending.getByRole('listitem').filter({ hasText: email });
    await row.getByRole('button', { name: 'Revoke' }).click();
    const dialog = page.getByRole('dialog', { name: 'Revoke the invite for Revoked R.?' });
    await dialog.getByRole('button', { name: 'Revoke' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await row.waitFor({ state: 'detached' });
  } finally {
    await admin.close();
  }
  const check = await mentor.post('/api/account-links/check', { token });
  expect(check.status).toBe(404);
  expect(check.body.error.code).toBe('link_not_valid');
});

it('on a 360 px phone the invite form, the Mailbox and the link pages fit without sideways scrolling', async () => {
  const admin = await watchedPage(harness.browser, { viewport: PHONE });
  try {
    const { page } = admin;
    await signInAs(page, team.emails.admin);
    await page.goto(`${harness.baseUrl}/team`);
    await page.getByRole('button', { name: 'Add a member' }).click();
    await page.getByLabel('Name', { exact: true }).waitFor();
    expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
    await shot(page, 'team-phone');

    // Reached through More on a phone: the bar keeps the areas used at every match.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'More' }).click();
    await page.getByRole('main').getByRole('link', { name: 'Mailbox' }).click();
    await page.getByRole('list', { name: 'Messages' }).getByRole('link').first().click();
    await page.getByRole('article').waitFor();
    expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
    await shot(page, 'mailbox-phone');
    await page.getByRole('link', { name: 'All messages' }).click();
    await page.getByRole('list', { name: 'Messages' }).waitFor();
  } finally {
    await admin.close();
  }

  const visitor = await watchedPage(harness.browser, { viewport: PHONE, refusals: ['/api/session', '/api/account-links/check'] });
  try {
    const { page } = visitor;
    await page.goto(`${harness.baseUrl}/account-link#token=${'x'.repeat(43)}`);
    await page.getByRole('heading', { level: 1, name: 'This link is no longer valid' }).waitFor();
    expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
    await shot(page, 'link-not-valid-phone');
    await page.goto(`${harness.baseUrl}/forgot-password`);
    await page.getByRole('heading', { level: 1, name: 'Forgot your password?' }).waitFor();
    expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
  } finally {
    await visitor.close();
  }
});
