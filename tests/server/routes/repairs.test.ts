import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { can, ROLES, type Role } from '../../../shared/roles';
import type { RepairDetailJson, RepairJson } from '../../../shared/schemas/repairs';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { makeOurMatch } from '../../support/checks';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';
import { boardOf, makeRepair, repairBody } from '../../support/repairs';

// GET/POST /api/events/:eventId/repairs, GET /api/repairs/:id (moves, places and edits are in repairs-moves.test.ts).
const { app } = testApp();
let team: FactoryTeam;
let clients: Record<Role, SignedIn>;
beforeAll(async () => {
  team = await makeTeam();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
});

const NOT_FOUND = { error: { code: 'not_found', message: 'Repair not found' } };
const EVENT_NOT_FOUND = { error: { code: 'not_found', message: 'Event not found' } };
const NO_URGENCY = { neededBy: null, minutesLeft: null, remainingMinutes: null, late: false };

/** A team of our own with its crew member and lead signed in. */
async function ownTeam() {
  const own = await makeTeam();
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const userOf = (role: Role) => own.memberships[role].userId;
  return { ...own, crew, lead, userOf };
}

describe('repair routes signed out', () => {
  it('answer 401 to every route and verb', async () => {
    const id = randomUUID();
    const answers = [
      await request(app).get(`/api/events/${id}/repairs`),
      await request(app).post(`/api/events/${id}/repairs`).send(repairBody()),
      await request(app).get(`/api/repairs/${id}`),
      await request(app).patch(`/api/repairs/${id}`).send({ version: 0, title: 'x' }),
      await request(app).post(`/api/repairs/${id}/photos`),
      await request(app).get(`/api/repairs/${id}/photos/${randomUUID()}`),
      await request(app).delete(`/api/repairs/${id}/photos/${randomUUID()}`),
      await request(app).get('/api/team/repair-subsystems'),
      await request(app).put('/api/team/repair-subsystems').send({ version: 0, subsystems: [{ label: 'Arm' }] }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });
});

describe('repair routes per role', () => {
  for (const role of ROLES) {
    const works = can([role], 'repairs:work');
    const reads = can([role], 'repairs:read');
    it(`${role}: ${reads ? 'reads whole tickets' : 'reads titles and status only'}; ${works ? 'may' : 'may not'} report and edit`, async () => {
      const own = await ownTeam();
      const client = await signIn(app, own.emails[role], PASSWORD);
      const repair = await makeRepair(own.crew, own.event.id);

      const list = await client.get(`/api/events/${own.event.id}/repairs`);
      expect(list.status).toBe(200);
      expect(list.body.detail).toBe(reads);
      const one = await client.get(`/api/repairs/${repair.id}`);
      expect(one.status).toBe(200);
      if (reads) {
        expect(list.body.repairs).toEqual([repair]);
        expect(one.body).toMatchObject({ ...repair, photos: [], history: [expect.objectContaining({ kind: 'created' })] });
      } else {
        // A viewer learns what is broken and where it is on the board, never who or how.
        const summary = { id: repair.id, eventId: own.event.id, title: repair.title, status: 'reported', orderKey: repair.orderKey, version: 0 };
        expect(list.body).toEqual({ repairs: [summary], nextQueue: null, detail: false });
        expect(one.body).toEqual(summary);
      }

      const created = await client.post(`/api/events/${own.event.id}/repairs`, repairBody({ title: 'Bumper bolt loose' }));
      const edited = await client.patch(`/api/repairs/${repair.id}`, { version: 0, title: 'Left drive belt skipping' });
      expect(created.status).toBe(works ? 201 : 403);
      expect(edited.status).toBe(works ? 200 : 403);
      if (!works) {
        expect(created.body).toEqual(FORBIDDEN);
        expect(edited.body).toEqual(FORBIDDEN);
        // Refused before the body is read: a bad body still answers 403, never a validation message.
        expect((await client.post(`/api/events/${own.event.id}/repairs`, { title: 7 })).body).toEqual(FORBIDDEN);
        expect((await client.patch(`/api/repairs/${repair.id}`, { version: 'x' })).body).toEqual(FORBIDDEN);
      }
      expect((await own.crew.get(`/api/events/${own.event.id}/repairs`)).body.repairs).toHaveLength(works ? 2 : 1);
    });
  }
});

describe('reporting a problem', () => {
  it('answers 201 with the whole ticket: reported by the caller, in `reported`, version 0, no urgency without a match ahead', async () => {
    const own = await ownTeam();
    const body = repairBody({ description: 'Clicks once a turn under load', severity: 'blocks_match', estimateMinutes: 20 });
    const answer = await own.crew.post(`/api/events/${own.event.id}/repairs`, body);
    expect(answer.status).toBe(201);
    const reported: RepairJson = answer.body;
    expect(reported).toEqual({
      id: expect.any(String),
      eventId: own.event.id,
      title: 'Left drive belt skipping teeth',
      description: 'Clicks once a turn under load',
      subsystem: 'drivetrain',
      severity: 'blocks_match',
      status: 'reported',
      orderKey: expect.any(String),
      placedByHand: false,
      foundInMatchId: null,
      reporter: { id: own.userOf('crew'), displayName: 'Factory crew' },
      assignee: null,
      estimateMinutes: 20,
      timeSpentMinutes: 0,
      partsUsed: [],
      resolutionNote: null,
      photoCount: 0,
      coverThumbUrl: null,
      reportedAt: expect.any(String),
      updatedAt: reported.reportedAt,
      doneAt: null,
      urgency: { ...NO_URGENCY, remainingMinutes: 20 },
      version: 0,
    });
    expect(Math.abs(Date.parse(reported.reportedAt) - Date.now())).toBeLessThan(60_000);

    const detail: RepairDetailJson = (await own.lead.get(`/api/repairs/${reported.id}`)).body;
    expect(detail).toEqual({
      ...reported,
      photos: [],
      history: [
        {
          id: expect.any(String),
          kind: 'created',
          by: { id: own.userOf('crew'), displayName: 'Factory crew' },
          at: reported.reportedAt,
          changes: {
            title: [null, 'Left drive belt skipping teeth'],
            subsystem: [null, 'drivetrain'],
            severity: [null, 'blocks_match'],
            description: [null, 'Clicks once a turn under load'],
            estimateMinutes: [null, 20],
          },
        },
      ],
    });
  });

  it('takes the match it was found in, an assignee who works on repairs, and trims the texts', async () => {
    const own = await ownTeam();
    const match = await makeOurMatch(own.lead, own.event);
    const repair = await makeRepair(own.crew, own.event.id, {
      title: '  Intake roller slipping  ',
      subsystem: 'intake',
      description: '   ',
      foundInMatchId: match.id,
      assigneeId: own.userOf('lead'),
    });
    expect(repair).toMatchObject({
      title: 'Intake roller slipping',
      description: null,
      foundInMatchId: match.id,
      assignee: { id: own.userOf('lead'), displayName: 'Factory lead' },
    });
  });

  it('answers the same ticket (200) when a tablet resends the same id, and never another team\'s', async () => {
    const own = await ownTeam();
    const id = randomUUID();
    const first = await own.crew.post(`/api/events/${own.event.id}/repairs`, repairBody({ id }));
    const again = await own.crew.post(`/api/events/${own.event.id}/repairs`, repairBody({ id, title: 'Resent with another title' }));
    expect(first.status).toBe(201);
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    expect((await boardOf(own.crew, own.event.id)).repairs).toHaveLength(1);

    const other = await ownTeam();
    const taken = await other.crew.post(`/api/events/${other.event.id}/repairs`, repairBody({ id }));
    expect(taken.status).toBe(409);
    expect(taken.body).toEqual({ error: { code: 'id_taken', message: 'This id is already used by another record' } });
    expect((await boardOf(other.crew, other.event.id)).repairs).toEqual([]);
  });

  it('answers 400 naming each bad field', async () => {
    const own = await ownTeam();
    const url = `/api/events/${own.event.id}/repairs`;
    expect((await own.crew.post(url, {})).body).toEqual(invalid({ title: 'Required', subsystem: 'Required', severity: 'Required' }));
    expect((await own.crew.post(url, repairBody({ title: ' ', severity: 'urgent', subsystem: 'Drive Train' }))).body).toEqual(
      invalid({
        title: 'Say in a few words what is wrong',
        subsystem: 'Pick a subsystem from the list',
        severity: 'One of: blocks_match, degraded, cosmetic',
      }),
    );
    expect((await own.crew.post(url, repairBody({ title: 'x'.repeat(121), estimateMinutes: -5, status: 'done' }))).body).toEqual(
      invalid({ title: 'At most 120 characters', estimateMinutes: 'Estimate: whole minutes from 0 to 10080', status: 'Not a field of this request' }),
    );
    expect((await own.crew.post(url, repairBody({ id: 'not-a-uuid', foundInMatchId: 12 }))).body).toEqual(
      invalid({ id: 'Must be a UUID', foundInMatchId: 'Must be a UUID' }),
    );
    expect((await own.crew.post(url, [repairBody()])).body).toEqual({ error: { code: 'invalid', message: 'Send a JSON object as the request body' } });
    expect((await boardOf(own.crew, own.event.id)).repairs).toEqual([]);
  });

  it('answers 400 for a subsystem off the list, a match of another event, an assignee who does not work on repairs', async () => {
    const own = await ownTeam();
    const other = await ownTeam();
    const foreignMatch = await makeOurMatch(other.lead, other.event);
    const url = `/api/events/${own.event.id}/repairs`;
    const refs = { subsystem: 'flux_capacitor', foundInMatchId: foreignMatch.id, assigneeId: own.userOf('viewer') };
    expect((await own.crew.post(url, repairBody(refs))).body).toEqual(
      invalid({
        subsystem: 'Pick a subsystem from the list',
        foundInMatchId: 'Pick a match of this event',
        assigneeId: 'Pick a member of the team who works on repairs',
      }),
    );
    for (const assigneeId of [own.userOf('battery'), own.userOf('safety'), other.userOf('crew'), randomUUID()]) {
      expect((await own.crew.post(url, repairBody({ assigneeId }))).body).toEqual(invalid({ assigneeId: 'Pick a member of the team who works on repairs' }));
    }
    expect((await boardOf(own.crew, own.event.id)).repairs).toEqual([]);
  });

  it("answers 404 for another team's event and 400 for an id that is not a UUID", async () => {
    const own = await ownTeam();
    const other = await ownTeam();
    expect((await own.crew.post(`/api/events/${other.event.id}/repairs`, repairBody())).body).toEqual(EVENT_NOT_FOUND);
    expect((await own.crew.get(`/api/events/${other.event.id}/repairs`)).body).toEqual(EVENT_NOT_FOUND);
    expect((await own.crew.get(`/api/events/${randomUUID()}/repairs`)).status).toBe(404);
    const bad = await own.crew.get('/api/events/not-a-uuid/repairs');
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual(invalid({ eventId: 'Must be a UUID' }));
    expect((await own.crew.post('/api/events/42/repairs', repairBody())).body).toEqual(invalid({ eventId: 'Must be a UUID' }));
  });
});

describe('the board', () => {
  it('places each new ticket where urgency puts it: blocking first, then more work left, then earlier reported', async () => {
    const own = await ownTeam();
    const report = (title: string, severity: string, estimateMinutes?: number) => makeRepair(own.crew, own.event.id, { title, severity, estimateMinutes });
    await report('Scuffed side panel', 'cosmetic');
    await report('Intake slow', 'degraded', 5);
    await report('Arm will not lift', 'blocks_match', 10);
    await report('Intake jams', 'degraded', 30);
    await report('Drive dead', 'blocks_match', 40);
    await report('Loose zip tie', 'cosmetic');
    const board = await boardOf(own.lead, own.event.id);
    expect(board.repairs.map((repair) => repair.title)).toEqual(['Drive dead', 'Arm will not lift', 'Intake jams', 'Intake slow', 'Scuffed side panel', 'Loose zip tie']);
    // The answer is in board order: the keys sort the column as the strings do (binary).
    const keys = board.repairs.map((repair) => repair.orderKey);
    expect([...keys].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0))).toEqual(keys);
  });

  it('lists every ticket of the event, done ones too, by column; tickets of another event stay out', async () => {
    const own = await ownTeam();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    const done = await makeRepair(own.crew, own.event.id, { title: 'Done one' });
    const testing = await makeRepair(own.crew, own.event.id, { title: 'Testing one' });
    await makeRepair(own.crew, own.event.id, { title: 'Reported one' });
    await own.crew.patch(`/api/repairs/${done.id}`, { version: 0, status: 'done' });
    await own.crew.patch(`/api/repairs/${testing.id}`, { version: 0, status: 'needs_test' });
    const otherEvent = await admin.post('/api/events', { name: 'Second Event', venue: 'Elsewhere Hall', timeZone: 'Europe/Berlin', startDate: '2027-01-09', endDate: '2027-01-10', teamNumber: own.event.teamNumber });
    expect(otherEvent.status).toBe(201);
    await makeRepair(own.crew, otherEvent.body.id, { title: 'Elsewhere' });
    const board = await boardOf(own.crew, own.event.id);
    expect(board.repairs.map((repair) => [repair.status, repair.title])).toEqual([
      ['reported', 'Reported one'],
      ['needs_test', 'Testing one'],
      ['done', 'Done one'],
    ]);
  });

  it('answers the next queue call of ours and each ticket\'s minutes left against it (`at` pins the clock)', async () => {
    const own = await ownTeam();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    expect((await admin.patch(`/api/events/${own.event.id}`, { settings: { queueLead: { minutes: 10 } } })).status).toBe(200);
    const match = await makeOurMatch(own.lead, own.event, { number: 7, scheduledStart: '2026-12-05T10:00:00.000Z' });
    await makeRepair(own.crew, own.event.id, { title: 'Will make it', severity: 'blocks_match', estimateMinutes: 20 });
    await makeRepair(own.crew, own.event.id, { title: 'Too long', severity: 'blocks_match', estimateMinutes: 60 });
    const board = await boardOf(own.crew, own.event.id, '?at=2026-12-05T09:00:30.000Z');
    expect(board.nextQueue).toEqual({ matchId: match.id, queueAt: '2026-12-05T09:50:00.000Z' });
    expect(board.repairs.map((repair) => [repair.title, repair.urgency])).toEqual([
      ['Too long', { neededBy: '2026-12-05T09:50:00.000Z', minutesLeft: 49, remainingMinutes: 60, late: true }],
      ['Will make it', { neededBy: '2026-12-05T09:50:00.000Z', minutesLeft: 49, remainingMinutes: 20, late: false }],
    ]);
    expect((await own.crew.get(`/api/events/${own.event.id}/repairs?at=yesterday`)).status).toBe(400);
  });
});

describe('reading one ticket', () => {
  it("answers 404 for another team's ticket or an unknown id, 400 for an id that is not a UUID", async () => {
    const own = await ownTeam();
    const other = await ownTeam();
    const foreign = await makeRepair(other.crew, other.event.id);
    for (const client of [own.crew, own.lead, clients.viewer]) {
      expect((await client.get(`/api/repairs/${foreign.id}`)).body).toEqual(NOT_FOUND);
    }
    expect((await own.crew.get(`/api/repairs/${randomUUID()}`)).body).toEqual(NOT_FOUND);
    expect((await own.crew.get('/api/repairs/..%2F..%2Fetc')).status).toBe(400);
    expect((await own.crew.get('/api/repairs/123')).body).toEqual(invalid({ id: 'Must be a UUID' }));
  });
});
