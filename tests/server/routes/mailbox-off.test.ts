import { beforeAll, describe, expect, it } from 'vitest';
import { signIn, testApp } from '../../support/app';
import { FORBIDDEN } from '../../support/errors';
import { makeTeamWithoutEvent, PASSWORD } from '../../support/factories';
import { refusingSmtpUrl } from '../../support/mail';

// A real mail relay is configured (SMTP_URL): nothing is captured, so there is no Mailbox.
const { app } = testApp({ SMTP_URL: await refusingSmtpUrl() });
let team: Awaited<ReturnType<typeof makeTeamWithoutEvent>>;
beforeAll(async () => {
  team = await makeTeamWithoutEvent();
});

describe('GET /api/mailbox with SMTP_URL set', () => {
  it('answers 404 mailbox_off to an admin', async () => {
    const admin = await signIn(app, team.emails.admin, PASSWORD);
    const answer = await admin.get('/api/mailbox');
    expect(answer.status).toBe(404);
    expect(answer.body).toEqual({
      error: { code: 'mailbox_off', message: 'There is no Mailbox: e-mail is sent through a real mail server (SMTP_URL)' },
    });
  });

  it('still answers 403 to the other roles first', async () => {
    const crew = await signIn(app, team.emails.crew, PASSWORD);
    expect((await crew.get('/api/mailbox')).body).toEqual(FORBIDDEN);
  });

  it('is announced as off in the session', async () => {
    const admin = await signIn(app, team.emails.admin, PASSWORD);
    expect(admin.session.features).toEqual({ mailbox: false });
  });
});
