import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ROLES } from '../../../shared/roles';
import { inTransaction } from '../../../server/db/transaction';
import { MAIL_ATTEMPTS } from '../../../server/mail/dispatcher';
import { enqueueMail } from '../../../server/mail/outbox';
import type { OutboxMail } from '../../../server/models';
import { signIn, signInEveryRole, type SignedIn } from '../../support/app';
import { FORBIDDEN, UNAUTHENTICATED } from '../../support/errors';
import { makeTeamWithoutEvent, PASSWORD, uniqueEmail } from '../../support/factories';
import { quickRetryTestApp, refusingSmtpUrl, waitForOutbox } from '../../support/mail';

// Every message is refused: the mail server's port is closed.
const { app } = quickRetryTestApp({ SMTP_URL: await refusingSmtpUrl() });
let team: Awaited<ReturnType<typeof makeTeamWithoutEvent>>;
let clients: Record<(typeof ROLES)[number], SignedIn>;
let inviteFailure: OutboxMail;
let alertFailure: OutboxMail;
const NOT_FOUND = { error: { code: 'not_found', message: 'Failed e-mail not found' } };

beforeAll(async () => {
  team = await makeTeamWithoutEvent();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
  const invited = uniqueEmail('invite-refused');
  const answer = await clients.admin.post('/api/team/invites', { name: 'Ada Lovelace', email: invited, roles: ['crew'] });
  // The request that queued the mail is answered as if the server had taken it.
  expect(answer.status).toBe(202);
  inviteFailure = await waitForOutbox({ toAddress: invited }, 'failed');

  const alerted = uniqueEmail('alert-refused');
  await inTransaction((transaction) =>
    enqueueMail(transaction, [{ teamId: team.team.id, kind: 'incident_alert', to: alerted, subject: 'Incident: first aid', text: 'Open the log.' }]),
  );
  alertFailure = await waitForOutbox({ toAddress: alerted }, 'failed');
});

const listed = (mail: OutboxMail) => ({
  id: mail.id,
  kind: mail.kind,
  to: mail.toAddress,
  subject: mail.subject,
  attempts: MAIL_ATTEMPTS,
  lastError: expect.stringContaining('ECONNREFUSED'),
  failedAt: mail.failedAt!.toISOString(),
  incidentId: null,
});

describe('GET /api/team/mail-failures', () => {
  it('lists for an admin every kind of e-mail that failed after every attempt, with the error', async () => {
    const answer = await clients.admin.get('/api/team/mail-failures');
    expect(answer.status).toBe(200);
    expect(answer.body.failures).toEqual(expect.arrayContaining([listed(inviteFailure), listed(alertFailure)]));
    expect(answer.body.failures).toHaveLength(2);
  });

  it('lists for a safety captain the incident alerts only', async () => {
    const answer = await clients.safety.get('/api/team/mail-failures');
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({ failures: [listed(alertFailure)] });
  });

  it('is closed to the other roles, and to callers without a session', async () => {
    expect((await request(app).get('/api/team/mail-failures')).body).toEqual(UNAUTHENTICATED);
    for (const role of ['lead', 'crew', 'battery', 'viewer'] as const) {
      const answer = await clients[role].get('/api/team/mail-failures');
      expect(answer.status, role).toBe(403);
      expect(answer.body).toEqual(FORBIDDEN);
    }
  });
});

describe('retrying and dismissing', () => {
  it('retries a failure by hand: queued again with fresh attempts, and failed again here', async () => {
    const answer = await clients.safety.post(`/api/team/mail-failures/${alertFailure.id}/retry`);
    expect(answer.status).toBe(202);
    const failedAgain = await waitForOutbox({ id: alertFailure.id }, 'failed');
    expect(failedAgain.attempts).toBe(MAIL_ATTEMPTS);
    expect(failedAgain.failedAt!.getTime()).toBeGreaterThanOrEqual(alertFailure.failedAt!.getTime());
  });

  it('answers 404 for a failure the role does not see, and for another team’s', async () => {
    expect((await clients.safety.post(`/api/team/mail-failures/${inviteFailure.id}/retry`)).body).toEqual(NOT_FOUND);
    expect((await clients.safety.delete(`/api/team/mail-failures/${inviteFailure.id}`)).status).toBe(404);

    const other = await makeTeamWithoutEvent();
    const otherAdmin = await signIn(app, other.emails.admin, PASSWORD);
    const retried = await otherAdmin.post(`/api/team/mail-failures/${inviteFailure.id}/retry`);
    expect(retried.status).toBe(404);
    expect(retried.body).toEqual(NOT_FOUND);
    expect((await otherAdmin.delete(`/api/team/mail-failures/${inviteFailure.id}`)).status).toBe(404);
    expect((await otherAdmin.get('/api/team/mail-failures')).body).toEqual({ failures: [] });
  });

  it('refuses a retry or dismissal from the other roles, and a malformed id', async () => {
    expect((await clients.crew.post(`/api/team/mail-failures/${alertFailure.id}/retry`)).body).toEqual(FORBIDDEN);
    expect((await clients.viewer.delete(`/api/team/mail-failures/${alertFailure.id}`)).body).toEqual(FORBIDDEN);
    const malformed = await clients.admin.post('/api/team/mail-failures/not-an-id/retry');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields).toEqual({ id: 'Must be a UUID' });
  });

  it('dismisses a failure: it is no longer listed', async () => {
    const answer = await clients.admin.delete(`/api/team/mail-failures/${inviteFailure.id}`);
    expect(answer.status).toBe(204);
    const after = await clients.admin.get('/api/team/mail-failures');
    expect(after.body.failures.map((failure: { id: string }) => failure.id)).not.toContain(inviteFailure.id);
    expect((await clients.admin.delete(`/api/team/mail-failures/${inviteFailure.id}`)).status).toBe(404);
  });
});
