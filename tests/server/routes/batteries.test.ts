import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import type { HealthJson } from '../../../shared/domain/battery-state';
import { ROLES, type Role } from '../../../shared/roles';
import type { BatteryJson } from '../../../shared/schemas/batteries';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { batteryBody, logReading, makeBattery, statusesOf } from '../../support/batteries';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';

// GET/POST /api/batteries, GET/PATCH /api/batteries/:id.
const { app } = testApp();
let team: FactoryTeam;
let clients: Record<Role, SignedIn>;
beforeAll(async () => {
  team = await makeTeam();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
});

const MAY_MANAGE: Record<Role, boolean> = { admin: true, lead: false, crew: false, battery: true, safety: false, viewer: false };
const NOT_FOUND = { error: { code: 'not_found', message: 'Battery not found' } };
const NO_HEALTH: HealthJson = { status: 'good', baselineMilliohm: null, increasePercent: null };

/** A team of our own with its battery handler signed in. */
async function ownTeam() {
  const own = await makeTeam();
  const handler = await signIn(app, own.emails.battery, PASSWORD);
  return { ...own, handler };
}

describe('battery routes signed out', () => {
  it('answer 401 to every route and verb', async () => {
    const id = randomUUID();
    const answers = [
      await request(app).get('/api/batteries'),
      await request(app).post('/api/batteries').send(batteryBody()),
      await request(app).get(`/api/batteries/${id}`),
      await request(app).patch(`/api/batteries/${id}`).send({ notes: 'x' }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });
});

describe('battery routes per role', () => {
  for (const role of ROLES) {
    it(`${role}: reads the fleet; ${MAY_MANAGE[role] ? 'may' : 'may not'} add and edit batteries`, async () => {
      const own = await ownTeam();
      const client = await signIn(app, own.emails[role], PASSWORD);
      const battery = await makeBattery(own.handler, { label: 'R1' });
      expect((await client.get('/api/batteries')).status).toBe(200);
      expect((await client.get(`/api/batteries/${battery.id}`)).status).toBe(200);

      const created = await client.post('/api/batteries', batteryBody({ label: 'R2' }));
      const edited = await client.patch(`/api/batteries/${battery.id}`, { notes: 'Scuffed corner' });
      expect(created.status).toBe(MAY_MANAGE[role] ? 201 : 403);
      expect(edited.status).toBe(MAY_MANAGE[role] ? 200 : 403);
      if (!MAY_MANAGE[role]) {
        expect(created.body).toEqual(FORBIDDEN);
        expect(edited.body).toEqual(FORBIDDEN);
      }
      // Refused before the body is read: a bad body still answers 403, never a validation message.
      if (!MAY_MANAGE[role]) expect((await client.post('/api/batteries', { label: 7 })).status).toBe(403);
      expect((await client.get('/api/batteries')).body).toHaveLength(MAY_MANAGE[role] ? 2 : 1);
    });
  }
});

describe('adding a battery', () => {
  it('answers 201 with the defaults (18 Ah, sealed AGM), ready, no readings; the list is by label', async () => {
    const own = await ownTeam();
    const answer = await own.handler.post('/api/batteries', batteryBody({ label: ' 26-B ', yearInService: 2026 }));
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({
      id: expect.any(String),
      label: '26-B',
      yearInService: 2026,
      nominalCapacityAh: 18,
      chemistry: 'sealed_agm',
      notes: null,
      status: 'ready',
      health: NO_HEALTH,
      latestReading: null,
      estimatedChargePercent: null,
      lastUsedAt: null,
      usesThisEvent: 0,
      charging: null,
      version: 0,
    } satisfies BatteryJson);
    await makeBattery(own.handler, { label: '24-A', nominalCapacityAh: 17.5, chemistry: 'gel', notes: 'Spare from last season' });
    const list = (await own.handler.get('/api/batteries')).body as BatteryJson[];
    expect(list.map((battery) => [battery.label, battery.nominalCapacityAh, battery.chemistry, battery.notes])).toEqual([
      ['24-A', 17.5, 'gel', 'Spare from last season'],
      ['26-B', 18, 'sealed_agm', null],
    ]);
    expect((await own.handler.get(`/api/batteries/${answer.body.id}`)).body).toEqual({ ...answer.body, readings: [], uses: [] });
  });

  it('answers the capacity as the column keeps it (two decimals), on create and edit, the same as a later read', async () => {
    const own = await ownTeam();
    const created = await makeBattery(own.handler, { label: 'ROUND', nominalCapacityAh: 18.555 });
    expect(created.nominalCapacityAh).toBe(18.56);
    const edited = await own.handler.patch(`/api/batteries/${created.id}`, { nominalCapacityAh: 17.004 });
    expect(edited.body.nominalCapacityAh).toBe(17);
    expect((await own.handler.get(`/api/batteries/${created.id}`)).body).toEqual({ ...edited.body, readings: [], uses: [] });
  });

  it('answers 400 naming each bad field', async () => {
    const cases: [Record<string, unknown>, Record<string, string>][] = [
      [{}, { label: 'Required', yearInService: 'Required' }],
      [batteryBody({ label: '  ' }), { label: 'Give the label painted on it, e.g. A or 2027-3' }],
      [batteryBody({ label: 'ABCDEFGHIJKLM' }), { label: 'At most 12 characters' }],
      [batteryBody({ yearInService: 1999 }), { yearInService: 'A year from 2000 to 2100' }],
      [batteryBody({ yearInService: 2025.5 }), { yearInService: 'A whole number from 2000 to 2100' }],
      [batteryBody({ nominalCapacityAh: 0 }), { nominalCapacityAh: 'Ah from 1 to 200' }],
      [batteryBody({ chemistry: 'lithium' }), { chemistry: 'One of: sealed_agm, gel, flooded' }],
      [batteryBody({ status: 'ready' }), { status: 'Not a field of this request' }],
      [batteryBody({ id: 'mine' }), { id: 'Must be a UUID' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await clients.battery.post('/api/batteries', body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
  });

  it('refuses a label the team already painted, whatever its letter case: 409 label_taken naming the field', async () => {
    const own = await ownTeam();
    await makeBattery(own.handler, { label: 'Q7' });
    for (const label of ['Q7', 'q7']) {
      const answer = await own.handler.post('/api/batteries', batteryBody({ label }));
      expect(answer.status).toBe(409);
      expect(answer.body).toEqual({
        error: { code: 'label_taken', message: 'Battery Q7 already has this label', fields: { label: 'Another battery is labelled Q7: paint a different label' } },
      });
    }
    // Another team may paint the same label.
    expect((await clients.battery.post('/api/batteries', batteryBody({ label: 'Q7' }))).status).toBe(201);
  });

  it('is idempotent on the client id; an id of another team answers 409 id_taken', async () => {
    const own = await ownTeam();
    const id = randomUUID();
    const first = await own.handler.post('/api/batteries', batteryBody({ id, label: 'ID1' }));
    expect(first.status).toBe(201);
    const resent = await own.handler.post('/api/batteries', batteryBody({ id, label: 'ID1' }));
    expect(resent.status).toBe(200);
    expect(resent.body).toEqual(first.body);
    const foreign = await clients.battery.post('/api/batteries', batteryBody({ id, label: 'ID9' }));
    expect(foreign.status).toBe(409);
    expect(foreign.body.error.code).toBe('id_taken');
  });

  it('two tablets adding the same label at once: one battery, the other answers 409', async () => {
    const own = await ownTeam();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    const answers = await Promise.all([own.handler.post('/api/batteries', batteryBody({ label: 'RACE' })), admin.post('/api/batteries', batteryBody({ label: 'RACE' }))]);
    expect(statusesOf(answers)).toEqual([201, 409]);
    expect((await own.handler.get('/api/batteries')).body).toHaveLength(1);
  });
});

describe('editing a battery', () => {
  it('changes the fields sent, bumps the version, and refuses a stale version with the current battery', async () => {
    const own = await ownTeam();
    const battery = await makeBattery(own.handler, { label: 'E1' });
    const edited = await own.handler.patch(`/api/batteries/${battery.id}`, { label: 'E2', notes: 'Terminal bolt replaced', version: 0 });
    expect(edited.status).toBe(200);
    expect(edited.body).toEqual({ ...battery, label: 'E2', notes: 'Terminal bolt replaced', version: 1 });
    const stale = await own.handler.patch(`/api/batteries/${battery.id}`, { notes: 'Mine', version: 0 });
    expect(stale.status).toBe(409);
    expect(stale.body).toEqual({ error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: edited.body } });
  });

  it('refuses a label another battery has, and allows changing the letter case of its own', async () => {
    const own = await ownTeam();
    await makeBattery(own.handler, { label: 'L1' });
    const second = await makeBattery(own.handler, { label: 'l2' });
    const taken = await own.handler.patch(`/api/batteries/${second.id}`, { label: 'l1' });
    expect(taken.status).toBe(409);
    expect(taken.body.error.code).toBe('label_taken');
    expect(taken.body.error.fields).toEqual({ label: 'Another battery is labelled L1: paint a different label' });
    const recased = await own.handler.patch(`/api/batteries/${second.id}`, { label: 'L2' });
    expect(recased.status).toBe(200);
    expect(recased.body.label).toBe('L2');
  });

  it('retires with status "retired" and brings back with "ready"; in_robot and charging come only from their records', async () => {
    const own = await ownTeam();
    const battery = await makeBattery(own.handler, { label: 'OLD', notes: 'Bought used' });
    const retired = await own.handler.patch(`/api/batteries/${battery.id}`, { status: 'retired' });
    expect(retired.status).toBe(200);
    expect(retired.body).toMatchObject({ status: 'retired', version: 1, notes: 'Bought used' });
    expect((await own.handler.patch(`/api/batteries/${battery.id}`, { status: 'in_robot' })).body).toEqual(
      invalid({ status: 'Install it for a match to put it in the robot' }),
    );
    expect((await own.handler.patch(`/api/batteries/${battery.id}`, { status: 'charging' })).body).toEqual(invalid({ status: 'Put it on a charger bay to charge it' }));
    const back = await own.handler.patch(`/api/batteries/${battery.id}`, { status: 'ready' });
    expect(back.body).toMatchObject({ status: 'ready', version: 2 });
    // A PATCH that changes nothing writes nothing.
    expect((await own.handler.patch(`/api/batteries/${battery.id}`, { status: 'ready', label: 'OLD' })).body.version).toBe(2);
  });

  it('answers 400 naming each bad field', async () => {
    const battery = await makeBattery(clients.battery, { label: 'V400' });
    const cases: [Record<string, unknown>, Record<string, string>][] = [
      [{ status: 'lost' }, { status: 'One of: ready, charging, in_robot, spent, resting, retired' }],
      [{ version: -1 }, { version: 'The version number you loaded' }],
      [{ yearInService: '2025' }, { yearInService: 'A year from 2000 to 2100' }],
      [{ notes: 'x'.repeat(501) }, { notes: 'At most 500 characters' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await clients.battery.patch(`/api/batteries/${battery.id}`, body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
    expect((await clients.battery.patch('/api/batteries/not-a-uuid', {})).body).toEqual(invalid({ id: 'Must be a UUID' }));
  });
});

describe("another team's battery", () => {
  it('is not listed, and answers 404 to read, edit, reading, install and charging, changing nothing', async () => {
    const theirs = await ownTeam();
    const battery = await makeBattery(theirs.handler, { label: 'THEIRS' });
    await logReading(theirs.handler, battery.id);
    expect(((await clients.battery.get('/api/batteries')).body as BatteryJson[]).some((b) => b.id === battery.id)).toBe(false);
    const answers = [
      await clients.battery.get(`/api/batteries/${battery.id}`),
      await clients.battery.patch(`/api/batteries/${battery.id}`, { status: 'retired' }),
      await clients.battery.post(`/api/batteries/${battery.id}/readings`, { voltage: 12, internalResistanceMilliohm: 10, rested: false }),
      await clients.battery.post(`/api/batteries/${battery.id}/uses`, { matchId: randomUUID() }),
      await clients.battery.post(`/api/batteries/${battery.id}/charging`, { chargerId: randomUUID(), bay: 1 }),
      await clients.battery.get(`/api/batteries/${randomUUID()}`),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual(NOT_FOUND);
    }
    const after = (await theirs.handler.get(`/api/batteries/${battery.id}`)).body;
    expect(after).toMatchObject({ status: 'ready', version: 0 });
    expect(after.readings).toHaveLength(1);
  });
});
