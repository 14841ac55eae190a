import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { can, ROLES, type Role } from '../../../shared/roles';
import type { IncidentJson } from '../../../shared/schemas/incidents';
import { Event, Incident } from '../../../server/models';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { makeBattery } from '../../support/batteries';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, makeTeamWithoutEvent, PASSWORD } from '../../support/factories';
import { editIncident, incidentBody, reportIncident } from '../../support/incidents';

// POST /api/incidents, GET /api/incidents, GET /api/incidents/:id (edits are in incidents-update.test.ts).
const { app } = testApp();

const NOT_FOUND = { error: { code: 'not_found', message: 'Incident not found' } };
const INITIALS = 'Initials only: 1 to 4 letters, never a full name';

/** A team of our own with every role signed in. */
async function ownTeam() {
  const own = await makeTeam();
  const as = await signInEveryRole(app, own.emails, PASSWORD);
  return { ...own, as, userOf: (role: Role) => own.memberships[role].userId };
}

describe('incident routes signed out', () => {
  it('answer 401 to every route and verb', async () => {
    const id = randomUUID();
    const answers = [
      await request(app).get('/api/incidents'),
      await request(app).post('/api/incidents').send(incidentBody()),
      await request(app).get(`/api/incidents/${id}`),
      await request(app).patch(`/api/incidents/${id}`).send({ version: 0, status: 'closed' }),
      await request(app).get('/api/incidents.csv'),
      await request(app).post(`/api/incidents/${id}/photos`),
      await request(app).get(`/api/incidents/${id}/photos/${randomUUID()}`),
      await request(app).delete(`/api/incidents/${id}/photos/${randomUUID()}`),
      await request(app).get('/api/team/alert-rules'),
      await request(app).put('/api/team/alert-rules/immediate').send({ version: 0, roles: [], extraAddresses: [] }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });
});

describe('incident routes per role', () => {
  for (const role of ROLES) {
    const reads = can([role], 'incidents:read');
    it(`${role}: reports, reads its own report ${reads ? 'whole' : 'in the reporter view'}, ${reads ? 'reads and edits the log' : 'never the log nor anyone else’s report'}`, async () => {
      const own = await ownTeam();
      const client = own.as[role];
      const others = await reportIncident(own.as[role === 'crew' ? 'battery' : 'crew'], { description: 'Someone else’s report' });

      const mine = await client.post('/api/incidents', incidentBody());
      expect(mine.status).toBe(201);
      expect(mine.body.view).toBe(reads ? 'full' : 'reporter');
      expect((await client.get(`/api/incidents/${mine.body.id}`)).body).toEqual(mine.body);

      const list = await client.get('/api/incidents');
      const theirs = await client.get(`/api/incidents/${others.id}`);
      const edited = await client.patch(`/api/incidents/${others.id}`, { version: 0, immediateActions: 'Drill bits racked' });
      const csv = await client.get('/api/incidents.csv');
      if (reads) {
        expect(list.status).toBe(200);
        expect(list.body.incidents.map((incident: IncidentJson) => incident.id).sort()).toEqual([mine.body.id, others.id].sort());
        expect(theirs.status).toBe(200);
        expect(theirs.body.view).toBe('full');
        expect(edited.status).toBe(200);
        expect(csv.status).toBe(200);
      } else {
        for (const answer of [list, theirs, edited, csv]) {
          expect(answer.status).toBe(403);
          expect(answer.body).toEqual(FORBIDDEN);
        }
        // Refused before the body is read: a bad body still answers 403, never a validation message.
        expect((await client.patch(`/api/incidents/${others.id}`, { version: 'x' })).body).toEqual(FORBIDDEN);
        expect((await client.get('/api/incidents?eventId=nope')).body).toEqual(FORBIDDEN);
      }
    });
  }
});

describe('reporting an incident', () => {
  it('answers 201 with every field as sent, classed, in the current event, reported by the caller, version 0', async () => {
    const own = await ownTeam();
    const battery = await makeBattery(own.as.battery, { label: '24-C' });
    const id = randomUUID();
    const occurredAt = '2026-03-07T14:32:10.000Z';
    const answer = await own.as.safety.post('/api/incidents', {
      id,
      occurredAt: '2026-03-07T15:32:10+01:00',
      location: 'pit',
      kind: 'battery_or_chemical',
      description: '  Acid weeping from a cracked case splashed onto a wrist  ',
      involved: [
        { initials: 'j.t.', role: 'student' },
        { initials: 'Ré', role: 'mentor' },
      ],
      treatments: ['wound_covering', 'wound_cleaning', 'wound_cleaning'],
      immediateActions: 'Flushed with water for 15 minutes at the eyewash station',
      batteryId: battery.id,
    });
    expect(answer.status).toBe(201);
    const reported: IncidentJson = answer.body;
    expect(reported).toEqual({
      id,
      eventId: own.event.id,
      occurredAt,
      location: 'pit',
      kind: 'battery_or_chemical',
      description: 'Acid weeping from a cracked case splashed onto a wrist',
      involved: [
        { initials: 'JT', role: 'student' },
        { initials: 'RÉ', role: 'mentor' },
      ],
      // In the list's order, each once.
      treatments: ['wound_cleaning', 'wound_covering'],
      immediateActions: 'Flushed with water for 15 minutes at the eyewash station',
      batteryId: battery.id,
      batteryName: '24-C',
      classification: { class: 'first_aid_only', basis: ['wound_cleaning', 'wound_covering'] },
      alertReasons: ['battery_or_chemical'],
      status: 'open',
      view: 'full',
      followUps: [],
      closingNote: null,
      closedAt: null,
      photos: [],
      reporter: { id: own.userOf('safety'), name: 'Factory safety' },
      createdAt: expect.any(String),
      updatedAt: expect.any(String),
      version: 0,
    });
    const row = await Incident.findByPk(id, { rejectOnEmpty: true });
    expect({ incidentClass: row.incidentClass, alertedRule: row.alertedRule, teamId: row.teamId }).toEqual({
      incidentClass: 'first_aid_only',
      alertedRule: 'immediate',
      teamId: own.team.id,
    });
  });

  it('takes the fewest fields: nobody named, no care, no battery, no event when the team has none', async () => {
    const { team, emails } = await makeTeamWithoutEvent();
    const crew = await signIn(app, emails.crew, PASSWORD);
    const reported = await reportIncident(crew, { immediateActions: '' });
    expect(reported).toMatchObject({
      eventId: null,
      involved: [],
      treatments: [],
      immediateActions: null,
      batteryId: null,
      batteryName: null,
      classification: { class: 'near_miss', basis: [] },
      alertReasons: [],
      view: 'reporter',
    });
    expect((await Incident.findByPk(reported.id, { rejectOnEmpty: true })).teamId).toBe(team.id);
  });

  it('files it under the event named, or under none with eventId null (on the way to an event)', async () => {
    const own = await ownTeam();
    const earlier = await Event.create({ ...own.event.get(), id: undefined, name: 'Last season', startDate: '2026-03-01', endDate: '2026-03-02' });
    expect((await reportIncident(own.as.crew, { eventId: earlier.id })).eventId).toBe(earlier.id);
    expect((await reportIncident(own.as.crew, { eventId: null, location: 'travel' })).eventId).toBeNull();
  });

  it('classes by the care given: beyond first aid, first aid only, near miss, and never lower than the care', async () => {
    const own = await ownTeam();
    const cases = [
      [{ kind: 'injury', treatments: ['wound_covering', 'hospital_visit'] }, { class: 'beyond_first_aid', basis: ['hospital_visit'] }, ['beyond_first_aid']],
      [{ kind: 'injury', treatments: ['loss_of_consciousness'] }, { class: 'beyond_first_aid', basis: ['loss_of_consciousness'] }, ['loss_of_consciousness']],
      [{ kind: 'injury', treatments: ['hot_cold_therapy'] }, { class: 'first_aid_only', basis: ['hot_cold_therapy'] }, []],
      [{ kind: 'tool_or_machine', treatments: [] }, { class: 'near_miss', basis: [] }, []],
      // A "near miss" with a bandage given was not one.
      [{ kind: 'near_miss', treatments: ['wound_covering'] }, { class: 'first_aid_only', basis: ['wound_covering'] }, []],
      // Acid on the skin alerts at once, even before any care.
      [{ kind: 'battery_or_chemical', treatments: [] }, { class: 'near_miss', basis: [] }, ['battery_or_chemical']],
    ] as const;
    for (const [body, classification, alertReasons] of cases) {
      const reported = await reportIncident(own.as.safety, body);
      expect({ classification: reported.classification, alertReasons: reported.alertReasons }, JSON.stringify(body)).toEqual({ classification, alertReasons });
      expect((await Incident.findByPk(reported.id, { rejectOnEmpty: true })).incidentClass).toBe(classification.class);
    }
  });

  it('answers the first report again (200) when the same id is resent, and writes one row', async () => {
    const own = await ownTeam();
    const id = randomUUID();
    const body = incidentBody({ id, kind: 'injury', treatments: ['hospital_visit'] });
    const first = await own.as.crew.post('/api/incidents', body);
    const again = await own.as.crew.post('/api/incidents', { ...body, description: 'Sent twice from a tablet that lost its connection' });
    expect(first.status).toBe(201);
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await Incident.count({ where: { id } })).toBe(1);
  });

  it('refuses an id already used by someone else, in this team or another (409 id_taken)', async () => {
    const own = await ownTeam();
    const other = await makeTeam();
    const otherCrew = await signIn(app, other.emails.crew, PASSWORD);
    const mine = await reportIncident(own.as.crew);
    const ID_TAKEN = { error: { code: 'id_taken', message: 'This id is already used by another record' } };
    for (const client of [own.as.lead, otherCrew]) {
      const answer = await client.post('/api/incidents', incidentBody({ id: mine.id }));
      expect(answer.status).toBe(409);
      expect(answer.body).toEqual(ID_TAKEN);
    }
  });
});

describe('a report that does not hold', () => {
  let own: Awaited<ReturnType<typeof ownTeam>>;
  beforeAll(async () => {
    own = await ownTeam();
  });
  const post = (body: Record<string, unknown>) => own.as.crew.post('/api/incidents', body);

  it('names every missing field', async () => {
    const answer = await post({});
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ occurredAt: 'Required', location: 'Required', kind: 'Required', description: 'Required' }));
  });

  it('refuses initials longer than four letters (a name, perhaps), and anything but letters', async () => {
    for (const initials of ['Alice', 'J. Smith', 'J7', '']) {
      const answer = await post(incidentBody({ involved: [{ initials: 'AB', role: 'student' }, { initials, role: 'visitor' }] }));
      expect(answer.body, initials).toEqual(invalid({ 'involved.1.initials': INITIALS }));
    }
    const noRole = await post(incidentBody({ involved: [{ initials: 'AB', role: 'parent', name: 'Alice Brown' }] }));
    expect(noRole.body.error.fields).toEqual({
      'involved.0.role': 'One of: student, mentor, adult_volunteer, other_team, event_staff, visitor, other',
      'involved.0.name': 'Not a field of this request',
    });
  });

  it('refuses a treatment that is not on the list, a place or kind not on theirs, and an empty description', async () => {
    const answer = await post(incidentBody({ treatments: ['wound_covering', 'amputation'], location: 'roof', kind: 'fire', description: '   ' }));
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields).toEqual({
      location: 'One of: pit, queue, field, stands, travel, other',
      kind: 'One of: injury, near_miss, battery_or_chemical, tool_or_machine, property_damage, other',
      description: 'Say what happened',
      'treatments.1': 'Pick treatments from the list',
    });
  });

  it('refuses a moment in the future, and one that is not an instant', async () => {
    const later = await post(incidentBody({ occurredAt: new Date(Date.now() + 10 * 60_000).toISOString() }));
    expect(later.body).toEqual(invalid({ occurredAt: 'Must not be in the future' }));
    const bare = await post(incidentBody({ occurredAt: '2026-12-05 14:32' }));
    expect(bare.status).toBe(400);
    expect(Object.keys(bare.body.error.fields)).toEqual(['occurredAt']);
  });

  it("answers 404 naming the field for another team's battery or event, and writes nothing", async () => {
    const other = await makeTeam();
    const theirBattery = await makeBattery(await signIn(app, other.emails.battery, PASSWORD));
    const before = await Incident.count({ where: { teamId: own.team.id } });
    const battery = await post(incidentBody({ batteryId: theirBattery.id }));
    expect(battery.status).toBe(404);
    expect(battery.body).toEqual({ error: { code: 'not_found', message: 'Battery not found', fields: { batteryId: 'Not a battery of this team' } } });
    const event = await post(incidentBody({ eventId: other.event.id }));
    expect(event.status).toBe(404);
    expect(event.body).toEqual({ error: { code: 'not_found', message: 'Event not found', fields: { eventId: 'Not an event of this team' } } });
    expect(await Incident.count({ where: { teamId: own.team.id } })).toBe(before);
  });
});

