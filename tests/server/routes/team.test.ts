import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ROLES, type Role } from '../../../shared/roles';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { joinTeam, makeTeam, PASSWORD, uniqueEmail, type FactoryTeam } from '../../support/factories';

// GET /api/team, GET and POST /api/team/members. Editing members is in team-members-update.test.ts.
const { app } = testApp();
let team: FactoryTeam;
let clients: Record<Role, SignedIn>;
beforeAll(async () => {
  team = await makeTeam();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
});

const MAY_MANAGE: Record<Role, boolean> = { admin: true, lead: false, crew: false, battery: false, safety: false, viewer: false };
const TEMPORARY_PASSWORD = /^[a-km-zA-HJ-NP-Z2-9]{4}(-[a-km-zA-HJ-NP-Z2-9]{4}){3}$/;
// Sorted: members of the same name come in no fixed order.
const memberIds = async (client: SignedIn): Promise<string[]> => (await client.get('/api/team/members')).body.map((member: { id: string }) => member.id).sort();
const newMember = (overrides: Record<string, unknown> = {}) => ({ name: 'Riley Rivet', email: uniqueEmail('riley'), roles: ['crew'], ...overrides });

describe('signed out', () => {
  it('answers 401 on every team route', async () => {
    for (const answer of [
      await request(app).get('/api/team'),
      await request(app).get('/api/team/members'),
      await request(app).post('/api/team/members').send(newMember()),
    ]) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });
});

describe('GET /api/team', () => {
  for (const role of ROLES) {
    it(`${role}: answers the working team`, async () => {
      const answer = await clients[role].get('/api/team');
      expect(answer.status).toBe(200);
      expect(answer.body).toEqual({ id: team.team.id, name: team.team.name, number: team.team.number, currentEventId: team.event.id });
    });
  }
});

describe('GET /api/team/members', () => {
  for (const role of ROLES) {
    it(`${role}: lists only this team's members, by name, without password hashes`, async () => {
      await makeTeam(); // another team's members must not show up
      const answer = await clients[role].get('/api/team/members');
      expect(answer.status).toBe(200);
      expect(answer.body).toEqual(
        [...ROLES].sort().map((each) => ({
          id: team.memberships[each].id,
          userId: team.memberships[each].userId,
          name: `Factory ${each}`,
          // E-mail addresses only for those who manage members.
          ...(role === 'admin' ? { email: team.emails[each] } : {}),
          roles: [each],
          active: true,
          version: 0,
          createdAt: team.memberships[each].createdAt.toISOString(),
        })),
      );
      expect(answer.text).not.toMatch(/passwordHash|\$2[aby]\$/);
    });
  }
});

describe('POST /api/team/members per role', () => {
  for (const role of ROLES) {
    it(`${role}: ${MAY_MANAGE[role] ? 'may' : 'may not'} add a member`, async () => {
      const before = await memberIds(clients[role]);
      const answer = await clients[role].post('/api/team/members', newMember());
      if (MAY_MANAGE[role]) {
        expect(answer.status).toBe(201);
        expect(await memberIds(clients[role])).toHaveLength(before.length + 1);
      } else {
        expect(answer.status).toBe(403);
        expect(answer.body).toEqual(FORBIDDEN);
        expect(await memberIds(clients[role])).toEqual(before);
      }
    });
  }
});

describe('POST /api/team/members: bad input', () => {
  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['no roles', { roles: [] }, { roles: 'Give at least one role' }],
    ['an unknown role', { roles: ['crew', 'pilot'] }, { 'roles.1': 'One of admin, lead, crew, battery, safety, viewer' }],
    ['a bad e-mail', { email: 'riley-at-example' }, { email: 'Enter a valid e-mail address' }],
    ['an empty name', { name: '  ' }, { name: 'Give a name' }],
    ['a client id that is not a UUID', { id: 'member-1' }, { id: 'Must be a UUID' }],
  ];
  for (const [what, overrides, fields] of cases) {
    it(`answers 400 for ${what}, naming the field, and adds nobody`, async () => {
      const before = await memberIds(clients.admin);
      const answer = await clients.admin.post('/api/team/members', newMember(overrides));
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
      expect(await memberIds(clients.admin)).toEqual(before);
    });
  }
});

