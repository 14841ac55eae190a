import { beforeAll, describe, expect, it } from 'vitest';
import { inTransaction } from '../../../server/db/transaction';
import { enqueueMail } from '../../../server/mail/outbox';
import { OutboxMail } from '../../../server/models';
import { makeTeamWithoutEvent, uniqueEmail } from '../../support/factories';
import { quickRetryTestApp, waitForMailTo, waitForOutbox } from '../../support/mail';

// Mail goes to the SMTP fake `npm test` runs on SMTP_PORT.
quickRetryTestApp();
let teamId: string;
beforeAll(async () => {
  teamId = (await makeTeamWithoutEvent()).team.id;
});

describe('the mail dispatcher', () => {
  it('sends a queued message once its change commits, filed under its team in the fake', async () => {
    const to = uniqueEmail('dispatch');
    await inTransaction((transaction) =>
      enqueueMail(transaction, [{ teamId, kind: 'incident_alert', to, subject: 'Incident in the pit', text: 'Open the safety log.' }]),
    );

    const [received] = await waitForMailTo(to);
    expect(received).toMatchObject({ teamId, toAddresses: to, subject: 'Incident in the pit', text: 'Open the safety log.\n' });
    expect(received.fromAddress).toContain('no-reply@pitwright.localhost');
    const row = await waitForOutbox({ toAddress: to }, 'sent');
    expect(row).toMatchObject({ attempts: 1, lastError: null, claimedUntil: null, sentAt: expect.any(Date) });
  });

  it('queues nothing for a change that is rolled back', async () => {
    const to = uniqueEmail('rolled-back');
    await expect(
      inTransaction(async (transaction) => {
        await enqueueMail(transaction, [{ teamId, kind: 'invite', to, subject: 'Never', text: 'Never sent' }]);
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    expect(await OutboxMail.count({ where: { toAddress: to } })).toBe(0);
  });
});
