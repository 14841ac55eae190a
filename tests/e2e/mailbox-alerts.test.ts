import net from 'node:net';
import path from 'node:path';
import { beforeAll, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { loadConfig } from '../../server/config';
import { createMailDispatcher } from '../../server/mail/dispatcher';
import { OutboxMail } from '../../server/models';
import { signIn } from '../support/app';
import { browserHarness, SCREENSHOT_DIR, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD, uniqueEmail } from '../support/factories';
import { QUICK_RETRY_BASE_MS, waitForMailTo, waitForOutbox } from '../support/mail';
import { watchedPage } from '../support/watched-page';

const harness = browserHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(SCREENSHOT_DIR, `mail-settings-${name}.png`), fullPage: true });

/** A tablet signed in as `email` on the Team page; `refusals` as for watchedPage. */
async function teamPageAs(email: string, refusals?: string[]) {
  const tablet = await watchedPage(harness.browser, { refusals });
  await fillSignIn(tablet.page, harness.baseUrl, email, PASSWORD);
  await tablet.page.getByRole('button', { name: 'Sign out' }).waitFor();
  await tablet.page.goto(`${harness.baseUrl}/team`);
  await tablet.page.getByRole('heading', { level: 2, name: 'Incident alerts' }).waitFor();
  return tablet;
}

/** A loopback port nothing listens on: connecting is refused at once, like a relay that is down. */
async function closedPort(): Promise<number> {
  const server = net.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as net.AddressInfo;
  await new Promise((resolve) => server.close(resolve));
  return port;
}

it('a mentor adds an outside address to an alert rule, and it is kept after a reload', async () => {
  const tablet = await teamPageAs(team.emails.admin);
  try {
    const { page } = tablet;
    const rule = page.getByRole('form', { name: 'First aid only' });
    // The defaults before anyone changed them: safety captains and mentors.
    expect(await rule.getByRole('checkbox', { name: 'Safety captain' }).isChecked()).toBe(true);
    expect(await rule.getByRole('checkbox', { name: 'Mentor (admin)' }).isChecked()).toBe(true);
    await page.getByRole('form', { name: 'Near misses' }).getByText('Nobody is e-mailed for these.').waitFor();

    await rule.getByLabel('Add an address').fill('not an address');
    await rule.getByRole('button', { name: 'Add', exact: true }).click();
    await rule.getByText('Enter a valid e-mail address').waitFor();
    await rule.getByLabel('Add an address').fill('Office@School.example');
    await rule.getByRole('button', { name: 'Add', exact: true }).click();
    await rule.getByText('office@school.example').waitFor();
    await rule.getByRole('checkbox', { name: 'Pit lead' }).check();
    await shot(page, 'rule-edited-tablet');
    await rule.getByRole('button', { name: 'Save' }).click();
    await rule.getByRole('status').filter({ hasText: 'Saved.' }).waitFor();

    await page.reload();
    const reloaded = page.getByRole('form', { name: 'First aid only' });
    await reloaded.getByText('office@school.example').waitFor();
    expect(await reloaded.getByRole('checkbox', { name: 'Pit lead' }).isChecked()).toBe(true);
    await shot(page, 'rule-saved-tablet');
  } finally {
    await tablet.close();
  }

  const mentor = await signIn(harness.app, team.emails.admin, PASSWORD);
  const { rules } = (await mentor.get('/api/team/alert-rules')).body;
  expect(rules).toContainEqual({ key: 'first_aid_only', roles: ['admin', 'lead', 'safety'], extraAddresses: ['office@school.example'], version: 1 });
});

it('a safety captain saving a rule someone changed meanwhile is told so, and reloads their version', async () => {
  const tablet = await teamPageAs(team.emails.safety, ['/api/session', '/api/team/alert-rules/near_miss']);
  try {
    const { page } = tablet;
    const rule = page.getByRole('form', { name: 'Near misses' });
    await rule.getByRole('checkbox', { name: 'Safety captain' }).check();

    const mentor = await signIn(harness.app, team.emails.admin, PASSWORD);
    expect((await mentor.put('/api/team/alert-rules/near_miss', { version: 0, roles: ['admin'], extraAddresses: [] })).status).toBe(200);

    await rule.getByRole('button', { name: 'Save' }).click();
    await rule.getByText('Someone else changed this rule while you were editing').waitFor();
    await shot(page, 'rule-stale-tablet');
    await rule.getByRole('button', { name: 'Reload the rule' }).click();
    await expect.poll(() => rule.getByRole('checkbox', { name: 'Mentor (admin)' }).isChecked()).toBe(true);
    expect(await rule.getByRole('checkbox', { name: 'Safety captain' }).isChecked()).toBe(false);
  } finally {
    await tablet.close();
  }
});

// Last in the file: it swaps this process's mail sender, which the tests above do not need.
it('mail given up after every retry shows under "Mail not delivered"; Retry sends it, Dismiss takes it off the list', async () => {
  const config = loadConfig(process.env);
  const mentor = await signIn(harness.app, team.emails.admin, PASSWORD);
  const retried = uniqueEmail('retried');
  const dismissed = uniqueEmail('dismissed');

  // The sender of a server whose SMTP_URL points at a closed port takes the queue for a moment
  // (one sender per process), with quick retries so that both invites fail for good at once.
  const refusing = createMailDispatcher({ ...config.mail, url: `smtp://127.0.0.1:${await closedPort()}`, retryBaseMs: QUICK_RETRY_BASE_MS });
  refusing.start();
  try {
    for (const email of [retried, dismissed]) {
      expect((await mentor.post('/api/team/invites', { name: 'Far Away', email, roles: ['crew'] })).status).toBe(202);
      await waitForOutbox({ teamId: team.team.id, toAddress: email }, 'failed');
    }
  } finally {
    refusing.stop();
  }

  // Then the usual sender again, on this test run's SMTP fake.
  const sender = createMailDispatcher(config.mail);
  sender.start();
  const tablet = await teamPageAs(team.emails.admin);
  try {
    const { page } = tablet;
    const card = page.getByRole('region', { name: 'Mail not delivered' });
    const rowOf = (email: string) => card.getByRole('listitem').filter({ hasText: `To ${email}` });
    await rowOf(retried).waitFor();
    await expect.poll(() => rowOf(dismissed).innerText()).toMatch(/Invite: Join .* on Pitwright[\s\S]*after 4 tries\. .*ECONNREFUSED/);
    await shot(page, 'undelivered-tablet');

    await rowOf(retried).getByRole('button', { name: 'Retry' }).click();
    await card.getByRole('status').filter({ hasText: `Sending again to ${retried}.` }).waitFor();
    await rowOf(retried).waitFor({ state: 'detached' });
    expect((await waitForMailTo(retried))[0].subject).toBe(`Join ${team.team.name} on Pitwright`);

    await rowOf(dismissed).getByRole('button', { name: 'Dismiss' }).click();
    await rowOf(dismissed).waitFor({ state: 'detached' });
    expect(await OutboxMail.count({ where: { toAddress: dismissed } })).toBe(0);

    await page.reload();
    await page.getByRole('heading', { level: 2, name: 'Incident alerts' }).waitFor();
    expect(await page.getByRole('region', { name: 'Mail not delivered' }).count()).toBe(0);
  } finally {
    sender.stop();
    await tablet.close();
  }
});
