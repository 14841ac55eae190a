import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ROLES, type Role } from '../../../shared/roles';
import { Membership } from '../../../server/models';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { eventBody, joinTeam, makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';

// PATCH /api/team/members/:id. Every test that changes members makes its own team.
const { app } = testApp();
let team: FactoryTeam;
let admin: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(app, team.emails.admin, PASSWORD);
});

async function ownTeam() {
  const own = await makeTeam();
  const url = (role: Role) => `/api/team/members/${own.memberships[role].id}`;
  return { ...own, url, admin: await signIn(app, own.emails.admin, PASSWORD) };
}
const signInWith = (email: string, password = PASSWORD) => request(app).post('/api/session').send({ email, password });

describe('PATCH /api/team/members/:id: signed out, per role, bad input', () => {
  it('answers 401 signed out', async () => {
    const answer = await request(app).patch(`/api/team/members/${team.memberships.crew.id}`).send({ roles: ['admin'] });
    expect(answer.status).toBe(401);
    expect(answer.body).toEqual(UNAUTHENTICATED);
  });

  const MAY_MANAGE: Record<Role, boolean> = { admin: true, lead: false, crew: false, battery: false, safety: false, viewer: false };
  for (const role of ROLES) {
    it(`${role}: ${MAY_MANAGE[role] ? 'may' : 'may not'} change a member's roles`, async () => {
      const own = await ownTeam();
      const client = await signIn(app, own.emails[role], PASSWORD);
      const answer = await client.patch(own.url('viewer'), { roles: ['viewer', 'safety'] });
      const stored = await Membership.findByPk(own.memberships.viewer.id, { rejectOnEmpty: true });
      if (MAY_MANAGE[role]) {
        expect(answer.status).toBe(200);
        expect(stored.roles).toEqual(['viewer', 'safety']);
      } else {
        expect(answer.status).toBe(403);
        expect(answer.body).toEqual(FORBIDDEN);
        expect(stored.roles).toEqual(['viewer']);
      }
    });
  }

  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['no roles', { roles: [] }, { roles: 'Give at least one role' }],
    ['an unknown role', { roles: ['pilot'] }, { 'roles.0': 'One of admin, lead, crew, battery, safety, viewer' }],
    ['an empty name', { name: '' }, { name: 'Give a name' }],
    ['active that is not a boolean', { active: 'no' }, { active: 'true or false' }],
    ['an unknown key (the body is strict)', { email: 'new@example.com' }, { email: 'Not a field of this request' }],
  ];
  for (const [what, body, fields] of cases) {
    it(`answers 400 for ${what}, naming the field`, async () => {
      const answer = await admin.patch(`/api/team/members/${team.memberships.crew.id}`, body);
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    });
  }

  it('answers 400 naming id when it is not a UUID', async () => {
    const answer = await admin.patch('/api/team/members/crew', { roles: ['lead'] });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ id: 'Must be a UUID' }));
  });
});

describe('PATCH /api/team/members/:id: roles', () => {
  it("changes roles, and the member's very next request works with the new ones", async () => {
    const own = await ownTeam();
    const crew = await signIn(app, own.emails.crew, PASSWORD);
    expect((await crew.post('/api/events', eventBody())).status).toBe(403);

    const answer = await own.admin.patch(own.url('crew'), { roles: ['crew', 'admin'] });
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({ id: own.memberships.crew.id, roles: ['crew', 'admin'], active: true, version: 1 });

    expect((await crew.get('/api/session')).body.memberships[0].roles).toEqual(['crew', 'admin']);
    expect((await crew.post('/api/events', eventBody())).status).toBe(201);
  });
});

describe('PATCH /api/team/members/:id: active', () => {
  it("deactivating ends the member's session and refuses sign-in; reactivating lets them back", async () => {
    const own = await ownTeam();
    const crew = await signIn(app, own.emails.crew, PASSWORD);

    const off = await own.admin.patch(own.url('crew'), { active: false });
    expect(off.status).toBe(200);
    expect(off.body.active).toBe(false);
    const next = await crew.get('/api/team');
    expect(next.status).toBe(401);
    expect(next.body).toEqual(UNAUTHENTICATED);
    const refused = await signInWith(own.emails.crew);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('no_active_membership');
    // Still listed, so that an admin can bring the member back.
    const listed = (await own.admin.get('/api/team/members')).body.find((m: { id: string }) => m.id === own.memberships.crew.id);
    expect(listed.active).toBe(false);

    const on = await own.admin.patch(own.url('crew'), { active: true });
    expect(on.status).toBe(200);
    expect(on.body.active).toBe(true);
    const back = await signIn(app, own.emails.crew, PASSWORD);
    expect((await back.get('/api/team')).body.id).toBe(own.team.id);
  });

  it('deactivating a member in one team does not sign them out of another team', async () => {
    const own = await ownTeam();
    const other = await makeTeam();
    const membership = await joinTeam(other.memberships.lead.userId, own.team.id, ['crew']);
    const inOther = await signIn(app, other.emails.lead, PASSWORD); // works in `other`, its first team
    expect((await inOther.get('/api/team')).body.id).toBe(other.team.id);

    expect((await own.admin.patch(`/api/team/members/${membership.id}`, { active: false })).status).toBe(200);

    const next = await inOther.get('/api/team');
    expect(next.status).toBe(200);
    expect(next.body.id).toBe(other.team.id);
  });
});

