import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/roles';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';
import { csv, importCsv, matchBody } from '../../support/schedule';

// GET/POST /api/events/:eventId/matches and PATCH /api/matches/:id; the import is in
// matches-import.test.ts. Every route's signed-out, role and foreign-team rungs are here.
const { app } = testApp();
let team: FactoryTeam;
let clients: Record<Role, SignedIn>;
beforeAll(async () => {
  team = await makeTeam();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
});

const MAY_EDIT: Record<Role, boolean> = { admin: true, lead: true, crew: false, battery: false, safety: false, viewer: false };
const NOT_FOUND_EVENT = { error: { code: 'not_found', message: 'Event not found' } };

async function ownTeam() {
  const own = await makeTeam();
  const admin = await signIn(app, own.emails.admin, PASSWORD);
  return { ...own, admin, url: `/api/events/${own.event.id}/matches` };
}

describe('schedule routes signed out', () => {
  it('answer 401 to every route and verb', async () => {
    const id = team.event.id;
    const answers = [
      await request(app).get(`/api/events/${id}/matches`),
      await request(app).post(`/api/events/${id}/matches`).send(matchBody()),
      await request(app).post(`/api/events/${id}/matches/import`).attach('file', Buffer.from(csv()), 'schedule.csv'),
      await request(app).patch(`/api/matches/${randomUUID()}`).send({ number: 2 }),
      await request(app).post(`/api/events/${id}/field-progress`).send({ matchId: randomUUID() }),
      await request(app).delete(`/api/events/${id}/field-progress/latest`),
      await request(app).get(`/api/events/${id}/timeline`),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });
});

describe('schedule routes per role', () => {
  for (const role of ROLES) {
    it(`${role}: reads matches and the timeline; ${MAY_EDIT[role] ? 'may' : 'may not'} create, patch, import or mark progress`, async () => {
      const own = await ownTeam();
      const seeded = await own.admin.post(own.url, matchBody());
      expect(seeded.status).toBe(201);
      const client = await signIn(app, own.emails[role], PASSWORD);

      expect((await client.get(own.url)).status).toBe(200);
      expect((await client.get(`/api/events/${own.event.id}/timeline`)).status).toBe(200);

      const answers = [
        await client.post(own.url, matchBody({ number: 2 })),
        await client.patch(`/api/matches/${seeded.body.id}`, { number: 3 }),
        await importCsv(client, own.event.id, csv('qualification,4,2026-12-05T10:00:00Z,21001,21002,21003,21004,21005,21006')),
        await client.post(`/api/events/${own.event.id}/field-progress`, { matchId: seeded.body.id }),
        await client.delete(`/api/events/${own.event.id}/field-progress/latest`),
      ];
      const numbers = (await own.admin.get(own.url)).body.map((match: { number: number }) => match.number);
      if (MAY_EDIT[role]) {
        expect(answers.map((answer) => answer.status)).toEqual([201, 200, 200, 201, 200]);
        expect(numbers).toEqual([2, 3, 4]); // equal starts go by number
      } else {
        for (const answer of answers) {
          expect(answer.status).toBe(403);
          expect(answer.body).toEqual(FORBIDDEN);
        }
        expect(numbers).toEqual([1]);
      }
    });
  }
});

describe("another team's event and matches", () => {
  it('are not found on every route, never shown and never changed', async () => {
    const foreign = await ownTeam();
    const match = (await foreign.admin.post(foreign.url, matchBody())).body;
    await foreign.admin.post(`/api/events/${foreign.event.id}/field-progress`, { matchId: match.id });
    const id = foreign.event.id;
    const answers = [
      await clients.admin.get(`/api/events/${id}/matches`),
      await clients.admin.post(`/api/events/${id}/matches`, matchBody({ number: 9 })),
      await importCsv(clients.admin, id, csv('qualification,1,2026-12-05T10:00:00Z,21001,21002,21003,21004,21005,21009')),
      await clients.admin.post(`/api/events/${id}/field-progress`, { matchId: match.id }),
      await clients.admin.delete(`/api/events/${id}/field-progress/latest`),
      await clients.admin.get(`/api/events/${id}/timeline`),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual(NOT_FOUND_EVENT);
    }
    const patched = await clients.admin.patch(`/api/matches/${match.id}`, { number: 9 });
    expect(patched.status).toBe(404);
    expect(patched.body).toEqual({ error: { code: 'not_found', message: 'Match not found' } });

    // A match of another team cannot be marked on our own event either.
    const crossed = await clients.admin.post(`/api/events/${team.event.id}/field-progress`, { matchId: match.id });
    expect(crossed.status).toBe(404);
    expect(crossed.body).toEqual({ error: { code: 'not_found', message: 'Match not found' } });

    expect((await foreign.admin.get(foreign.url)).body).toEqual([{ ...match, startedAt: expect.any(String) }]);
  });

  it('a client id used by another team answers 409 id_taken', async () => {
    const foreign = await ownTeam();
    const theirs = (await foreign.admin.post(foreign.url, matchBody())).body;
    const answer = await clients.admin.post(`/api/events/${team.event.id}/matches`, matchBody({ id: theirs.id, number: 50 }));
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({ error: { code: 'id_taken', message: 'This id is already used by another record' } });
  });
});

describe('POST /api/events/:eventId/matches', () => {
  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['an unknown level', { level: 'final' }, { level: 'Use practice, qualification or playoff' }],
    ['number 0', { number: 0 }, { number: 'A whole number from 1 to 999' }],
    ['number 1000', { number: 1000 }, { number: 'A whole number from 1 to 999' }],
    ['a start without an offset', { scheduledStart: '2026-12-05T09:00:00' }, { scheduledStart: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }],
    ['a start on no real day', { scheduledStart: '2026-02-30T09:00:00Z' }, { scheduledStart: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }],
    ['two teams on red', { red: [21001, 21002] }, { red: 'Three team numbers' }],
    ['a team number out of range', { blue: [21004, 21005, 100000] }, { 'blue.2': 'A team number from 1 to 99999' }],
    ['a team twice in the match', { blue: [21004, 21005, 21001] }, { blue: 'Team 21001 is in this match twice' }],
    ['a client id that is not a UUID', { id: 'match-1' }, { id: 'Must be a UUID' }],
    ['no level', { level: undefined }, { level: 'Required' }],
    ['an unknown key', { colour: 'red' }, { colour: 'Not a field of this request' }],
  ];
  for (const [what, overrides, fields] of cases) {
    it(`answers 400 for ${what}, naming the field, and creates nothing`, async () => {
      const own = await ownTeam();
      const answer = await own.admin.post(own.url, matchBody(overrides));
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
      expect((await own.admin.get(own.url)).body).toEqual([]);
    });
  }

  it('answers 400 naming eventId when it is not a UUID', async () => {
    const answer = await clients.admin.post('/api/events/nope/matches', matchBody());
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ eventId: 'Must be a UUID' }));
  });

  it('creates a match (201), answers the same one when resent (200), and lists matches in schedule order', async () => {
    const own = await ownTeam();
    const id = randomUUID();
    const body = matchBody({ id, level: 'playoff', number: 1, scheduledStart: '2026-12-06T13:00:00+01:00' });
    const created = await own.admin.post(own.url, body);
    expect(created.status).toBe(201);
    expect(created.body).toEqual({
      id,
      level: 'playoff',
      number: 1,
      scheduledStart: '2026-12-06T12:00:00.000Z',
      startedAt: null,
      red: [21001, 21002, 21003],
      blue: [21004, 21005, 21006],
      version: 0,
    });
    const resent = await own.admin.post(own.url, body);
    expect(resent.status).toBe(200);
    expect(resent.body).toEqual(created.body);

    const earlier = await own.admin.post(own.url, matchBody({ level: 'qualification', number: 7 }));
    expect((await own.admin.get(own.url)).body).toEqual([earlier.body, created.body]);
  });

  it('answers 409 match_exists for a level and number already in the schedule', async () => {
    const own = await ownTeam();
    await own.admin.post(own.url, matchBody());
    const answer = await own.admin.post(own.url, matchBody({ scheduledStart: '2026-12-05T10:00:00Z' }));
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({
      error: { code: 'match_exists', message: 'The schedule already has qualification match 1', fields: { number: 'Already in the schedule' } },
    });
  });
});

