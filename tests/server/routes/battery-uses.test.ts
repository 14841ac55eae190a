import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { BATTERY_DEFAULTS, modelledMatchDrawPercent } from '../../../shared/domain/battery-state';
import { ROLES, type Role } from '../../../shared/roles';
import type { BatteryJson, UseJson } from '../../../shared/schemas/batteries';
import { BatteryUse } from '../../../server/models';
import { signIn, testApp } from '../../support/app';
import { install, logReading, makeBattery, makeCharger, startCharging, statusesOf } from '../../support/batteries';
import { makeOurMatch } from '../../support/checks';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { eventBody, makeTeam, PASSWORD } from '../../support/factories';
import { matchBody } from '../../support/schedule';

// POST /api/batteries/:id/uses, PATCH /api/battery-uses/:id, and the battery part of readiness.
// Our match starts at 10:00 and the event queues 10 minutes ahead: the queue call is at 09:50.
const { app } = testApp();

const MAY_SWAP: Record<Role, boolean> = { admin: true, lead: false, crew: true, battery: true, safety: false, viewer: false };
const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;
const START = '2026-12-05T10:00:00.000Z';
const MISSING_CHECK = { code: 'checklist_missing', level: 'at_risk', message: 'No pre-match check has been started for this match' };
const NOT_INSTALLED = { code: 'battery_not_installed', level: 'at_risk', message: 'No battery is recorded as installed for this match' };

/** A team with a full battery, a half-empty one and one of our matches. */
async function pit() {
  const own = await makeTeam();
  const admin = await signIn(app, own.emails.admin, PASSWORD);
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const handler = await signIn(app, own.emails.battery, PASSWORD);
  expect((await admin.patch(`/api/events/${own.event.id}`, { settings: { queueLead: { minutes: 10 } } })).status).toBe(200);
  const match = await makeOurMatch(lead, own.event, { number: 5, scheduledStart: START });
  const full = await makeBattery(handler, { label: 'FULL' });
  await logReading(handler, full.id, { voltage: 12.7 });
  const half = await makeBattery(handler, { label: 'HALF' });
  await logReading(handler, half.id, { voltage: 12.3 });
  const readiness = async (matchId = match.id) => {
    const answer = await crew.get(`/api/events/${own.event.id}/matches/${matchId}/readiness?at=2026-12-05T09:00:00.000Z`);
    expect(answer.status, JSON.stringify(answer.body)).toBe(200);
    return answer.body;
  };
  const battery = async (id: string) => (await crew.get(`/api/batteries/${id}`)).body as BatteryJson & { uses: UseJson[] };
  return { ...own, admin, lead, crew, handler, match, full, half, readiness, battery };
}

const nowIso = () => new Date().toISOString();

