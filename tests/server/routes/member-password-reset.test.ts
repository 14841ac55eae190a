import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { signIn, testApp } from '../../support/app';
import { joinTeam, makeTeam, PASSWORD } from '../../support/factories';

const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

describe('PATCH /api/team/members/:id {resetPassword: true}', () => {
  it('is for admins only', async () => {
    const lead = await signIn(app, team.emails.lead, PASSWORD);
    const answer = await lead.patch(`/api/team/members/${team.memberships.viewer.id}`, { resetPassword: true });
    expect(answer.status).toBe(403);
    expect(answer.body.error.code).toBe('forbidden');
  });

  it('accepts only true', async () => {
    const admin = await signIn(app, team.emails.admin, PASSWORD);
    const answer = await admin.patch(`/api/team/members/${team.memberships.viewer.id}`, { resetPassword: false });
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields).toEqual({ resetPassword: 'Only true' });
  });

  it('answers a new temporary password once, which replaces the old one and signs the member out', async () => {
    const admin = await signIn(app, team.emails.admin, PASSWORD);
    const crewTablet = await signIn(app, team.emails.crew, PASSWORD);

    const answer = await admin.patch(`/api/team/members/${team.memberships.crew.id}`, { resetPassword: true });
    expect(answer.status).toBe(200);
    expect(answer.body.temporaryPassword).toMatch(/^[a-zA-Z2-9]{4}(-[a-zA-Z2-9]{4}){3}$/);

    expect((await crewTablet.get('/api/session')).status).toBe(401);
    expect((await request(app).post('/api/session').send({ email: team.emails.crew, password: PASSWORD })).status).toBe(401);
    await signIn(app, team.emails.crew, answer.body.temporaryPassword);

    // An ordinary edit answers no password at all.
    const renamed = await admin.patch(`/api/team/members/${team.memberships.crew.id}`, { name: 'Renamed crew' });
    expect(renamed.body).not.toHaveProperty('temporaryPassword');
  });

  it('refuses to rename or reset an account that belongs to another team too', async () => {
    const other = await makeTeam();
    const otherAdmin = await signIn(app, other.emails.admin, PASSWORD);
    const added = await joinTeam(team.memberships.safety.userId, other.team.id, ['viewer']);

    const answer = await otherAdmin.patch(`/api/team/members/${added.id}`, { resetPassword: true });
    expect(answer.status).toBe(409);
    expect(answer.body.error.code).toBe('shared_account');
    await signIn(app, team.emails.safety, PASSWORD);

    const renamed = await otherAdmin.patch(`/api/team/members/${added.id}`, { name: 'Renamed elsewhere' });
    expect(renamed.status).toBe(409);
    expect(renamed.body.error.code).toBe('shared_account');
    // Roles in the other team are that team's business.
    const promoted = await otherAdmin.patch(`/api/team/members/${added.id}`, { roles: ['crew'] });
    expect(promoted.status).toBe(200);
    expect(promoted.body.name).toBe('Factory safety');
  });
});