describe('POST /api/team/members: success', () => {
  it('answers 201 with a temporary password that signs the new member in', async () => {
    const email = uniqueEmail('new');
    const answer = await clients.admin.post('/api/team/members', newMember({ name: ' Riley Rivet ', email: `  ${email.toUpperCase()}`, roles: ['crew', 'battery', 'crew'] }));
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({
      id: expect.any(String),
      userId: expect.any(String),
      name: 'Riley Rivet',
      email,
      roles: ['crew', 'battery'],
      active: true,
      version: 0,
      createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      temporaryPassword: expect.stringMatching(TEMPORARY_PASSWORD),
    });
    const member = await signIn(app, email, answer.body.temporaryPassword);
    expect(member.session.memberships).toEqual([
      { id: answer.body.id, teamId: team.team.id, teamName: team.team.name, teamNumber: team.team.number, roles: ['crew', 'battery'], active: true },
    ]);
    expect((await member.get('/api/team')).body.id).toBe(team.team.id);
  });

  it('refuses an e-mail that has an account with another team, and leaks nothing of it', async () => {
    const other = await makeTeam();
    const before = await memberIds(clients.admin);
    const answer = await clients.admin.post('/api/team/members', newMember({ email: other.emails.safety, roles: ['admin'] }));
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({
      error: {
        code: 'account_exists',
        message: 'This e-mail already has a Pitwright account with another team',
        fields: { email: 'Already has an account with another team: ask them to use another e-mail' },
      },
    });
    expect(await memberIds(clients.admin)).toEqual(before);
    await signIn(app, other.emails.safety, PASSWORD);
  });

  it('lets an account with two teams switch between them, with each team\'s roles', async () => {
    const other = await makeTeam();
    await joinTeam(other.memberships.safety.userId, team.team.id, ['viewer']);
    const member = await signIn(app, other.emails.safety, PASSWORD);
    const session = await member.get('/api/session');
    expect(session.body.memberships.map((m: { teamId: string; roles: Role[] }) => [m.teamId, m.roles])).toEqual([
      [other.team.id, ['safety']],
      [team.team.id, ['viewer']],
    ]);
    expect((await member.get('/api/team')).body.id).toBe(other.team.id);

    const switched = await member.patch('/api/session', { teamId: team.team.id });
    expect(switched.status).toBe(200);
    expect(switched.body.memberships.find((m: { active: boolean }) => m.active).teamId).toBe(team.team.id);
    expect((await member.get('/api/team')).body).toEqual({ id: team.team.id, name: team.team.name, number: team.team.number, currentEventId: team.event.id });
    // Its roles here are this team's: a viewer may not add events.
    expect((await member.post('/api/events', {})).status).toBe(403);
  });

  it('answers 409 already_member for an e-mail already in the team', async () => {
    const before = await memberIds(clients.admin);
    const answer = await clients.admin.post('/api/team/members', newMember({ email: team.emails.crew.toUpperCase(), roles: ['admin'] }));
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({
      error: { code: 'already_member', message: 'This e-mail is already a member of the team', fields: { email: 'Already a member of the team' } },
    });
    expect(await memberIds(clients.admin)).toEqual(before);
    expect((await clients.crew.get('/api/session')).body.memberships[0].roles).toEqual(['crew']);
  });
});

describe('POST /api/team/members with a client id', () => {
  it('adds once: resending the same id answers 200 with the same member and no new password', async () => {
    const id = randomUUID();
    const body = newMember({ id });
    const before = await memberIds(clients.admin);
    const first = await clients.admin.post('/api/team/members', body);
    expect(first.status).toBe(201);
    expect(first.body.id).toBe(id);
    const again = await clients.admin.post('/api/team/members', body);
    expect(again.status).toBe(200);
    const { temporaryPassword, ...member } = first.body;
    expect(temporaryPassword).toMatch(TEMPORARY_PASSWORD);
    expect(again.body).toEqual({ ...member, temporaryPassword: null });
    expect(await memberIds(clients.admin)).toHaveLength(before.length + 1);
  });

  it('adds once when the resent create arrives while the first is still running', async () => {
    const id = randomUUID();
    const body = newMember({ id });
    const before = await memberIds(clients.admin);
    const answers = await Promise.all([clients.admin.post('/api/team/members', body), clients.admin.post('/api/team/members', body)]);
    expect(answers.map((answer) => answer.status).sort()).toEqual([200, 201]);
    expect(answers.map((answer) => answer.body.id)).toEqual([id, id]);
    expect(await memberIds(clients.admin)).toHaveLength(before.length + 1);
  });

  it("answers 409 id_taken for another team's membership id", async () => {
    const foreign = await makeTeam();
    const answer = await clients.admin.post('/api/team/members', newMember({ id: foreign.memberships.lead.id }));
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({ error: { code: 'id_taken', message: 'This id is already used by another record' } });
    expect(answer.text).not.toContain(foreign.emails.lead);
  });
});