describe('use routes signed out and per role', () => {
  it('answer 401 signed out', async () => {
    const answers = [
      await request(app).post(`/api/batteries/${randomUUID()}/uses`).send({ matchId: randomUUID() }),
      await request(app).patch(`/api/battery-uses/${randomUUID()}`).send({ removedAt: nowIso() }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });

  for (const role of ROLES) {
    it(`${role}: ${MAY_SWAP[role] ? 'may' : 'may not'} install and take out a battery`, async () => {
      const own = await pit();
      const client = await signIn(app, own.emails[role], PASSWORD);
      const installed = await client.post(`/api/batteries/${own.full.id}/uses`, { matchId: own.match.id });
      expect(installed.status).toBe(MAY_SWAP[role] ? 201 : 403);
      const use = MAY_SWAP[role] ? (installed.body as UseJson) : await install(own.handler, own.full.id, own.match.id);
      const removed = await client.patch(`/api/battery-uses/${use.id}`, { removedAt: nowIso() });
      expect(removed.status).toBe(MAY_SWAP[role] ? 200 : 403);
      if (!MAY_SWAP[role]) {
        expect(installed.body).toEqual(FORBIDDEN);
        expect(removed.body).toEqual(FORBIDDEN);
        expect((await own.battery(own.full.id)).status).toBe('in_robot');
      }
    });
  }
});

describe('installing and taking out', () => {
  it('turns readiness from battery_not_installed to no battery reason, and the statuses in_robot then spent', async () => {
    const own = await pit();
    expect(await own.readiness()).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [MISSING_CHECK, NOT_INSTALLED] });

    const installed = await own.crew.post(`/api/batteries/${own.full.id}/uses`, { matchId: own.match.id });
    expect(installed.status).toBe(201);
    expect(installed.body).toEqual({ id: expect.any(String), batteryId: own.full.id, matchId: own.match.id, installedAt: expect.stringMatching(ISO), removedAt: null });
    expect(await own.readiness()).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [MISSING_CHECK] });
    expect(await own.battery(own.full.id)).toMatchObject({ status: 'in_robot', version: 1, usesThisEvent: 1, lastUsedAt: installed.body.installedAt });

    const removedAt = nowIso();
    const removed = await own.crew.patch(`/api/battery-uses/${installed.body.id}`, { removedAt });
    expect(removed.status).toBe(200);
    expect(removed.body).toEqual({ ...installed.body, removedAt });
    const after = await own.battery(own.full.id);
    expect(after).toMatchObject({ status: 'spent', version: 2, usesThisEvent: 1, lastUsedAt: removedAt });
    expect(after.uses).toEqual([removed.body]);
    expect(await own.readiness()).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [MISSING_CHECK, NOT_INSTALLED] });
  });

  it('after a match the estimated charge is one match’s draw below its last reading, which still says 100 %', async () => {
    const own = await pit();
    const listed = async (id: string) => ((await own.crew.get('/api/batteries')).body as BatteryJson[]).find((battery) => battery.id === id)!;
    const use = await install(own.crew, own.full.id, own.match.id);
    expect(await listed(own.full.id)).toMatchObject({ status: 'in_robot', estimatedChargePercent: 100 });
    expect((await own.crew.patch(`/api/battery-uses/${use.id}`, { removedAt: nowIso() })).status).toBe(200);

    // No reading after the match, so the draw is modelled: Peukert (REFERENCES §3) for the event's
    // match length at the fleet's 18 Ah and the default settings.
    const draw = modelledMatchDrawPercent(18, own.event.matchLengthSeconds, BATTERY_DEFAULTS);
    const full = await listed(own.full.id);
    expect(full.status).toBe('spent');
    expect(full.latestReading?.stateOfChargePercent).toBe(100);
    expect(full.estimatedChargePercent).toBe(Math.round((100 - draw) * 10) / 10);
    expect(full.estimatedChargePercent).toBeLessThan(100);
    expect((await own.battery(own.full.id)).estimatedChargePercent).toBe(full.estimatedChargePercent);
    // A battery with nothing since its reading is estimated at that reading.
    const half = await listed(own.half.id);
    expect(half.estimatedChargePercent).toBe(half.latestReading?.stateOfChargePercent);
  });

  it('a battery below the minimum start charge makes the match not ready, naming it', async () => {
    const own = await pit();
    await install(own.crew, own.half.id, own.match.id);
    expect(await own.readiness()).toEqual({
      matchId: own.match.id,
      state: 'not_ready',
      reasons: [{ code: 'battery_low', level: 'not_ready', message: 'Battery HALF is at about 57 %, below the 90 % a match needs' }, MISSING_CHECK],
    });
    // The minimum is a team setting.
    expect((await own.handler.patch('/api/team/battery-settings', { minimumStartChargePercent: 50 })).status).toBe(200);
    expect(await own.readiness()).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [MISSING_CHECK] });
  });

  it('says nothing about batteries for a team with none in service', async () => {
    const own = await makeTeam();
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const handler = await signIn(app, own.emails.battery, PASSWORD);
    const match = await makeOurMatch(lead, own.event, { scheduledStart: START });
    const url = `/api/events/${own.event.id}/matches/${match.id}/readiness?at=2026-12-05T08:00:00.000Z`;
    expect((await lead.get(url)).body.reasons).toEqual([MISSING_CHECK]);
    const battery = await makeBattery(handler, { label: 'LONE' });
    expect((await lead.get(url)).body.reasons).toEqual([MISSING_CHECK, NOT_INSTALLED]);
    expect((await handler.patch(`/api/batteries/${battery.id}`, { status: 'retired' })).status).toBe(200);
    expect((await lead.get(url)).body.reasons).toEqual([MISSING_CHECK]);
  });

  it('one battery in the robot at a time: another install answers 409 until it is taken out', async () => {
    const own = await pit();
    const use = await install(own.crew, own.full.id, own.match.id);
    const again = await own.crew.post(`/api/batteries/${own.full.id}/uses`, { matchId: own.match.id });
    expect(again.status).toBe(409);
    expect(again.body).toEqual({ error: { code: 'battery_in_robot', message: 'Battery FULL is already in the robot' } });
    const later = await makeOurMatch(own.lead, own.event, { number: 12, scheduledStart: '2026-12-05T11:00:00.000Z' });
    const other = await own.crew.post(`/api/batteries/${own.half.id}/uses`, { matchId: later.id });
    expect(other.status).toBe(409);
    expect(other.body).toEqual({ error: { code: 'robot_has_battery', message: 'Battery FULL is still in the robot: record it taken out first' } });
    expect((await own.crew.patch(`/api/battery-uses/${use.id}`, { removedAt: nowIso() })).status).toBe(200);
    expect((await own.crew.post(`/api/batteries/${own.half.id}/uses`, { matchId: later.id })).status).toBe(201);
  });

  it('refuses a retired battery (409), a match we do not play in (400) and a match not of the current event (404)', async () => {
    const own = await pit();
    await own.handler.patch(`/api/batteries/${own.half.id}`, { status: 'retired' });
    const retired = await own.crew.post(`/api/batteries/${own.half.id}/uses`, { matchId: own.match.id });
    expect(retired.status).toBe(409);
    expect(retired.body).toEqual({ error: { code: 'retired', message: 'Battery HALF is retired: put it back in service before using it' } });

    const notOurs = await own.lead.post(`/api/events/${own.event.id}/matches`, matchBody({ number: 40 }));
    const notOurMatch = await own.crew.post(`/api/batteries/${own.full.id}/uses`, { matchId: notOurs.body.id });
    expect(notOurMatch.status).toBe(400);
    expect(notOurMatch.body).toEqual({ error: { code: 'not_our_match', message: 'We do not play in this match', fields: { matchId: 'We do not play in this match' } } });

    const otherEvent = await own.admin.post('/api/events', eventBody({ teamNumber: own.event.teamNumber }));
    const elsewhere = await makeOurMatch(own.lead, otherEvent.body, { number: 3 });
    const theirs = await pit();
    for (const matchId of [elsewhere.id, theirs.match.id, randomUUID()]) {
      const answer = await own.crew.post(`/api/batteries/${own.full.id}/uses`, { matchId });
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Match not found' } });
    }
    expect((await own.battery(own.full.id)).status).toBe('ready');
    expect((await own.crew.post(`/api/batteries/${own.full.id}/uses`, { matchId: 'q5' })).body).toEqual(invalid({ matchId: 'Must be a UUID' }));
  });

  it('a battery taken off its charger to go in the robot ends that charge and frees the bay', async () => {
    const own = await pit();
    const charger = await makeCharger(own.handler, { bays: 1 });
    await startCharging(own.handler, own.half.id, charger.id, 1);
    await install(own.crew, own.half.id, own.match.id);
    const half = await own.battery(own.half.id);
    expect(half).toMatchObject({ status: 'in_robot', charging: null });
    await startCharging(own.handler, own.full.id, charger.id, 1);
  });

  it('is idempotent on the client id', async () => {
    const own = await pit();
    const id = randomUUID();
    const first = await own.crew.post(`/api/batteries/${own.full.id}/uses`, { id, matchId: own.match.id });
    expect(first.status).toBe(201);
    const again = await own.crew.post(`/api/batteries/${own.full.id}/uses`, { id, matchId: own.match.id });
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    const theirs = await pit();
    const foreign = await theirs.crew.post(`/api/batteries/${theirs.full.id}/uses`, { id, matchId: theirs.match.id });
    expect(foreign.status).toBe(409);
    expect(foreign.body.error.code).toBe('id_taken');
  });

  it('refuses the id of one battery’s use for another battery (409), rather than answer the first one’s use', async () => {
    const own = await pit();
    const first = await install(own.crew, own.full.id, own.match.id);
    const reused = await own.crew.post(`/api/batteries/${own.half.id}/uses`, { id: first.id, matchId: own.match.id });
    expect(reused.status).toBe(409);
    expect(reused.body.error.code).toBe('id_taken');
    expect((await own.battery(own.half.id)).status).toBe('ready');
  });

  it('a status set by hand takes the battery out of the robot', async () => {
    const own = await pit();
    const use = await install(own.crew, own.full.id, own.match.id);
    expect((await own.handler.patch(`/api/batteries/${own.full.id}`, { status: 'resting' })).body.status).toBe('resting');
    const [stored] = (await own.battery(own.full.id)).uses;
    expect(stored.id).toBe(use.id);
    expect(stored.removedAt).toMatch(ISO);
    expect((await own.readiness()).reasons).toContainEqual(NOT_INSTALLED);
  });
});

