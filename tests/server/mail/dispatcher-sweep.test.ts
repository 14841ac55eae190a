import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMailDispatcher } from '../../../server/mail/dispatcher';
import { CLAIM_MS, claimDueMail } from '../../../server/mail/outbox';
import { OutboxMail } from '../../../server/models';
import { makeTeamWithoutEvent, uniqueEmail } from '../../support/factories';
import { quickRetryTestApp, waitForMailTo, waitForOutbox } from '../../support/mail';

// Rows as a process leaves them when it stops between queueing and sending.
const { config } = quickRetryTestApp();
let teamId: string;
beforeAll(async () => {
  teamId = (await makeTeamWithoutEvent()).team.id;
});

const leftBehind = (to: string, claimedUntil: Date | null) =>
  OutboxMail.create({ teamId, kind: 'incident_alert', toAddress: to, subject: 'Left behind', text: 'Queued before a crash', nextAttemptAt: new Date(Date.now() - 1000), claimedUntil });

describe('claiming due mail', () => {
  it('gives a message whose claim ran out to exactly one of two processes sweeping at once', async () => {
    const row = await leftBehind(uniqueEmail('claim'), new Date(Date.now() - 1000));
    const [first, second] = await Promise.all([claimDueMail(50), claimDueMail(50)]);
    expect([...first, ...second].filter((id) => id === row.id)).toHaveLength(1);
    await row.reload();
    expect(row.claimedUntil!.getTime()).toBeGreaterThan(Date.now() + CLAIM_MS - 60_000);
  });

  it('leaves a message another process still holds', async () => {
    const row = await leftBehind(uniqueEmail('held'), new Date(Date.now() + CLAIM_MS));
    expect(await claimDueMail(50)).not.toContain(row.id);
  });
});

describe('the sweep', () => {
  const other = createMailDispatcher(config.mail);
  afterAll(() => other.stop());

  it('sends, when a dispatcher starts, the messages a stopped process left behind', async () => {
    const to = uniqueEmail('swept');
    await leftBehind(to, null);
    other.start();
    const [received] = await waitForMailTo(to);
    expect(received).toMatchObject({ teamId, subject: 'Left behind' });
    await waitForOutbox({ toAddress: to }, 'sent');
  });
});
