import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { SOC_TABLE_ARMY, SOC_TABLE_BCI } from '../../../shared/domain/battery-state';
import { ROLES, type Role } from '../../../shared/roles';
import type { BatteryDetailJson, CreatedReadingJson } from '../../../shared/schemas/batteries';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { logReading, makeBattery, readingBody } from '../../support/batteries';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';

// POST /api/batteries/:id/readings, and what readings make of a battery (state of charge, health).
const { app } = testApp();
let team: FactoryTeam;
let handler: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  handler = await signIn(app, team.emails.battery, PASSWORD);
});

const MAY_LOG: Record<Role, boolean> = { admin: true, lead: false, crew: true, battery: true, safety: false, viewer: false };
const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;
const minutesAgo = (minutes: number) => new Date(Date.now() - minutes * 60_000).toISOString();

/** Linear interpolation between two table points, as REFERENCES §1's derived checks are made. */
const between = (volts: number, low: { volts: number; percent: number }, high: { volts: number; percent: number }) =>
  low.percent + ((volts - low.volts) / (high.volts - low.volts)) * (high.percent - low.percent);

describe('logging a reading', () => {
  it('answers 401 signed out', async () => {
    const answer = await request(app).post(`/api/batteries/${randomUUID()}/readings`).send(readingBody());
    expect(answer.status).toBe(401);
    expect(answer.body).toEqual(UNAUTHENTICATED);
  });

  for (const role of ROLES) {
    it(`${role}: ${MAY_LOG[role] ? 'may' : 'may not'} log a reading`, async () => {
      const own = await makeTeam();
      const ownHandler = await signIn(app, own.emails.battery, PASSWORD);
      const battery = await makeBattery(ownHandler);
      const client = await signIn(app, own.emails[role], PASSWORD);
      const answer = await client.post(`/api/batteries/${battery.id}/readings`, readingBody());
      expect(answer.status).toBe(MAY_LOG[role] ? 201 : 403);
      if (!MAY_LOG[role]) expect(answer.body).toEqual(FORBIDDEN);
      // Refused before the body is read.
      if (!MAY_LOG[role]) expect((await client.post(`/api/batteries/${battery.id}/readings`, { voltage: 17 })).body).toEqual(FORBIDDEN);
    });
  }

  it('answers 201 with the reading, who took it, its state of charge, reliability and the battery health', async () => {
    const battery = await makeBattery(handler, { label: 'SHAPE' });
    const takenAt = minutesAgo(3);
    const answer = await handler.post(`/api/batteries/${battery.id}/readings`, readingBody({ voltage: 12.65, internalResistanceMilliohm: 11.8, temperatureC: 21.5, takenAt }));
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({
      id: expect.any(String),
      batteryId: battery.id,
      voltage: 12.65,
      internalResistanceMilliohm: 11.8,
      rested: true,
      restedMinutes: 300,
      temperatureC: 21.5,
      takenAt,
      takenBy: { id: team.memberships.battery.userId, name: 'Factory battery' },
      useId: null,
      stateOfChargePercent: 100,
      reliable: true,
      health: { status: 'good', baselineMilliohm: 11.8, increasePercent: 0 },
    } satisfies CreatedReadingJson);
    const { health: _health, ...reading } = answer.body;
    const detail = (await handler.get(`/api/batteries/${battery.id}`)).body as BatteryDetailJson;
    expect(detail.latestReading).toEqual(reading);
    expect(detail.readings).toEqual([reading]);
  });

  it('12.30 V rested reads 57.1 % in the BCI table (REFERENCES §1, derived from Battery FAQ / BCI)', async () => {
    const battery = await makeBattery(handler, { label: 'SOC1' });
    const reading = await logReading(handler, battery.id, { voltage: 12.3 });
    const expected = between(12.3, SOC_TABLE_BCI[2], SOC_TABLE_BCI[3]);
    expect(expected).toBeCloseTo(57.14, 2);
    expect(reading.stateOfChargePercent).toBe(57.1);
    expect(reading.reliable).toBe(true);
    // Clamped at both ends (REFERENCES §1: 11.80 V → 0 %, a full AGM at 12.9 V → 100 %).
    expect((await logReading(handler, battery.id, { voltage: 11.8 })).stateOfChargePercent).toBe(0);
    expect((await logReading(handler, battery.id, { voltage: 12.9 })).stateOfChargePercent).toBe(100);
  });

  it('a team on the US Army TM table reads 12.30 V as 62.5 % (REFERENCES §1, derived from TM 5-3805-262-20)', async () => {
    const own = await makeTeam();
    const ownHandler = await signIn(app, own.emails.battery, PASSWORD);
    expect((await ownHandler.patch('/api/team/battery-settings', { socTable: 'army' })).status).toBe(200);
    const battery = await makeBattery(ownHandler);
    const expected = between(12.3, SOC_TABLE_ARMY[2], SOC_TABLE_ARMY[3]);
    expect(expected).toBeCloseTo(62.5, 9);
    expect((await logReading(ownHandler, battery.id, { voltage: 12.3 })).stateOfChargePercent).toBe(62.5);
  });

  it('marks a reading not reliable unless rested at least 4 h (BU-903), and shows it anyway', async () => {
    const battery = await makeBattery(handler, { label: 'REST' });
    expect((await logReading(handler, battery.id, { rested: false, restedMinutes: null })).reliable).toBe(false);
    expect((await logReading(handler, battery.id, { rested: true, restedMinutes: 239 })).reliable).toBe(false);
    expect((await logReading(handler, battery.id, { rested: true, restedMinutes: 240 })).reliable).toBe(true);
    const unknownRest = await logReading(handler, battery.id, { rested: true, restedMinutes: undefined });
    expect(unknownRest).toMatchObject({ restedMinutes: null, reliable: true });
    const unrested = await logReading(handler, battery.id, { voltage: 12.45, rested: false, restedMinutes: null });
    expect(unrested).toMatchObject({ stateOfChargePercent: 75, reliable: false });
  });

  it('health: the median of the first 3 readings is the baseline; +20 % is watch, +50 % or over 25 mΩ is replace (REFERENCES §2)', async () => {
    const battery = await makeBattery(handler, { label: 'HEALTH' });
    for (const resistance of [12, 12.5, 11.5]) await logReading(handler, battery.id, { internalResistanceMilliohm: resistance });
    expect((await logReading(handler, battery.id, { internalResistanceMilliohm: 14.3 })).health).toEqual({ status: 'good', baselineMilliohm: 12, increasePercent: 19.2 });
    expect((await logReading(handler, battery.id, { internalResistanceMilliohm: 14.4 })).health).toEqual({ status: 'watch', baselineMilliohm: 12, increasePercent: 20 });
    expect((await logReading(handler, battery.id, { internalResistanceMilliohm: 18 })).health).toEqual({ status: 'replace', baselineMilliohm: 12, increasePercent: 50 });
    expect((await handler.get(`/api/batteries/${battery.id}`)).body.health.status).toBe('replace');

    const high = await makeBattery(handler, { label: 'HIGHR' });
    for (const resistance of [22, 22, 22]) await logReading(handler, high.id, { internalResistanceMilliohm: resistance });
    expect((await logReading(handler, high.id, { internalResistanceMilliohm: 25.5 })).health).toEqual({ status: 'replace', baselineMilliohm: 22, increasePercent: 15.9 });
  });

  it('orders readings by when they were taken, and keeps the analyzer digits the columns hold', async () => {
    const battery = await makeBattery(handler, { label: 'ORDER' });
    const late = await logReading(handler, battery.id, { takenAt: minutesAgo(5), voltage: 12.345678, internalResistanceMilliohm: 13.456, temperatureC: 20.26 });
    const early = await logReading(handler, battery.id, { takenAt: minutesAgo(60), internalResistanceMilliohm: 10 });
    expect(late).toMatchObject({ voltage: 12.346, internalResistanceMilliohm: 13.46, temperatureC: 20.3 });
    const detail = (await handler.get(`/api/batteries/${battery.id}`)).body as BatteryDetailJson;
    expect(detail.readings.map((reading) => reading.id)).toEqual([early.id, late.id]);
    expect(detail.latestReading?.id).toBe(late.id);
    // The baseline is the median of the oldest readings (both, here): 10 mΩ and 13.46 mΩ.
    expect(detail.health.baselineMilliohm).toBe(11.73);
  });

  it('is idempotent on the client id', async () => {
    const battery = await makeBattery(handler, { label: 'IDEM' });
    const id = randomUUID();
    const first = await handler.post(`/api/batteries/${battery.id}/readings`, readingBody({ id }));
    expect(first.status).toBe(201);
    const again = await handler.post(`/api/batteries/${battery.id}/readings`, readingBody({ id }));
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    const other = await makeBattery(handler, { label: 'IDEM2' });
    const elsewhere = await handler.post(`/api/batteries/${other.id}/readings`, readingBody({ id }));
    expect(elsewhere.status).toBe(409);
    expect(elsewhere.body.error.code).toBe('id_taken');
  });

  it('answers 400 naming each bad field, with the plausible range', async () => {
    const battery = await makeBattery(handler, { label: 'BAD' });
    const url = `/api/batteries/${battery.id}/readings`;
    const cases: [Record<string, unknown>, Record<string, string>][] = [
      [readingBody({ voltage: 17 }), { voltage: 'Volts from 0 to 16' }],
      [readingBody({ voltage: -0.1 }), { voltage: 'Volts from 0 to 16' }],
      [readingBody({ voltage: '12.6' }), { voltage: 'Volts from 0 to 16' }],
      [readingBody({ internalResistanceMilliohm: -1 }), { internalResistanceMilliohm: 'mΩ from 0 to 1000' }],
      [readingBody({ internalResistanceMilliohm: 1200 }), { internalResistanceMilliohm: 'mΩ from 0 to 1000' }],
      [{ voltage: 12.6, internalResistanceMilliohm: 12 }, { rested: 'Required' }],
      [readingBody({ restedMinutes: 12.5 }), { restedMinutes: 'A whole number from 0 to 10080' }],
      [readingBody({ temperatureC: 95 }), { temperatureC: '°C from -30 to 80' }],
      [readingBody({ takenAt: '2026-12-05 10:00' }), { takenAt: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }],
      [readingBody({ takenAt: new Date(Date.now() + 10 * 60_000).toISOString() }), { takenAt: 'Must not be in the future' }],
      [readingBody({ useId: randomUUID() }), { useId: 'Not a use of this battery' }],
      [readingBody({ by: 'me' }), { by: 'Not a field of this request' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await handler.post(url, body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
    expect((await handler.get(`/api/batteries/${battery.id}`)).body.readings).toEqual([]);
  });

  it('takes a reading up to a minute ahead of the server clock (tablet drift), now when takenAt is left out', async () => {
    const battery = await makeBattery(handler, { label: 'DRIFT' });
    const ahead = new Date(Date.now() + 30_000).toISOString();
    expect((await logReading(handler, battery.id, { takenAt: ahead })).takenAt).toBe(ahead);
    const now = await logReading(handler, battery.id);
    expect(now.takenAt).toMatch(ISO);
    expect(Math.abs(Date.parse(now.takenAt) - Date.now())).toBeLessThan(60_000);
  });
});