describe('taking out', () => {
  it('answers 400 for a time before it went in or in the future, 404 for another team', async () => {
    const own = await pit();
    const use = await install(own.crew, own.full.id, own.match.id);
    const before = new Date(Date.parse(use.installedAt) - 60_000).toISOString();
    const early = await own.crew.patch(`/api/battery-uses/${use.id}`, { removedAt: before });
    expect(early.body).toEqual(invalid({ removedAt: `Must not be before it went in (${use.installedAt})` }));
    const future = await own.crew.patch(`/api/battery-uses/${use.id}`, { removedAt: new Date(Date.now() + 5 * 60_000).toISOString() });
    expect(future.body).toEqual(invalid({ removedAt: 'Must not be in the future' }));
    expect((await own.crew.patch(`/api/battery-uses/${use.id}`, {})).body).toEqual(invalid({ removedAt: 'Required' }));

    const theirs = await pit();
    for (const id of [use.id, randomUUID()]) {
      const answer = await theirs.crew.patch(`/api/battery-uses/${id}`, { removedAt: nowIso() });
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Battery use not found' } });
    }
    expect((await own.battery(own.full.id)).status).toBe('in_robot');
  });

  it('sent again, corrects the time and leaves a battery already charging alone', async () => {
    const own = await pit();
    const charger = await makeCharger(own.handler);
    const use = await install(own.crew, own.full.id, own.match.id);
    const first = nowIso();
    await own.crew.patch(`/api/battery-uses/${use.id}`, { removedAt: first });
    await startCharging(own.handler, own.full.id, charger.id);
    const corrected = await own.crew.patch(`/api/battery-uses/${use.id}`, { removedAt: use.installedAt });
    expect(corrected.body.removedAt).toBe(use.installedAt);
    expect((await own.battery(own.full.id)).status).toBe('charging');
  });
});