describe('who reads a report', () => {
  it('the reporter reads what they sent and where it stands, never the follow-ups or the closing note', async () => {
    const own = await ownTeam();
    const sent = await reportIncident(own.as.viewer, { kind: 'injury', treatments: ['hot_cold_therapy'], involved: [{ initials: 'KL', role: 'visitor' }] });
    const closed = await editIncident(own.as.safety, sent, {
      followUps: [{ text: 'Tape down the cable across the aisle', ownerId: own.memberships.lead.id, dueOn: '2026-12-06' }],
      status: 'closed',
      closingNote: 'Visitor KL fine after ice; aisle cable taped',
    });
    expect(closed.followUps).toHaveLength(1);

    const answer = await own.as.viewer.get(`/api/incidents/${sent.id}`);
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({ ...closed, view: 'reporter', followUps: [], closingNote: null });
    expect(answer.body.status).toBe('closed');
  });

  it("another member of the team gets 403 on someone else's report; a missing one is 404", async () => {
    const own = await ownTeam();
    const sent = await reportIncident(own.as.crew);
    for (const role of ['lead', 'battery', 'viewer'] as const) {
      const answer = await own.as[role].get(`/api/incidents/${sent.id}`);
      expect(answer.status).toBe(403);
      expect(answer.body).toEqual(FORBIDDEN);
    }
    expect((await own.as.crew.get(`/api/incidents/${randomUUID()}`)).body).toEqual(NOT_FOUND);
  });

  it("another team's report is 404 for every route, whatever the role, and never in their list", async () => {
    const own = await ownTeam();
    const other = await ownTeam();
    const theirs = await reportIncident(other.as.safety, { description: 'Their team only' });
    for (const role of ['admin', 'safety', 'crew'] as const) {
      const client: SignedIn = own.as[role];
      const answers = [await client.get(`/api/incidents/${theirs.id}`)];
      if (can([role], 'incidents:manage')) {
        answers.push(await client.patch(`/api/incidents/${theirs.id}`, { version: 0, status: 'closed', closingNote: 'x' }));
        answers.push(await client.delete(`/api/incidents/${theirs.id}/photos/${randomUUID()}`));
      }
      answers.push(await client.get(`/api/incidents/${theirs.id}/photos/${randomUUID()}`));
      answers.push(await client.agent.post(`/api/incidents/${theirs.id}/photos`).set('x-csrf-token', client.csrfToken));
      for (const answer of answers) expect(answer.body, role).toEqual(NOT_FOUND);
    }
    const list = await own.as.safety.get('/api/incidents?eventId=all');
    expect(list.body.incidents.map((incident: IncidentJson) => incident.id)).not.toContain(theirs.id);
  });
});

