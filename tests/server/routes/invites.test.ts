import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { INVITE_VALID_DAYS } from '../../../shared/schemas/mail';
import { AccountLink, OutboxMail } from '../../../server/models';
import { hashLinkToken } from '../../../server/auth/link-tokens';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeamWithoutEvent, PASSWORD, uniqueEmail } from '../../support/factories';
import { linkTokenIn, waitForMailTo } from '../../support/mail';

const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeamWithoutEvent>>;
let admin: SignedIn;
beforeAll(async () => {
  team = await makeTeamWithoutEvent();
  admin = await signIn(app, team.emails.admin, PASSWORD);
});

const LINK_NOT_VALID = {
  error: { code: 'link_not_valid', message: 'This link is not valid: it was used already, withdrawn, or it expired. Ask for a new one.' },
};
const NEW_PASSWORD = 'a-brand-new-password';

const invite = (email: string, extra: object = {}) => admin.post('/api/team/invites', { name: 'Katherine Johnson', email, roles: ['crew', 'battery'], ...extra });
const check = (token: string) => request(app).post('/api/account-links/check').send({ token });
const use = (token: string, password: string) => request(app).post('/api/account-links/use').send({ token, password });
async function tokenMailedTo(email: string, count = 1) {
  const mails = await waitForMailTo(email, { count });
  return linkTokenIn(mails[count - 1].text);
}

const inviteShape = (email: string) => ({
  invite: {
    id: expect.any(String),
    name: 'Katherine Johnson',
    email,
    roles: ['crew', 'battery'],
    expiresAt: expect.any(String),
    createdAt: expect.any(String),
  },
});

describe('POST /api/team/invites', () => {
  it('mails a one-time link that makes the account and the membership, and signs in', async () => {
    const email = uniqueEmail('invited');
    const answer = await invite(email);
    expect(answer.status).toBe(202);
    expect(answer.body).toEqual(inviteShape(email));
    const { expiresAt, createdAt } = answer.body.invite;
    expect(Date.parse(expiresAt) - Date.parse(createdAt)).toBeGreaterThanOrEqual(INVITE_VALID_DAYS * 86_400_000 - 1000);
    expect(Date.parse(expiresAt) - Date.parse(createdAt)).toBeLessThanOrEqual(INVITE_VALID_DAYS * 86_400_000 + 1000);

    const [mail] = await waitForMailTo(email);
    expect(mail.subject).toBe(`Join ${team.team.name} on Pitwright`);
    expect(mail.text).toContain('Factory admin invites you');
    expect(mail.text).toMatch(/http:\/\/localhost:\d+\/account-link#token=[A-Za-z0-9_-]{43}\n/);
    const token = linkTokenIn(mail.text);
    // Only the hash is kept.
    expect(await AccountLink.count({ where: { tokenHash: token } })).toBe(0);
    expect(await AccountLink.count({ where: { tokenHash: hashLinkToken(token) } })).toBe(1);

    const checked = await check(token);
    expect(checked.status).toBe(200);
    expect(checked.body).toEqual({ purpose: 'invite', email, teamName: team.team.name, hasAccount: false, expiresAt });

    const used = await use(token, NEW_PASSWORD);
    expect(used.status).toBe(200);
    expect(used.body.user).toEqual({ id: expect.any(String), name: 'Katherine Johnson', email });
    expect(used.body.memberships).toEqual([expect.objectContaining({ teamId: team.team.id, roles: ['crew', 'battery'], active: true })]);
    expect(used.body.features).toEqual({ mailbox: true });
    const cookie = used.headers['set-cookie'];
    expect((await request(app).get('/api/session').set('Cookie', cookie)).status).toBe(200);
    await signIn(app, email, NEW_PASSWORD);

    expect((await use(token, NEW_PASSWORD)).body).toEqual(LINK_NOT_VALID);
    expect((await use(token, NEW_PASSWORD)).status).toBe(404);
    expect((await check(token)).body).toEqual(LINK_NOT_VALID);
  });

  it('answers an address with an account in another team exactly as a new one; that account accepts with its password', async () => {
    const elsewhere = await makeTeamWithoutEvent();
    const existing = elsewhere.emails.lead;
    const fresh = uniqueEmail('fresh');
    const forExisting = await invite(existing);
    const forFresh = await invite(fresh);
    expect(forExisting.status).toBe(forFresh.status);
    expect(forExisting.body).toEqual(inviteShape(existing));
    expect(forFresh.body).toEqual(inviteShape(fresh));
    const token = await tokenMailedTo(existing);
    // The mail says the same to both, for the team's mentors may read it in the Mailbox.
    const [existingMail] = await waitForMailTo(existing);
    const [freshMail] = await waitForMailTo(fresh);
    expect(existingMail.text.replace(/token=\S+/, '')).toBe(freshMail.text.replace(/token=\S+/, ''));

    expect((await check(token)).body).toMatchObject({ purpose: 'invite', email: existing, hasAccount: true });
    const wrong = await use(token, 'not-the-password-of-it');
    expect(wrong.status).toBe(400);
    expect(wrong.body).toEqual(invalid({ password: 'Not the password of the account of this e-mail address' }));
    expect(wrong.headers['set-cookie']).toBeUndefined();

    const used = await use(token, PASSWORD);
    expect(used.status).toBe(200);
    expect(used.body.memberships).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ teamId: elsewhere.team.id, roles: ['lead'], active: false }),
        expect.objectContaining({ teamId: team.team.id, roles: ['crew', 'battery'], active: true }),
      ]),
    );
    // The account's password stays its own.
    await signIn(app, existing, PASSWORD);
  });

  it('refuses an address that is a member of this team already', async () => {
    const answer = await invite(team.emails.viewer);
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({
      error: { code: 'already_member', message: 'This e-mail is already a member of the team', fields: { email: 'Already a member of the team' } },
    });
  });

  it('is idempotent on the client id: a resend answers the first invite and mails nothing more', async () => {
    const email = uniqueEmail('resent');
    const id = randomUUID();
    const first = await invite(email, { id });
    const again = await invite(email, { id });
    expect(again.status).toBe(202);
    expect(again.body).toEqual(first.body);
    expect(first.body.invite.id).toBe(id);
    expect(await OutboxMail.count({ where: { toAddress: email } })).toBe(1);
  });

  it('replaces an earlier invite of the same address: only the newest link works', async () => {
    const email = uniqueEmail('reinvited');
    await invite(email);
    const earlier = await tokenMailedTo(email);
    await invite(email);
    const newer = await tokenMailedTo(email, 2);
    expect((await check(earlier)).body).toEqual(LINK_NOT_VALID);
    expect((await check(newer)).status).toBe(200);
  });

  it('needs a session, checks the input, and is for admins only', async () => {
    expect((await request(app).get('/api/team/invites')).body).toEqual(UNAUTHENTICATED);
    expect((await request(app).post('/api/team/invites').send({})).status).toBe(401);
    const answer = await admin.post('/api/team/invites', { name: ' ', email: 'not-an-address', roles: [] });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ name: 'Give a name', email: 'Enter a valid e-mail address', roles: 'Give at least one role' }));
    const lead = await signIn(app, team.emails.lead, PASSWORD);
    expect((await lead.post('/api/team/invites', { name: 'A', email: uniqueEmail('x'), roles: ['crew'] })).body).toEqual(FORBIDDEN);
    expect((await lead.get('/api/team/invites')).body).toEqual(FORBIDDEN);
  });
});