describe('two tablets at once', () => {
  it('installing two batteries for the same match: one wins, the other answers 409', async () => {
    for (let round = 0; round < 3; round++) {
      const own = await pit();
      const answers = await Promise.all([
        own.crew.post(`/api/batteries/${own.full.id}/uses`, { matchId: own.match.id }),
        own.handler.post(`/api/batteries/${own.half.id}/uses`, { matchId: own.match.id }),
      ]);
      expect(statusesOf(answers)).toEqual([201, 409]);
      expect(await BatteryUse.count({ where: { matchId: own.match.id, removedAt: null } })).toBe(1);
    }
  });

  it('installing one battery twice (new ids, two matches): one wins, the other answers 409', async () => {
    const own = await pit();
    const later = await makeOurMatch(own.lead, own.event, { number: 12, scheduledStart: '2026-12-05T11:00:00.000Z' });
    const answers = await Promise.all([
      own.crew.post(`/api/batteries/${own.full.id}/uses`, { matchId: own.match.id }),
      own.handler.post(`/api/batteries/${own.full.id}/uses`, { matchId: later.id }),
      own.admin.post(`/api/batteries/${own.full.id}/uses`, { matchId: own.match.id }),
    ]);
    expect(statusesOf(answers)).toEqual([201, 409, 409]);
    expect(await BatteryUse.count({ where: { batteryId: own.full.id } })).toBe(1);
  });
});
