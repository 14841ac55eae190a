import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { invalid } from '../../support/errors';
import { DEFAULT_SETTINGS, eventBody, makeTeam, makeTeamWithoutEvent, PASSWORD, type FactoryTeam } from '../../support/factories';

// POST /api/events. Signed-out and per-role answers are in events.test.ts.
const { app } = testApp();
let team: FactoryTeam;
let admin: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(app, team.emails.admin, PASSWORD);
});

// Sorted: events of the same start and name come in no fixed order.
const eventIds = async (client: SignedIn): Promise<string[]> => (await client.get('/api/events')).body.map((event: { id: string }) => event.id).sort();

describe('POST /api/events: bad input', () => {
  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['an empty name', { name: '' }, { name: 'Give the event a name' }],
    ['a name of spaces only', { name: '   ' }, { name: 'Give the event a name' }],
    ['no venue', { venue: undefined }, { venue: 'Required' }],
    ['an unknown time zone', { timeZone: 'Mars/Olympus' }, { timeZone: 'Use an IANA time zone such as Europe/Berlin' }],
    ['an impossible start date', { startDate: '2026-13-40' }, { startDate: 'Use the form YYYY-MM-DD' }],
    ['an end before the start', { startDate: '2027-03-04', endDate: '2027-03-03' }, { endDate: 'Must not be before the start date' }],
    ['a team number that is text', { teamNumber: 'abc' }, { teamNumber: 'A whole number' }],
    ['a team number that is not whole', { teamNumber: 12.5 }, { teamNumber: 'A whole number' }],
    // 0 and 100000 are whole numbers: the message must name the range instead.
    ['team number 0', { teamNumber: 0 }, { teamNumber: 'From 1 to 99999' }],
    ['team number 100000', { teamNumber: 100000 }, { teamNumber: 'From 1 to 99999' }],
    ['a client id that is not a UUID', { id: 'event-1' }, { id: 'Must be a UUID' }],
  ];
  for (const [what, overrides, fields] of cases) {
    it(`answers 400 for ${what}, naming the field, and creates nothing`, async () => {
      const before = await eventIds(admin);
      const answer = await admin.post('/api/events', eventBody(overrides));
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
      expect(await eventIds(admin)).toEqual(before);
    });
  }

  it('names every bad field at once', async () => {
    const answer = await admin.post('/api/events', { name: '', timeZone: 'Mars/Olympus', startDate: '2026-13-40', endDate: '2026-12-01', teamNumber: 'abc' });
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields).toEqual({
      name: 'Give the event a name',
      venue: 'Required',
      timeZone: 'Use an IANA time zone such as Europe/Berlin',
      startDate: 'Use the form YYYY-MM-DD',
      teamNumber: 'A whole number',
    });
  });

  it('answers 400 malformed_json for a body that is not JSON', async () => {
    const answer = await admin.agent.post('/api/events').set('x-csrf-token', admin.csrfToken).set('Content-Type', 'application/json').send('{"name": "Qualifier",');
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual({ error: { code: 'malformed_json', message: 'The request body is not valid JSON' } });
  });

  it('answers 413 too_large for a body over 1 MB', async () => {
    const before = await eventIds(admin);
    const answer = await admin.post('/api/events', eventBody({ venue: 'x'.repeat(1024 * 1024) }));
    expect(answer.status).toBe(413);
    expect(answer.body).toEqual({ error: { code: 'too_large', message: 'The request body is larger than 1 MB' } });
    expect(await eventIds(admin)).toEqual(before);
  });
});

describe('POST /api/events: success', () => {
  it('answers 201 with every field, keeping the time zone exactly', async () => {
    const answer = await admin.post('/api/events', eventBody({ name: '  Fenwick Valley Qualifier  ' }));
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({
      id: expect.stringMatching(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/),
      name: 'Fenwick Valley Qualifier',
      venue: 'Ostermoor Exhibition Hall',
      timeZone: 'America/Chicago',
      startDate: '2027-03-04',
      endDate: '2027-03-06',
      teamNumber: 24321,
      settings: DEFAULT_SETTINGS,
      current: false, // the team already has a current event
      version: 0,
      createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
      updatedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
    });
    expect((await admin.get(`/api/events/${answer.body.id}`)).body).toEqual(answer.body);
  });

  it("makes a team's first event its current one", async () => {
    const fresh = await makeTeamWithoutEvent();
    const client = await signIn(app, fresh.emails.admin, PASSWORD);
    expect((await client.get('/api/team')).body.currentEventId).toBeNull();
    const first = await client.post('/api/events', eventBody());
    expect(first.status).toBe(201);
    expect(first.body.current).toBe(true);
    expect((await client.get('/api/team')).body.currentEventId).toBe(first.body.id);
    const second = await client.post('/api/events', eventBody({ name: 'Second' }));
    expect(second.body.current).toBe(false);
    expect((await client.get('/api/team')).body.currentEventId).toBe(first.body.id);
  });

  it('moves current to an event created with current: true', async () => {
    const own = await makeTeam();
    const client = await signIn(app, own.emails.admin, PASSWORD);
    const created = await client.post('/api/events', eventBody({ current: true }));
    expect(created.status).toBe(201);
    expect(created.body.current).toBe(true);
    const list = (await client.get('/api/events')).body as { id: string; current: boolean }[];
    expect(list.filter((event) => event.current).map((event) => event.id)).toEqual([created.body.id]);
    expect(list.find((event) => event.id === own.event.id)?.current).toBe(false);
  });
});

describe('POST /api/events: time zone spelling', () => {
  it('stores the zone as the runtime spells it, whatever the case it was typed in', async () => {
    const answer = await admin.post('/api/events', eventBody({ timeZone: 'america/chicago' }));
    expect(answer.status).toBe(201);
    expect(answer.body.timeZone).toBe('America/Chicago');
  });
});

describe('POST /api/events with a client id', () => {
  it('creates once: resending the same body and id answers 200 with the same event', async () => {
    const own = await makeTeam();
    const client = await signIn(app, own.emails.admin, PASSWORD);
    const id = randomUUID();
    const body = eventBody({ id, name: 'Sent twice' });
    const first = await client.post('/api/events', body);
    expect(first.status).toBe(201);
    expect(first.body.id).toBe(id);
    const again = await client.post('/api/events', body);
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await eventIds(client)).toEqual([first.body.id, own.event.id].sort());
  });

  it("answers 409 id_taken for an id another team's event has, revealing nothing of it", async () => {
    const foreign = await makeTeam();
    const before = await eventIds(admin);
    const answer = await admin.post('/api/events', eventBody({ id: foreign.event.id, name: 'Collision' }));
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({ error: { code: 'id_taken', message: 'This id is already used by another record' } });
    expect(JSON.stringify(answer.body)).not.toContain(foreign.event.name);
    expect(await eventIds(admin)).toEqual(before);
    const owner = await signIn(app, foreign.emails.admin, PASSWORD);
    expect((await owner.get(`/api/events/${foreign.event.id}`)).body.name).toBe(foreign.event.name);
  });
});
