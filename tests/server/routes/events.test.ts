import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ROLES, type Role } from '../../../shared/roles';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { DEFAULT_SETTINGS, eventBody, makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';

// Creating is in events-create.test.ts and editing in events-update.test.ts; this file holds
// reading, the signed-out and role rungs of every events route, and team isolation.
const { app } = testApp();
let team: FactoryTeam;
let clients: Record<Role, SignedIn>;
beforeAll(async () => {
  team = await makeTeam();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
});

const presented = (event: FactoryTeam['event'], current: boolean) => ({
  id: event.id,
  name: event.name,
  venue: event.venue,
  timeZone: event.timeZone,
  startDate: event.startDate,
  endDate: event.endDate,
  teamNumber: event.teamNumber,
  settings: DEFAULT_SETTINGS,
  current,
  version: 0,
  createdAt: event.createdAt.toISOString(),
  updatedAt: event.updatedAt.toISOString(),
});

describe('events routes signed out', () => {
  it('answer 401 unauthenticated to every verb and change nothing', async () => {
    const id = team.event.id;
    const answers = [
      await request(app).get('/api/events'),
      await request(app).post('/api/events').send(eventBody()),
      await request(app).get(`/api/events/${id}`),
      await request(app).patch(`/api/events/${id}`).send({ name: 'Signed out' }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
    expect((await clients.admin.get('/api/events')).body).toEqual([presented(team.event, true)]);
  });
});

describe('events routes per role', () => {
  // Every role reads; only a mentor (admin) creates and edits events.
  const MAY_MANAGE: Record<Role, boolean> = { admin: true, lead: false, crew: false, battery: false, safety: false, viewer: false };

  for (const role of ROLES) {
    it(`${role}: reads the list and one event`, async () => {
      const list = await clients[role].get('/api/events');
      expect(list.status).toBe(200);
      expect(list.body.map((event: { id: string }) => event.id)).toContain(team.event.id);
      const one = await clients[role].get(`/api/events/${team.event.id}`);
      expect(one.status).toBe(200);
      expect(one.body.id).toBe(team.event.id);
    });

    it(`${role}: ${MAY_MANAGE[role] ? 'may' : 'may not'} create or edit an event`, async () => {
      const own = await makeTeam(); // its own team: the writes below must not disturb other tests
      const client = await signIn(app, own.emails[role], PASSWORD);
      const created = await client.post('/api/events', eventBody({ name: `Made by ${role}` }));
      const edited = await client.patch(`/api/events/${own.event.id}`, { name: `Edited by ${role}` });
      const names = (await client.get('/api/events')).body.map((event: { name: string }) => event.name).sort();
      if (MAY_MANAGE[role]) {
        expect(created.status).toBe(201);
        expect(edited.status).toBe(200);
        expect(names).toEqual([`Edited by ${role}`, `Made by ${role}`]);
      } else {
        for (const answer of [created, edited]) {
          expect(answer.status).toBe(403);
          expect(answer.body).toEqual(FORBIDDEN);
        }
        expect(names).toEqual([own.event.name]);
      }
    });
  }
});

describe('GET /api/events', () => {
  it("lists the team's events, latest start first, flagging the current one", async () => {
    const own = await makeTeam();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    const later = await admin.post('/api/events', eventBody({ name: 'Championship', startDate: '2027-04-15', endDate: '2027-04-18' }));
    const earlier = await admin.post('/api/events', eventBody({ name: 'Scrimmage', startDate: '2026-10-03', endDate: '2026-10-03' }));
    const list = await (await signIn(app, own.emails.viewer, PASSWORD)).get('/api/events');
    expect(list.status).toBe(200);
    expect(list.body).toEqual([later.body, presented(own.event, true), earlier.body]);
    expect(list.body.map((event: { current: boolean }) => event.current)).toEqual([false, true, false]);
  });
});

describe('GET /api/events/:eventId', () => {
  it('answers the event with every field', async () => {
    const answer = await clients.viewer.get(`/api/events/${team.event.id}`);
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual(presented(team.event, true));
  });

  it('answers 400 naming eventId when it is not a UUID', async () => {
    for (const answer of [await clients.admin.get('/api/events/not-a-uuid'), await clients.admin.patch('/api/events/42', { name: 'X' })]) {
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid({ eventId: 'Must be a UUID' }));
    }
  });

  it('answers 404 for an unknown id', async () => {
    const answer = await clients.admin.get('/api/events/00000000-0000-4000-8000-000000000000');
    expect(answer.status).toBe(404);
    expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Event not found' } });
  });
});

describe("another team's event", () => {
  it('is not found on GET and PATCH, never shown and never changed', async () => {
    const foreign = await makeTeam();
    const url = `/api/events/${foreign.event.id}`;
    const read = await clients.admin.get(url);
    const write = await clients.admin.patch(url, { name: 'Taken over', current: true });
    for (const answer of [read, write]) {
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Event not found' } });
      expect(JSON.stringify(answer.body)).not.toContain(foreign.event.name);
    }
    expect((await clients.admin.get('/api/events')).body.map((event: { id: string }) => event.id)).not.toContain(foreign.event.id);

    const owner = await signIn(app, foreign.emails.admin, PASSWORD);
    expect((await owner.get(url)).body).toEqual(presented(foreign.event, true));
    expect((await owner.get('/api/team')).body.currentEventId).toBe(foreign.event.id);
    expect((await clients.admin.get('/api/team')).body.currentEventId).toBe(team.event.id);
  });
});
