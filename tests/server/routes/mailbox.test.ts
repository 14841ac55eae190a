import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { signIn, signInEveryRole, testApp } from '../../support/app';
import { FORBIDDEN, UNAUTHENTICATED } from '../../support/errors';
import { makeTeamWithoutEvent, PASSWORD, uniqueEmail } from '../../support/factories';
import { waitForMailTo } from '../../support/mail';

// SMTP_URL is unset: mail goes to the SMTP fake, and the Mailbox shows it.
const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeamWithoutEvent>>;
beforeAll(async () => {
  team = await makeTeamWithoutEvent();
});

const invite = (client: Awaited<ReturnType<typeof signIn>>, email: string) => client.post('/api/team/invites', { name: 'Grace Hopper', email, roles: ['crew'] });

describe('GET /api/mailbox', () => {
  it('shows an admin what the fake received for the team, newest first, and nothing of another team', async () => {
    const admin = await signIn(app, team.emails.admin, PASSWORD);
    const first = uniqueEmail('mailbox-first');
    const second = uniqueEmail('mailbox-second');
    expect((await invite(admin, first)).status).toBe(202);
    await waitForMailTo(first);
    expect((await invite(admin, second)).status).toBe(202);
    await waitForMailTo(second);

    const other = await makeTeamWithoutEvent();
    const otherAdmin = await signIn(app, other.emails.admin, PASSWORD);
    const elsewhere = uniqueEmail('mailbox-elsewhere');
    await invite(otherAdmin, elsewhere);
    await waitForMailTo(elsewhere);

    const answer = await admin.get('/api/mailbox');
    expect(answer.status).toBe(200);
    expect(answer.body.messages).toHaveLength(2);
    expect(answer.body.messages.map((message: { to: string }) => message.to)).toEqual([second, first]);
    expect(answer.body.messages[0]).toEqual({
      id: expect.any(String),
      to: second,
      subject: `Join ${team.team.name} on Pitwright`,
      receivedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      text: expect.stringContaining('/account-link#token='),
    });
    expect((await otherAdmin.get('/api/mailbox')).body.messages.map((message: { to: string }) => message.to)).toEqual([elsewhere]);
  });

  it('is for admins only', async () => {
    expect((await request(app).get('/api/mailbox')).body).toEqual(UNAUTHENTICATED);
    const clients = await signInEveryRole(app, team.emails, PASSWORD);
    for (const role of ['lead', 'crew', 'battery', 'safety', 'viewer'] as const) {
      const answer = await clients[role].get('/api/mailbox');
      expect(answer.status, role).toBe(403);
      expect(answer.body).toEqual(FORBIDDEN);
    }
  });

  it('is announced in the session as a feature of this server', async () => {
    const crew = await signIn(app, team.emails.crew, PASSWORD);
    expect(crew.session.features).toEqual({ mailbox: true });
    expect((await crew.get('/api/session')).body.features).toEqual({ mailbox: true });
  });
});