describe('PATCH /api/matches/:id', () => {
  it('answers 400 naming id, or each bad field', async () => {
    const own = await ownTeam();
    const match = (await own.admin.post(own.url, matchBody())).body;
    const badId = await own.admin.patch('/api/matches/42', { number: 2 });
    expect(badId.status).toBe(400);
    expect(badId.body).toEqual(invalid({ id: 'Must be a UUID' }));
    const bad = await own.admin.patch(`/api/matches/${match.id}`, { level: 'final', version: -1 });
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual(invalid({ level: 'Use practice, qualification or playoff', version: 'The version number you loaded' }));
  });

  it('changes the fields sent and counts the version up; a stale version answers 409 with the current match', async () => {
    const own = await ownTeam();
    const match = (await own.admin.post(own.url, matchBody())).body;
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const first = await lead.patch(`/api/matches/${match.id}`, { scheduledStart: '2026-12-05T09:30:00Z', blue: [21004, 21005, 21007], version: 0 });
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ ...match, scheduledStart: '2026-12-05T09:30:00.000Z', blue: [21004, 21005, 21007], version: 1 });

    const second = await own.admin.patch(`/api/matches/${match.id}`, { number: 2, version: 0 });
    expect(second.status).toBe(409);
    expect(second.body).toEqual({ error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: first.body } });
    expect((await own.admin.get(own.url)).body).toEqual([first.body]);
  });

  it('refuses an edit of one alliance that puts a team of the stored other alliance in twice', async () => {
    const own = await ownTeam();
    const match = (await own.admin.post(own.url, matchBody())).body;
    const answer = await own.admin.patch(`/api/matches/${match.id}`, { red: [21004, 21007, 21008] });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ red: 'A team can only be in one seat of a match' }));
    expect((await own.admin.get(own.url)).body).toEqual([match]);
  });

  it('answers 409 match_exists when moving onto a taken level and number', async () => {
    const own = await ownTeam();
    await own.admin.post(own.url, matchBody({ number: 1 }));
    const second = (await own.admin.post(own.url, matchBody({ number: 2 }))).body;
    const answer = await own.admin.patch(`/api/matches/${second.id}`, { number: 1 });
    expect(answer.status).toBe(409);
    expect(answer.body.error.code).toBe('match_exists');
  });

  it('answers 404 for an unknown match', async () => {
    const answer = await clients.admin.patch(`/api/matches/${randomUUID()}`, { number: 2 });
    expect(answer.status).toBe(404);
    expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Match not found' } });
  });
});
