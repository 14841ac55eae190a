import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { RESET_VALID_MINUTES } from '../../../shared/schemas/mail';
import { AccountLink, OutboxMail } from '../../../server/models';
import { hashLinkToken } from '../../../server/auth/link-tokens';
import { RESETS_PER_EMAIL_PER_HOUR } from '../../../server/commands/request-password-reset';
import { signIn, testApp } from '../../support/app';
import { invalid } from '../../support/errors';
import { joinTeam, makeTeamWithoutEvent, PASSWORD, uniqueEmail } from '../../support/factories';
import { linkTokenIn, waitForMailTo, waitForOutbox } from '../../support/mail';

const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeamWithoutEvent>>;
beforeAll(async () => {
  team = await makeTeamWithoutEvent();
});

const REQUESTED = {
  message: `If this address belongs to a Pitwright account, an e-mail with a link to choose a new password is on its way. The link works for ${RESET_VALID_MINUTES} minutes.`,
};
const LINK_NOT_VALID = {
  error: { code: 'link_not_valid', message: 'This link is not valid: it was used already, withdrawn, or it expired. Ask for a new one.' },
};
const NEW_PASSWORD = 'my-new-pit-password';

const requestReset = (email: string) => request(app).post('/api/session/password-reset').send({ email });
const check = (token: string) => request(app).post('/api/account-links/check').send({ token });
const use = (token: string, password: string) => request(app).post('/api/account-links/use').send({ token, password });
const signInStatus = async (email: string, password: string) => (await request(app).post('/api/session').send({ email, password })).status;
async function resetToken(email: string, count = 1) {
  const mails = await waitForMailTo(email, { count });
  return linkTokenIn(mails[count - 1].text);
}

describe('POST /api/session/password-reset', () => {
  it('answers the same for a known and an unknown address, and mails only the known one', async () => {
    const unknown = uniqueEmail('nobody');
    const known = await requestReset(team.emails.battery);
    const notKnown = await requestReset(unknown);
    expect(known.status).toBe(202);
    expect(notKnown.status).toBe(202);
    expect(known.body).toEqual(REQUESTED);
    expect(notKnown.body).toEqual(REQUESTED);
    // Queued in the request's own transaction: nothing there now means nothing will be sent.
    expect(await OutboxMail.count({ where: { toAddress: unknown } })).toBe(0);
    expect(await AccountLink.count({ where: { email: unknown } })).toBe(0);

    const [mail] = await waitForMailTo(team.emails.battery);
    expect(mail.subject).toBe('Choose a new Pitwright password');
    // Filed under the account's team, whose Mailbox shows it.
    expect(mail.teamId).toBe(team.team.id);
  });

  it('sends a link that works for 60 minutes, once: the new password replaces the old, other devices are signed out', async () => {
    const email = team.emails.crew;
    const otherDevice = await signIn(app, email, PASSWORD);
    const before = Date.now();
    await requestReset(email);
    const after = Date.now();
    const token = await resetToken(email);

    const checked = await check(token);
    expect(checked.status).toBe(200);
    expect(checked.body).toEqual({ purpose: 'reset', email, teamName: null, hasAccount: true, expiresAt: expect.any(String) });
    const expiresAt = Date.parse(checked.body.expiresAt);
    expect(expiresAt).toBeGreaterThanOrEqual(before + RESET_VALID_MINUTES * 60_000);
    expect(expiresAt).toBeLessThanOrEqual(after + RESET_VALID_MINUTES * 60_000);

    const used = await use(token, NEW_PASSWORD);
    expect(used.status).toBe(200);
    expect(used.body.user.email).toBe(email);
    expect(used.body.memberships).toEqual([expect.objectContaining({ teamId: team.team.id, active: true })]);
    expect((await request(app).get('/api/session').set('Cookie', used.headers['set-cookie'])).status).toBe(200);

    expect((await otherDevice.get('/api/session')).status).toBe(401);
    expect(await signInStatus(email, PASSWORD)).toBe(401);
    expect(await signInStatus(email, NEW_PASSWORD)).toBe(200);
    expect((await use(token, 'yet-another-password')).body).toEqual(LINK_NOT_VALID);
    expect(await signInStatus(email, NEW_PASSWORD)).toBe(200);
  });

  it('spends every other reset link of the account when one is used', async () => {
    const email = team.emails.lead;
    await requestReset(email);
    await requestReset(email);
    const first = await resetToken(email, 1);
    const second = await resetToken(email, 2);
    expect((await use(second, NEW_PASSWORD)).status).toBe(200);
    expect((await check(first)).body).toEqual(LINK_NOT_VALID);
  });

  it('keeps no usable link in the outbox once the mail is sent: a copy of the database opens nothing', async () => {
    const email = team.emails.admin;
    await requestReset(email);
    const token = await resetToken(email);
    const sent = await waitForOutbox({ toAddress: email, kind: 'password_reset' }, 'sent');
    expect(sent.text).not.toContain(token);
    expect(sent.subject).toBe('Choose a new Pitwright password');
    // Only the stored copy lost it: the link in the e-mail still works.
    expect((await check(token)).status).toBe(200);
  });

  it('refuses a link past its 60 minutes', async () => {
    const email = team.emails.safety;
    await requestReset(email);
    const token = await resetToken(email);
    await AccountLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashLinkToken(token) } });
    expect((await check(token)).body).toEqual(LINK_NOT_VALID);
    const used = await use(token, NEW_PASSWORD);
    expect(used.status).toBe(404);
    expect(used.body).toEqual(LINK_NOT_VALID);
    expect(await signInStatus(email, PASSWORD)).toBe(200);
  });

  it('asks for a password that follows the rules, and keeps the link usable', async () => {
    const email = team.emails.viewer;
    await requestReset(email);
    const token = await resetToken(email);
    const short = await use(token, 'short');
    expect(short.status).toBe(400);
    expect(short.body).toEqual(invalid({ password: 'At least 10 characters' }));
    const long = await use(token, 'a'.repeat(201));
    expect(long.status).toBe(400);
    expect(long.body).toEqual(invalid({ password: 'At most 200 characters' }));
    expect(await signInStatus(email, PASSWORD)).toBe(200);
    expect((await use(token, NEW_PASSWORD)).status).toBe(200);
  });

  it(`mails one address at most ${RESETS_PER_EMAIL_PER_HOUR} times an hour, and answers the same after`, async () => {
    const other = await makeTeamWithoutEvent();
    const email = other.emails.crew;
    for (let request = 1; request <= RESETS_PER_EMAIL_PER_HOUR + 2; request++) {
      const answer = await requestReset(email);
      expect(answer.status).toBe(202);
      expect(answer.body).toEqual(REQUESTED);
    }
    expect(await OutboxMail.count({ where: { toAddress: email, kind: 'password_reset' } })).toBe(RESETS_PER_EMAIL_PER_HOUR);
  });

  it('mails nothing to an account no longer active in any team; a shared account’s mail goes to its first team', async () => {
    const gone = await makeTeamWithoutEvent();
    await gone.memberships.crew.update({ active: false });
    await requestReset(gone.emails.crew);
    expect(await OutboxMail.count({ where: { toAddress: gone.emails.crew } })).toBe(0);

    await joinTeam(gone.memberships.lead.userId, team.team.id, ['crew']);
    await requestReset(gone.emails.lead);
    expect((await waitForMailTo(gone.emails.lead))[0].teamId).toBe(gone.team.id);
  });

  it('checks the address', async () => {
    const answer = await request(app).post('/api/session/password-reset').send({ email: 'nope' });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ email: 'Enter a valid e-mail address' }));
  });
});