describe('the safety log', () => {
  it("lists the current event's incidents newest first by default; all, one event or one status when asked", async () => {
    const own = await ownTeam();
    const earlier = await Event.create({ ...own.event.get(), id: undefined, name: 'Last season', startDate: '2026-03-01', endDate: '2026-03-02' });
    const at = (hoursAgo: number) => new Date(Date.now() - hoursAgo * 3_600_000).toISOString();
    const morning = await reportIncident(own.as.crew, { occurredAt: at(5), description: 'Morning' });
    const noon = await reportIncident(own.as.crew, { occurredAt: at(2), description: 'Noon' });
    const road = await reportIncident(own.as.crew, { occurredAt: at(30), description: 'On the road', eventId: null });
    const past = await reportIncident(own.as.crew, { occurredAt: at(3000), description: 'Last season', eventId: earlier.id });
    await editIncident(own.as.safety, noon, { status: 'closed', closingNote: 'Done' });

    const descriptions = async (query: string) => {
      const answer = await own.as.safety.get(`/api/incidents${query}`);
      expect(answer.status, JSON.stringify(answer.body)).toBe(200);
      return answer.body.incidents.map((incident: IncidentJson) => incident.description);
    };
    expect(await descriptions('')).toEqual([noon.description, morning.description]);
    expect(await descriptions('?eventId=all')).toEqual([noon.description, morning.description, road.description, past.description]);
    expect(await descriptions(`?eventId=${earlier.id}`)).toEqual([past.description]);
    expect(await descriptions('?status=open')).toEqual([morning.description]);
    expect(await descriptions('?eventId=all&status=closed')).toEqual([noon.description]);
  });

  it('lists every incident while the team has no current event', async () => {
    const { emails } = await makeTeamWithoutEvent();
    const safety = await signIn(app, emails.safety, PASSWORD);
    const reported = await reportIncident(safety);
    expect((await safety.get('/api/incidents')).body.incidents.map((incident: IncidentJson) => incident.id)).toEqual([reported.id]);
  });

  it("refuses a query it does not know, and answers 404 for another team's event", async () => {
    const own = await ownTeam();
    const other = await makeTeam();
    expect((await own.as.safety.get('/api/incidents?eventId=last&status=maybe&sort=name')).body).toEqual(
      invalid({ eventId: 'Must be a UUID', status: 'open or closed', sort: 'Not a field of this request' }),
    );
    expect((await own.as.safety.get(`/api/incidents?eventId=${other.event.id}`)).body).toEqual({ error: { code: 'not_found', message: 'Event not found' } });
  });
});
