import { beforeAll, expect, it } from 'vitest';
import { browserHarness, fillSignIn } from '../support/browser';
import { makeTeam, PASSWORD } from '../support/factories';
import { watchedPage } from '../support/watched-page';

// A server whose mail goes to a real relay (SMTP_URL set: nothing listens on port 1, and nothing
// is sent here) has no Mailbox: the page is not offered, and opened by its address it says so once.
const smtpUrl = process.env.SMTP_URL;
process.env.SMTP_URL = 'smtp://127.0.0.1:1';
const harness = browserHarness();
if (smtpUrl === undefined) delete process.env.SMTP_URL;
else process.env.SMTP_URL = smtpUrl;

let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

it('with mail going to a real server, the Mailbox is not offered, and its address says there is none without asking again and again', async () => {
  const tablet = await watchedPage(harness.browser, { refusals: ['/api/session', '/api/mailbox'] });
  try {
    const { page } = tablet;
    await page.clock.install();
    await fillSignIn(page, harness.baseUrl, team.emails.admin, PASSWORD);
    await page.getByText('Live', { exact: true }).waitFor();
    await page.goto(`${harness.baseUrl}/more`);
    await page.getByRole('main').getByRole('link', { name: 'Team' }).waitFor();
    expect(await page.getByRole('link', { name: 'Mailbox' }).count()).toBe(0);

    let asked = 0;
    page.on('request', (request) => {
      if (new URL(request.url()).pathname === '/api/mailbox') asked += 1;
    });
    await page.goto(`${harness.baseUrl}/mailbox`);
    await page.getByText('There is no mailbox here').waitFor();
    await tablet.settled();
    const onOpening = asked;
    // Twenty seconds on the tablet's clock (short of the socket's heartbeat, whose reconnect would
    // reload everything): the page polls for new mail every few seconds when there is a mailbox.
    await page.clock.fastForward('00:20');
    await tablet.settled();
    expect(asked).toBe(onOpening);
  } finally {
    await tablet.close();
  }
});
