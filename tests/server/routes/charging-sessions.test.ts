import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/roles';
import type { BatteryJson, ChargingSessionJson } from '../../../shared/schemas/batteries';
import { signIn, testApp } from '../../support/app';
import { install, logReading, makeBattery, makeCharger, startCharging, statusesOf } from '../../support/batteries';
import { makeOurMatch } from '../../support/checks';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';

// POST /api/batteries/:id/charging and PATCH /api/charging-sessions/:id (our extension of the API).
const { app } = testApp();

const MAY_MANAGE: Record<Role, boolean> = { admin: true, lead: false, crew: false, battery: true, safety: false, viewer: false };
const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;
const MINUTE_MS = 60_000;
const minutesOf = (session: ChargingSessionJson) => (Date.parse(session.expectedEndAt!) - Date.parse(session.startedAt)) / MINUTE_MS;

/** A team with a two-bay 6 A bench charger and its battery handler signed in. */
async function bench() {
  const own = await makeTeam();
  const handler = await signIn(app, own.emails.battery, PASSWORD);
  const charger = await makeCharger(handler, { name: 'Bench charger', bays: 2, currentPerBayA: 6 });
  const battery = async (id: string) => (await handler.get(`/api/batteries/${id}`)).body as BatteryJson;
  return { ...own, handler, charger, battery };
}