describe('PATCH /api/team/members/:id: the last admin', () => {
  it('refuses to deactivate the last active admin or take the admin role away', async () => {
    const own = await ownTeam();
    for (const body of [{ active: false }, { roles: ['lead'] }, { roles: ['lead'], active: false }]) {
      const answer = await own.admin.patch(own.url('admin'), body);
      expect(answer.status).toBe(409);
      expect(answer.body).toEqual({ error: { code: 'last_admin', message: 'The team needs at least one active admin' } });
    }
    const stored = await Membership.findByPk(own.memberships.admin.id, { rejectOnEmpty: true });
    expect([stored.roles, stored.active, stored.version]).toEqual([['admin'], true, 0]);
    expect((await own.admin.get('/api/session')).status).toBe(200);
  });

  it('allows it once another admin is active, but an inactive admin does not count', async () => {
    const own = await ownTeam();
    await own.admin.patch(own.url('lead'), { roles: ['lead', 'admin'] });
    await own.admin.patch(own.url('lead'), { active: false });
    expect((await own.admin.patch(own.url('admin'), { roles: ['crew'] })).body.error.code).toBe('last_admin');

    await own.admin.patch(own.url('lead'), { active: true });
    const demoted = await own.admin.patch(own.url('admin'), { roles: ['crew'] });
    expect(demoted.status).toBe(200);
    expect(demoted.body.roles).toEqual(['crew']);
    // The former admin's next request has the new roles.
    expect((await own.admin.patch(own.url('viewer'), { roles: ['lead'] })).status).toBe(403);
  });
});

describe('PATCH /api/team/members/:id: two admins at once', () => {
  it('demoting each other at the same moment leaves the team one admin', async () => {
    const own = await ownTeam();
    await own.admin.patch(own.url('lead'), { roles: ['lead', 'admin'] });
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const answers = await Promise.all([own.admin.patch(own.url('lead'), { roles: ['lead'] }), lead.patch(own.url('admin'), { roles: ['lead'] })]);
    expect(answers.map((answer) => answer.status).sort()).toEqual([200, 409]);
    const admins = (await Membership.findAll({ where: { teamId: own.team.id, active: true } })).filter((m) => m.roles.includes('admin'));
    expect(admins).toHaveLength(1);
  });
});

describe('PATCH /api/team/members/:id with a stale version', () => {
  it("answers 409 stale with the other writer's values", async () => {
    const own = await ownTeam();
    const tablet = await signIn(app, own.emails.admin, PASSWORD);
    const first = await own.admin.patch(own.url('crew'), { roles: ['crew', 'battery'], version: 0 });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(1);

    const second = await tablet.patch(own.url('crew'), { roles: ['viewer'], version: 0 });
    expect(second.status).toBe(409);
    expect(second.body).toEqual({ error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: first.body } });
    expect((await Membership.findByPk(own.memberships.crew.id, { rejectOnEmpty: true })).roles).toEqual(['crew', 'battery']);
  });

  it('counts the version up for a change of name alone, so a second rename is stale', async () => {
    const own = await ownTeam();
    const first = await own.admin.patch(own.url('crew'), { name: 'Sam Sprocket', version: 0 });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ name: 'Sam Sprocket', version: 1 });
    const second = await own.admin.patch(own.url('crew'), { name: 'Sam Gear', version: 0 });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('stale');
  });
});

describe("PATCH another team's member", () => {
  it('answers 404 and changes nothing', async () => {
    const foreign = await makeTeam();
    const answer = await admin.patch(`/api/team/members/${foreign.memberships.admin.id}`, { active: false, roles: ['viewer'] });
    expect(answer.status).toBe(404);
    expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Member not found' } });
    const stored = await Membership.findByPk(foreign.memberships.admin.id, { rejectOnEmpty: true });
    expect([stored.roles, stored.active, stored.version]).toEqual([['admin'], true, 0]);
    await signIn(app, foreign.emails.admin, PASSWORD);
  });
});
