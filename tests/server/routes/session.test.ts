import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { SESSION_COOKIE } from '../../../server/app';
import { signIn, testApp } from '../../support/app';
import { makeTeam, PASSWORD } from '../../support/factories';

const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

const sessionCookie = (answer: request.Response) =>
  ([] as string[]).concat(answer.headers['set-cookie'] ?? []).find((cookie) => cookie.startsWith(`${SESSION_COOKIE}=`));

describe('POST /api/session', () => {
  it('signs in with the right password and answers user, memberships and a CSRF token', async () => {
    const answer = await request(app).post('/api/session').send({ email: team.emails.lead, password: PASSWORD });
    expect(answer.status).toBe(200);
    expect(answer.body.user).toEqual({ id: expect.any(String), name: 'Factory lead', email: team.emails.lead });
    expect(answer.body.memberships).toEqual([
      { id: team.memberships.lead.id, teamId: team.team.id, teamName: team.team.name, teamNumber: team.team.number, roles: ['lead'], active: true },
    ]);
    expect(answer.body.csrfToken).toMatch(/.{20,}/);
    const cookie = sessionCookie(answer)!;
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/); // plain http here; TLS makes it Secure
  });

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const answer = await request(app).post('/api/session').send({ email: `  ${team.emails.crew.toUpperCase()} `, password: PASSWORD });
    expect(answer.status).toBe(200);
  });

  it('answers 401 invalid_credentials for a wrong password and for an unknown e-mail alike', async () => {
    const wrong = await request(app).post('/api/session').send({ email: team.emails.lead, password: 'not-the-password' });
    const unknown = await request(app).post('/api/session').send({ email: 'nobody@factory.pitwright.test', password: PASSWORD });
    for (const answer of [wrong, unknown]) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual({ error: { code: 'invalid_credentials', message: 'Wrong e-mail or password' } });
      expect(sessionCookie(answer)).toBeUndefined();
    }
  });

  it('names each bad field', async () => {
    const answer = await request(app).post('/api/session').send({ email: 'not-an-email', password: '' });
    expect(answer.status).toBe(400);
    expect(answer.body.error.code).toBe('invalid');
    expect(answer.body.error.fields).toEqual({ email: 'Enter a valid e-mail address', password: 'Enter your password' });
  });

  it('gives a new session id at sign-in (no session fixation)', async () => {
    const agent = request.agent(app);
    const before = await agent.post('/api/session').send({ email: team.emails.viewer, password: PASSWORD });
    const again = await agent.post('/api/session').send({ email: team.emails.viewer, password: PASSWORD });
    const idOf = (answer: request.Response) => sessionCookie(answer)!.split(';')[0];
    expect(idOf(before)).not.toBe(idOf(again));
    // The old id no longer works.
    const withOld = await request(app).get('/api/session').set('Cookie', idOf(before));
    expect(withOld.status).toBe(401);
    const withNew = await request(app).get('/api/session').set('Cookie', idOf(again));
    expect(withNew.status).toBe(200);
  });

  it('refuses an account whose only membership is deactivated', async () => {
    const other = await makeTeam();
    await other.memberships.crew.update({ active: false });
    const answer = await request(app).post('/api/session').send({ email: other.emails.crew, password: PASSWORD });
    expect(answer.status).toBe(403);
    expect(answer.body.error.code).toBe('no_active_membership');
  });
});

describe('GET and DELETE /api/session', () => {
  it('answers 401 when signed out', async () => {
    const answer = await request(app).get('/api/session');
    expect(answer.status).toBe(401);
    expect(answer.body).toEqual({ error: { code: 'unauthenticated', message: 'Sign in first' } });
  });

  it('answers the same shape as sign-in, then sign-out ends the session for good', async () => {
    const client = await signIn(app, team.emails.admin, PASSWORD);
    const current = await client.get('/api/session');
    expect(current.status).toBe(200);
    expect(current.body).toEqual(client.session);

    const out = await client.delete('/api/session');
    expect(out.status).toBe(204);
    expect((await client.get('/api/session')).status).toBe(401);
    expect((await client.get('/api/team')).status).toBe(401);
  });
});

describe('CSRF', () => {
  it('refuses a signed-in write without the x-csrf-token header, or with a wrong one', async () => {
    const client = await signIn(app, team.emails.admin, PASSWORD);
    const missing = await client.agent.delete('/api/session');
    expect(missing.status).toBe(403);
    expect(missing.body.error.code).toBe('csrf');
    const wrong = await client.agent.patch(`/api/events/${team.event.id}`).set('x-csrf-token', 'forged').send({ name: 'Changed' });
    expect(wrong.status).toBe(403);
    expect((await client.get(`/api/events/${team.event.id}`)).body.name).toBe(team.event.name);
    // Still signed in: the forged request did nothing.
    expect((await client.get('/api/session')).status).toBe(200);
  });
});

describe('PUT /api/session/password', () => {
  it('changes the password after checking the current one, and signs out other devices', async () => {
    const other = await makeTeam();
    const tablet = await signIn(app, other.emails.crew, PASSWORD);
    const phone = await signIn(app, other.emails.crew, PASSWORD);

    const wrong = await phone.put('/api/session/password', { currentPassword: 'nope', newPassword: 'a-new-password-1' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual({ currentPassword: 'Not your current password' });

    const short = await phone.put('/api/session/password', { currentPassword: PASSWORD, newPassword: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toEqual({ newPassword: 'At least 10 characters' });

    const changed = await phone.put('/api/session/password', { currentPassword: PASSWORD, newPassword: 'a-new-password-1' });
    expect(changed.status).toBe(204);
    expect((await phone.get('/api/session')).status).toBe(200);
    expect((await tablet.get('/api/session')).status).toBe(401);
    expect((await request(app).post('/api/session').send({ email: other.emails.crew, password: PASSWORD })).status).toBe(401);
    await signIn(app, other.emails.crew, 'a-new-password-1');
  });
});

describe('new password length', () => {
  it('refuses a new password longer than the 72 bytes bcrypt reads', async () => {
    const client = await signIn(app, team.emails.battery, PASSWORD);
    const answer = await client.put('/api/session/password', { currentPassword: PASSWORD, newPassword: 'é'.repeat(37) });
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields).toEqual({ newPassword: 'At most 72 bytes (about 72 letters)' });
  });
});
