import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, makeTeamWithoutEvent, PASSWORD, type FactoryTeam } from '../../support/factories';
import { matchBody } from '../../support/schedule';
import { ScreenToken } from '../../../server/models';

const { app } = testApp();

const SCREEN_NOT_FOUND = { error: { code: 'not_found', message: 'Screen not found' } };
const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;
const TOKEN = /^[A-Za-z0-9_-]{43}$/;

let own: FactoryTeam;
let admin: SignedIn;
beforeAll(async () => {
  own = await makeTeam();
  admin = await signIn(app, own.emails.admin, PASSWORD);
});

const addScreen = async (client: SignedIn, name = 'Pit TV') => {
  const answer = await client.post('/api/team/screens', { name });
  expect(answer.status).toBe(201);
  return answer.body as { id: string; token: string; path: string };
};

describe('admin routes /api/team/screens', () => {
  it('answers 401 when signed out', async () => {
    const id = '6f1c1b1e-0000-4000-8000-000000000000';
    for (const answer of [
      await request(app).get('/api/team/screens'),
      await request(app).post('/api/team/screens').send({ name: 'Pit TV' }),
      await request(app).delete(`/api/team/screens/${id}`),
    ]) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });

  it('answers 403 to every role but admin, whatever is sent', async () => {
    const clients = await signInEveryRole(app, own.emails, PASSWORD);
    const screen = await addScreen(admin, 'Kept');
    for (const role of ['lead', 'crew', 'battery', 'safety', 'viewer'] as const) {
      const client = clients[role];
      for (const answer of [
        await client.get('/api/team/screens'),
        await client.post('/api/team/screens', { name: 'Pit TV' }),
        await client.post('/api/team/screens', { name: '' }),
        await client.delete(`/api/team/screens/${screen.id}`),
      ]) {
        expect(answer.status, role).toBe(403);
        expect(answer.body).toEqual(FORBIDDEN);
      }
    }
    expect((await request(app).get(`/api/screen/${screen.token}`)).status).toBe(200);
  });

  it('answers 400 naming the field for a bad name, id or extra field', async () => {
    const cases: [object, Record<string, string>][] = [
      [{}, { name: 'Give a name, e.g. Pit TV' }],
      [{ name: '   ' }, { name: 'Give a name, e.g. Pit TV' }],
      [{ name: 42 }, { name: 'Give a name, e.g. Pit TV' }],
      [{ name: 'x'.repeat(61) }, { name: 'At most 60 characters' }],
      [{ id: 'not-a-uuid', name: 'Pit TV' }, { id: 'Must be a UUID' }],
      [{ name: 'Pit TV', token: 'mine' }, { token: 'Not a field of this request' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await admin.post('/api/team/screens', body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
    const bad = await admin.delete('/api/team/screens/not-a-uuid');
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual(invalid({ id: 'Must be a UUID' }));
  });

  it('creates a screen, answering its token and path once, and lists it without them', async () => {
    const id = crypto.randomUUID();
    const created = await admin.post('/api/team/screens', { id, name: '  Pit TV by the door ' });
    expect(created.status).toBe(201);
    expect(created.body).toEqual({
      id,
      name: 'Pit TV by the door',
      createdAt: expect.stringMatching(ISO),
      revokedAt: null,
      token: expect.stringMatching(TOKEN),
      path: `/screen/${created.body.token}`,
    });
    // Only the hash is stored.
    const row = await ScreenToken.findByPk(id, { rejectOnEmpty: true });
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(JSON.stringify(row.toJSON())).not.toContain(created.body.token);

    // A resend answers the same screen without the token.
    const resent = await admin.post('/api/team/screens', { id, name: 'Pit TV by the door' });
    expect(resent.status).toBe(200);
    expect(resent.body).toEqual({ id, name: 'Pit TV by the door', createdAt: created.body.createdAt, revokedAt: null });

    const list = await admin.get('/api/team/screens');
    expect(list.status).toBe(200);
    expect(list.body).toContainEqual({ id, name: 'Pit TV by the door', createdAt: created.body.createdAt, revokedAt: null });
    expect(JSON.stringify(list.body)).not.toContain(created.body.token);
  });

  it("answers 409 id_taken for another team's screen id, and 404 when revoking it", async () => {
    const other = await makeTeam();
    const otherAdmin = await signIn(app, other.emails.admin, PASSWORD);
    const theirs = await addScreen(otherAdmin);
    const taken = await admin.post('/api/team/screens', { id: theirs.id, name: 'Mine' });
    expect(taken.status).toBe(409);
    expect(taken.body.error.code).toBe('id_taken');
    const revoked = await admin.delete(`/api/team/screens/${theirs.id}`);
    expect(revoked.status).toBe(404);
    expect(revoked.body).toEqual(SCREEN_NOT_FOUND);
    // Still working for its own team, and not in our list.
    expect((await request(app).get(`/api/screen/${theirs.token}`)).status).toBe(200);
    expect((await admin.get('/api/team/screens')).body.map((s: { id: string }) => s.id)).not.toContain(theirs.id);
  });
});

describe('GET /api/screen/:token', () => {
  it('answers the team, the current event, its timeline and matches without a session', async () => {
    const team = await makeTeam();
    const teamAdmin = await signIn(app, team.emails.admin, PASSWORD);
    const lead = await signIn(app, team.emails.lead, PASSWORD);
    const us = team.event.teamNumber;
    const match = await lead.post(`/api/events/${team.event.id}/matches`, matchBody({ number: 3, red: [us, 21002, 21003] }));
    expect(match.status).toBe(201);
    const screen = await addScreen(teamAdmin);

    const answer = await request(app).get(`/api/screen/${screen.token}`);
    expect(answer.status).toBe(200);
    expect(answer.headers['set-cookie']).toBeUndefined();
    expect(answer.headers['cache-control']).toBe('no-store');
    expect(answer.body.team).toEqual({ number: team.team.number, name: team.team.name });
    expect(answer.body.event).toEqual({
      id: team.event.id,
      name: team.event.name,
      venue: 'Factory Hall',
      timeZone: 'Europe/Berlin',
      startDate: '2026-12-05',
      endDate: '2026-12-06',
      teamNumber: us,
    });
    // The same shapes the signed-in board reads.
    const viewer = await signIn(app, team.emails.viewer, PASSWORD);
    expect(answer.body.matches).toEqual((await viewer.get(`/api/events/${team.event.id}/matches`)).body);
    const timeline = (await viewer.get(`/api/events/${team.event.id}/timeline`)).body;
    expect(Object.keys(answer.body.timeline).sort()).toEqual(Object.keys(timeline).sort());
    expect(answer.body.timeline.matches).toEqual(timeline.matches);

    // Nothing about people: no e-mail, no member's name.
    const text = JSON.stringify(answer.body);
    expect(text).not.toContain('@');
    for (const role of Object.keys(team.emails)) {
      expect(text).not.toContain(team.emails[role as keyof typeof team.emails]);
      expect(text).not.toContain(`Factory ${role}`);
    }
  });

  it('answers nulls for a team without a current event', async () => {
    const team = await makeTeamWithoutEvent();
    const teamAdmin = await signIn(app, team.emails.admin, PASSWORD);
    const screen = await addScreen(teamAdmin);
    const answer = await request(app).get(`/api/screen/${screen.token}`);
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({ team: { number: team.team.number, name: team.team.name }, event: null, timeline: null, matches: null, readiness: null });
  });

  it('answers 404 for an unknown or malformed token', async () => {
    for (const token of ['x'.repeat(43), 'short', '%2E%2E']) {
      const answer = await request(app).get(`/api/screen/${token}`);
      expect(answer.status, token).toBe(404);
      expect(answer.body.error.code).toBe('not_found');
    }
  });

  it('answers 404 at once after the screen is revoked, and revoking again is harmless', async () => {
    const screen = await addScreen(admin);
    expect((await request(app).get(`/api/screen/${screen.token}`)).status).toBe(200);
    const revoked = await admin.delete(`/api/team/screens/${screen.id}`);
    expect(revoked.status).toBe(204);
    const after = await request(app).get(`/api/screen/${screen.token}`);
    expect(after.status).toBe(404);
    expect(after.body).toEqual(SCREEN_NOT_FOUND);
    const listed = (await admin.get('/api/team/screens')).body.find((s: { id: string }) => s.id === screen.id);
    expect(listed.revokedAt).toMatch(ISO);
    expect((await admin.delete(`/api/team/screens/${screen.id}`)).status).toBe(204);
    const again = (await admin.get('/api/team/screens')).body.find((s: { id: string }) => s.id === screen.id);
    expect(again.revokedAt).toBe(listed.revokedAt);
  });
});
