import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { simpleParser, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { inTransaction } from '../../../server/db/transaction';
import { MAIL_ATTEMPTS, retryDelayMs } from '../../../server/mail/dispatcher';
import { enqueueMail } from '../../../server/mail/outbox';
import { signIn } from '../../support/app';
import { makeTeamWithoutEvent, PASSWORD, uniqueEmail } from '../../support/factories';
import { quickRetryTestApp, waitForOutbox } from '../../support/mail';

/**
 * A mail server that refuses each recipient a set number of times (as a relay does while it is
 * overloaded or greylisting), then accepts: a 4xx at RCPT, and a 5xx after DATA.
 */
const refusalsLeft = new Map<string, number>();
const accepted: { to: string; mail: ParsedMail }[] = [];
const flaky = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  logger: false,
  onRcptTo(address, _session, callback) {
    const left = refusalsLeft.get(address.address) ?? 0;
    if (left % 2 === 1) {
      refusalsLeft.set(address.address, left - 1);
      return callback(Object.assign(new Error('Try again later'), { responseCode: 451 }));
    }
    callback();
  },
  onData(stream, session, callback) {
    simpleParser(stream).then((parsed) => {
      const to = session.envelope.rcptTo[0].address;
      const left = refusalsLeft.get(to) ?? 0;
      if (left > 0) {
        refusalsLeft.set(to, left - 1);
        return callback(Object.assign(new Error('Transaction failed'), { responseCode: 554 }));
      }
      accepted.push({ to, mail: parsed });
      callback();
    }, callback);
  },
});
await new Promise<void>((resolve) => flaky.listen(0, '127.0.0.1', resolve));
const flakyPort = (flaky.server.address() as { port: number }).port;
afterAll(() => new Promise<void>((resolve) => flaky.close(resolve)));

const { app } = quickRetryTestApp({ SMTP_URL: `smtp://127.0.0.1:${flakyPort}` });
let team: Awaited<ReturnType<typeof makeTeamWithoutEvent>>;
beforeAll(async () => {
  team = await makeTeamWithoutEvent();
});

const queue = (to: string) =>
  inTransaction((transaction) =>
    enqueueMail(transaction, [{ teamId: team.team.id, kind: 'incident_alert', to, subject: 'Alert', text: 'An incident was reported.' }]),
  );
const acceptedFor = (to: string) => accepted.filter((delivery) => delivery.to === to).map((delivery) => delivery.mail);

describe('retries against a flaky mail server', () => {
  it('waits four times longer before each next retry', () => {
    expect([1, 2, 3].map((retry) => retryDelayMs(2000, retry))).toEqual([2000, 8000, 32000]);
  });

  it('delivers after refusals, on the last of its attempts, with the team and kind headers', async () => {
    const to = uniqueEmail('flaky');
    refusalsLeft.set(to, MAIL_ATTEMPTS - 1);
    await queue(to);

    const row = await waitForOutbox({ toAddress: to }, 'sent');
    expect(row.attempts).toBe(MAIL_ATTEMPTS);
    expect(row.lastError).toBeNull();
    const [delivered] = acceptedFor(to);
    expect(delivered.subject).toBe('Alert');
    expect(delivered.headers.get('x-pitwright-team')).toBe(team.team.id);
    expect(delivered.headers.get('x-pitwright-kind')).toBe('incident_alert');
  });

  it('marks a message failed after every attempt was refused, and a retry by hand delivers it', async () => {
    const to = uniqueEmail('refused-then-ok');
    refusalsLeft.set(to, MAIL_ATTEMPTS);
    await queue(to);

    const failed = await waitForOutbox({ toAddress: to }, 'failed');
    expect(failed.attempts).toBe(MAIL_ATTEMPTS);
    expect(failed.lastError).toMatch(/451|554/);
    expect(acceptedFor(to)).toEqual([]);

    const admin = await signIn(app, team.emails.admin, PASSWORD);
    const retried = await admin.post(`/api/team/mail-failures/${failed.id}/retry`);
    expect(retried.status).toBe(202);
    const sent = await waitForOutbox({ id: failed.id }, 'sent');
    expect(sent).toMatchObject({ attempts: 1, lastError: null, failedAt: null });
    expect(acceptedFor(to)).toHaveLength(1);
  });
});