describe('charging routes', () => {
  it('answer 401 signed out', async () => {
    const answers = [
      await request(app).post(`/api/batteries/${randomUUID()}/charging`).send({ chargerId: randomUUID(), bay: 1 }),
      await request(app).patch(`/api/charging-sessions/${randomUUID()}`).send({ endedAt: new Date().toISOString() }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });

  for (const role of ROLES) {
    it(`${role}: ${MAY_MANAGE[role] ? 'may' : 'may not'} put a battery on a charger and take it off`, async () => {
      const own = await bench();
      const client = await signIn(app, own.emails[role], PASSWORD);
      const battery = await makeBattery(own.handler);
      const started = await client.post(`/api/batteries/${battery.id}/charging`, { chargerId: own.charger.id, bay: 1 });
      expect(started.status).toBe(MAY_MANAGE[role] ? 201 : 403);
      const session = MAY_MANAGE[role] ? (started.body as ChargingSessionJson) : await startCharging(own.handler, battery.id, own.charger.id);
      const ended = await client.patch(`/api/charging-sessions/${session.id}`, { endedAt: new Date().toISOString() });
      expect(ended.status).toBe(MAY_MANAGE[role] ? 200 : 403);
      if (!MAY_MANAGE[role]) {
        expect(started.body).toEqual(FORBIDDEN);
        expect(ended.body).toEqual(FORBIDDEN);
      }
    });
  }
});

describe('charging', () => {
  it('answers the session with its expected end (REFERENCES §4: 9 Ah missing × 1.12 ÷ 6 A = 100.8 min, plus the 20 min tail); the battery is charging, then ready', async () => {
    const own = await bench();
    const battery = await makeBattery(own.handler, { label: 'HALF' });
    // 12.24 V rested is 50 % in the BCI table (REFERENCES §1): 9 of 18 Ah missing.
    await logReading(own.handler, battery.id, { voltage: 12.24 });
    const answer = await own.handler.post(`/api/batteries/${battery.id}/charging`, { chargerId: own.charger.id, bay: 2 });
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({
      id: expect.any(String),
      batteryId: battery.id,
      chargerId: own.charger.id,
      bay: 2,
      startedAt: expect.stringMatching(ISO),
      endedAt: null,
      expectedEndAt: expect.stringMatching(ISO),
    } satisfies ChargingSessionJson);
    expect(minutesOf(answer.body)).toBeCloseTo((9 * 1.12) / 6 * 60 + 20, 3);
    expect(await own.battery(battery.id)).toMatchObject({ status: 'charging', charging: answer.body, version: 1 });

    const endedAt = new Date().toISOString();
    const ended = await own.handler.patch(`/api/charging-sessions/${answer.body.id}`, { endedAt });
    expect(ended.status).toBe(200);
    expect(ended.body).toEqual({ ...answer.body, endedAt });
    expect(await own.battery(battery.id)).toMatchObject({ status: 'ready', charging: null, version: 2 });
  });

  it('REFERENCES §4 example: 2 Ah removed on a 6 A bay takes 22.4 min at factor 1.12, plus the tail', async () => {
    const own = await bench();
    // 20 Ah at 90 % (12.57 V in the BCI table: 75 % + 0.12 / 0.20 × 25) is missing 2 Ah.
    const battery = await makeBattery(own.handler, { nominalCapacityAh: 20 });
    expect((await logReading(own.handler, battery.id, { voltage: 12.57 })).stateOfChargePercent).toBe(90);
    expect(minutesOf(await startCharging(own.handler, battery.id, own.charger.id))).toBeCloseTo(22.4 + 20, 3);
  });

  it('a battery never read is taken as empty, and a full one is done at once; the tail and factor are team settings', async () => {
    const own = await bench();
    const unknown = await makeBattery(own.handler, { label: 'NEW' });
    expect(minutesOf(await startCharging(own.handler, unknown.id, own.charger.id, 1))).toBeCloseTo((18 * 1.12 * 60) / 6 + 20, 3);
    const full = await makeBattery(own.handler, { label: 'FULL' });
    await logReading(own.handler, full.id, { voltage: 12.8 });
    expect(minutesOf(await startCharging(own.handler, full.id, own.charger.id, 2))).toBe(0);

    const other = await bench();
    expect((await other.handler.patch('/api/team/battery-settings', { chargeFactor: 1.2, chargeTailMinutes: 0 })).status).toBe(200);
    const empty = await makeBattery(other.handler);
    await logReading(other.handler, empty.id, { voltage: 11.5 });
    // REFERENCES §4: 18 Ah × 1.20 ÷ 6 A = 216 min.
    expect(minutesOf(await startCharging(other.handler, empty.id, other.charger.id))).toBeCloseTo(216, 3);
  });

  it('a busy bay answers 409 bay_busy naming the battery on it; another bay is fine', async () => {
    const own = await bench();
    const first = await makeBattery(own.handler, { label: 'ON' });
    const second = await makeBattery(own.handler, { label: 'WAIT' });
    await startCharging(own.handler, first.id, own.charger.id, 1);
    const busy = await own.handler.post(`/api/batteries/${second.id}/charging`, { chargerId: own.charger.id, bay: 1 });
    expect(busy.status).toBe(409);
    expect(busy.body).toEqual({
      error: { code: 'bay_busy', message: 'Bench charger bay 1 is charging battery ON', fields: { bay: 'Battery ON is on this bay: take it off first, or pick another bay' } },
    });
    expect((await own.battery(second.id)).status).toBe('ready');
    await startCharging(own.handler, second.id, own.charger.id, 2);
  });

  it('refuses a battery already charging, one in the robot and a retired one (409)', async () => {
    const own = await bench();
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const battery = await makeBattery(own.handler, { label: 'B1' });
    await startCharging(own.handler, battery.id, own.charger.id, 1);
    const twice = await own.handler.post(`/api/batteries/${battery.id}/charging`, { chargerId: own.charger.id, bay: 2 });
    expect(twice.body).toEqual({ error: { code: 'already_charging', message: 'Battery B1 is already on a charger' } });

    const inRobot = await makeBattery(own.handler, { label: 'B2' });
    await install(own.handler, inRobot.id, (await makeOurMatch(lead, own.event)).id);
    const robot = await own.handler.post(`/api/batteries/${inRobot.id}/charging`, { chargerId: own.charger.id, bay: 2 });
    expect(robot.status).toBe(409);
    expect(robot.body).toEqual({ error: { code: 'battery_in_robot', message: 'Battery B2 is in the robot: record it taken out first' } });

    const old = await makeBattery(own.handler, { label: 'B3' });
    await own.handler.patch(`/api/batteries/${old.id}`, { status: 'retired' });
    const retired = await own.handler.post(`/api/batteries/${old.id}/charging`, { chargerId: own.charger.id, bay: 2 });
    expect(retired.status).toBe(409);
    expect(retired.body).toEqual({ error: { code: 'retired', message: 'Battery B3 is retired: put it back in service before charging it' } });
  });

  it('answers 400 for a bay the charger does not have and bad fields, 404 for another team’s charger', async () => {
    const own = await bench();
    const battery = await makeBattery(own.handler);
    const url = `/api/batteries/${battery.id}/charging`;
    expect((await own.handler.post(url, { chargerId: own.charger.id, bay: 3 })).body).toEqual(invalid({ bay: 'Bench charger has bays 1 to 2' }));
    expect((await own.handler.post(url, { chargerId: own.charger.id, bay: 0 })).body).toEqual(invalid({ bay: 'Bay from 1 to 12' }));
    expect((await own.handler.post(url, { chargerId: 'bench', bay: 1 })).body).toEqual(invalid({ chargerId: 'Must be a UUID' }));
    const theirs = await bench();
    for (const chargerId of [theirs.charger.id, randomUUID()]) {
      const answer = await own.handler.post(url, { chargerId, bay: 1 });
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Charger not found' } });
    }
    expect((await own.battery(battery.id)).status).toBe('ready');
  });

  it('taking off: 400 before it went on or in the future, 404 for another team; sent again corrects the time only', async () => {
    const own = await bench();
    const battery = await makeBattery(own.handler);
    const session = await startCharging(own.handler, battery.id, own.charger.id);
    const url = `/api/charging-sessions/${session.id}`;
    const before = new Date(Date.parse(session.startedAt) - MINUTE_MS).toISOString();
    expect((await own.handler.patch(url, { endedAt: before })).body).toEqual(invalid({ endedAt: `Must not be before it went on the charger (${session.startedAt})` }));
    expect((await own.handler.patch(url, { endedAt: new Date(Date.now() + 5 * MINUTE_MS).toISOString() })).body).toEqual(invalid({ endedAt: 'Must not be in the future' }));
    const theirs = await bench();
    for (const id of [session.id, randomUUID()]) {
      const answer = await theirs.handler.patch(`/api/charging-sessions/${id}`, { endedAt: new Date().toISOString() });
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Charging session not found' } });
    }
    expect((await own.handler.patch(url, { endedAt: new Date().toISOString() })).status).toBe(200);
    await own.handler.patch(`/api/batteries/${battery.id}`, { status: 'resting' });
    expect((await own.handler.patch(url, { endedAt: session.startedAt })).body.endedAt).toBe(session.startedAt);
    expect((await own.battery(battery.id)).status).toBe('resting');
  });

  it('is idempotent on the client id', async () => {
    const own = await bench();
    const battery = await makeBattery(own.handler);
    const id = randomUUID();
    const first = await own.handler.post(`/api/batteries/${battery.id}/charging`, { id, chargerId: own.charger.id, bay: 1 });
    expect(first.status).toBe(201);
    const again = await own.handler.post(`/api/batteries/${battery.id}/charging`, { id, chargerId: own.charger.id, bay: 1 });
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    // The same id for another battery is not a resend: it must not answer the first battery's session.
    const other = await makeBattery(own.handler, { label: 'OTHER' });
    const reused = await own.handler.post(`/api/batteries/${other.id}/charging`, { id, chargerId: own.charger.id, bay: 2 });
    expect(reused.status).toBe(409);
    expect(reused.body.error.code).toBe('id_taken');
    expect((await own.battery(other.id)).status).toBe('ready');
  });

  it('two tablets filling one bay at once: one battery gets it, the other answers 409', async () => {
    const own = await bench();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    const first = await makeBattery(own.handler, { label: 'X1' });
    const second = await makeBattery(own.handler, { label: 'X2' });
    const answers = await Promise.all([
      own.handler.post(`/api/batteries/${first.id}/charging`, { chargerId: own.charger.id, bay: 1 }),
      admin.post(`/api/batteries/${second.id}/charging`, { chargerId: own.charger.id, bay: 1 }),
    ]);
    expect(statusesOf(answers)).toEqual([201, 409]);
    const statuses = [(await own.battery(first.id)).status, (await own.battery(second.id)).status].sort();
    expect(statuses).toEqual(['charging', 'ready']);
  });
});
