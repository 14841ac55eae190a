import { randomUUID } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import nodemailer from 'nodemailer';
import { FAKE_MAX_BYTES, startSmtpFake, type ReceivedMail } from '../../../server/mail/smtp-fake';
import { testApp } from '../../support/app';
import { uniqueEmail } from '../../support/factories';
import { waitForMailTo } from '../../support/mail';

// The fake `npm test` runs (server/mail/smtp-fake-main.ts) on SMTP_PORT, storing in the test database.
const { config } = testApp();
const toFake = nodemailer.createTransport({ url: config.mail.url });
afterAll(() => toFake.close());

describe('the SMTP fake service', () => {
  it('stores a message nodemailer sends: envelope recipients, sender, subject, text and the team header', async () => {
    const teamId = randomUUID();
    const to = uniqueEmail('fake-to');
    const hidden = uniqueEmail('fake-bcc');
    await toFake.sendMail({
      from: 'Pitwright <no-reply@pitwright.localhost>',
      to,
      bcc: hidden,
      subject: 'Battery acid in the pit — Größe',
      text: 'First line\nSecond line',
      headers: { 'X-Pitwright-Team': teamId.toUpperCase() },
    });

    const [stored] = await waitForMailTo(to);
    expect(stored.toJSON()).toEqual({
      id: expect.any(String),
      teamId,
      fromAddress: '"Pitwright" <no-reply@pitwright.localhost>',
      toAddresses: `${to}, ${hidden}`,
      subject: 'Battery acid in the pit — Größe',
      text: 'First line\nSecond line\n',
      receivedAt: expect.any(Date),
    });
  });

  it('files mail without a Pitwright team header (or with a header that is no UUID) under no team', async () => {
    const to = uniqueEmail('fake-plain');
    const other = uniqueEmail('fake-odd');
    await toFake.sendMail({ from: 'someone@example.org', to, subject: 'Plain', text: 'No header' });
    await toFake.sendMail({ from: 'someone@example.org', to: other, subject: 'Odd', text: 'Odd header', headers: { 'X-Pitwright-Team': 'team-7' } });

    expect((await waitForMailTo(to))[0].teamId).toBeNull();
    expect((await waitForMailTo(other))[0].teamId).toBeNull();
  });
});

describe('startSmtpFake', () => {
  it('refuses a message over 2 MB and keeps nothing of it', async () => {
    const received: ReceivedMail[] = [];
    const fake = await startSmtpFake({ host: '127.0.0.1', port: 0, store: async (mail) => void received.push(mail) });
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false });
    try {
      await expect(
        transport.sendMail({ from: 'a@example.org', to: 'b@example.org', subject: 'Big', text: 'x'.repeat(FAKE_MAX_BYTES + 1) }),
      ).rejects.toMatchObject({ responseCode: 552 });
      await transport.sendMail({ from: 'a@example.org', to: 'b@example.org', subject: 'Small', text: 'fits' });
      expect(received.map((mail) => mail.subject)).toEqual(['Small']);
    } finally {
      transport.close();
      await fake.close();
    }
  });
});
