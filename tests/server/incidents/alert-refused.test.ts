import { expect, it } from 'vitest';
import type { MailFailureJson } from '../../../shared/schemas/mail';
import { MAIL_ATTEMPTS } from '../../../server/mail/dispatcher';
import { signInEveryRole } from '../../support/app';
import { makeTeam, PASSWORD } from '../../support/factories';
import { reportIncident } from '../../support/incidents';
import { quickRetryTestApp, refusingSmtpUrl, waitForOutbox } from '../../support/mail';

// The mail server refuses every connection (its port is closed): the report still stands, and
// the alerts that could not go out are listed for the safety captain after the last retry.
const { app } = quickRetryTestApp({ SMTP_URL: await refusingSmtpUrl() });

it('a report whose alerts cannot be sent is saved and readable; the failures show on the Team page’s list', async () => {
  const own = await makeTeam();
  const as = await signInEveryRole(app, own.emails, PASSWORD);
  const report = await reportIncident(as.crew, { kind: 'injury', treatments: ['hospital_visit'] });
  const read = await as.safety.get(`/api/incidents/${report.id}`);
  expect(read.status).toBe(200);
  expect(read.body).toMatchObject({ id: report.id, classification: { class: 'beyond_first_aid' } });

  const failed = await Promise.all([own.emails.admin, own.emails.safety].map((toAddress) => waitForOutbox({ incidentId: report.id, toAddress }, 'failed')));
  const answer = await as.safety.get('/api/team/mail-failures');
  expect(answer.status).toBe(200);
  const listed: MailFailureJson[] = answer.body.failures;
  expect(listed.map((failure) => ({ to: failure.to, incidentId: failure.incidentId, kind: failure.kind, attempts: failure.attempts })).sort((a, b) => a.to.localeCompare(b.to))).toEqual(
    failed
      .map((row) => ({ to: row.toAddress, incidentId: report.id, kind: 'incident_alert', attempts: MAIL_ATTEMPTS }))
      .sort((a, b) => a.to.localeCompare(b.to)),
  );
  for (const failure of listed) {
    expect(failure.subject).toMatch(/^Safety alert, /);
    expect(failure.lastError).toContain('ECONNREFUSED');
  }
  // Still there, unchanged, after all of it.
  expect((await as.safety.get(`/api/incidents/${report.id}`)).body).toEqual(read.body);
});