describe('using an invite link', () => {
  it('asks a new account for a password that follows the rules, and keeps the link usable', async () => {
    const email = uniqueEmail('short-password');
    await invite(email);
    const token = await tokenMailedTo(email);
    const short = await use(token, 'short');
    expect(short.status).toBe(400);
    expect(short.body).toEqual(invalid({ password: 'At least 10 characters' }));
    expect((await use(token, NEW_PASSWORD)).status).toBe(200);
  });

  it('refuses an expired link', async () => {
    const email = uniqueEmail('expired');
    const { body } = await invite(email);
    const token = await tokenMailedTo(email);
    await AccountLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: body.invite.id } });
    expect((await check(token)).body).toEqual(LINK_NOT_VALID);
    expect((await use(token, NEW_PASSWORD)).body).toEqual(LINK_NOT_VALID);
    expect((await admin.get('/api/team/invites')).body.invites.map((pending: { id: string }) => pending.id)).not.toContain(body.invite.id);
  });

  it('refuses a link that is not one', async () => {
    const unknown = await check('A'.repeat(43));
    expect(unknown.status).toBe(404);
    expect(unknown.body).toEqual(LINK_NOT_VALID);
    expect((await check('short')).body).toEqual(invalid({ token: 'The link is not complete' }));
  });
});

describe('GET and DELETE /api/team/invites', () => {
  it('lists the pending invites, newest first; a revoked one is gone and its link no longer works', async () => {
    const own = await makeTeamWithoutEvent();
    const ownAdmin = await signIn(app, own.emails.admin, PASSWORD);
    const older = uniqueEmail('older');
    const newer = uniqueEmail('newer');
    const first = await ownAdmin.post('/api/team/invites', { name: 'Older', email: older, roles: ['viewer'] });
    const second = await ownAdmin.post('/api/team/invites', { name: 'Newer', email: newer, roles: ['safety'] });
    const listed = await ownAdmin.get('/api/team/invites');
    expect(listed.status).toBe(200);
    expect(listed.body).toEqual({ invites: [second.body.invite, first.body.invite] });

    const token = await tokenMailedTo(older);
    // Another team's admin cannot withdraw it.
    expect((await admin.delete(`/api/team/invites/${first.body.invite.id}`)).status).toBe(404);
    expect((await ownAdmin.delete(`/api/team/invites/${first.body.invite.id}`)).status).toBe(204);
    expect((await ownAdmin.get('/api/team/invites')).body).toEqual({ invites: [second.body.invite] });
    expect((await check(token)).body).toEqual(LINK_NOT_VALID);
    const again = await ownAdmin.delete(`/api/team/invites/${first.body.invite.id}`);
    expect(again.status).toBe(404);
    expect(again.body).toEqual({ error: { code: 'not_found', message: 'Invite not found' } });
  });
});
