import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { BATTERY_DEFAULTS } from '../../../shared/domain/battery-state';
import { ROLES, type Role } from '../../../shared/roles';
import { signIn, testApp } from '../../support/app';
import { logReading, makeBattery } from '../../support/batteries';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';

// GET/PATCH /api/team/battery-settings (our extension of the API).
const { app } = testApp();
const URL = '/api/team/battery-settings';
const MAY_MANAGE: Record<Role, boolean> = { admin: true, lead: false, crew: false, battery: true, safety: false, viewer: false };

async function ownHandler() {
  const own = await makeTeam();
  return { ...own, handler: await signIn(app, own.emails.battery, PASSWORD) };
}

describe('battery settings', () => {
  it('answer 401 signed out', async () => {
    for (const answer of [await request(app).get(URL), await request(app).patch(URL).send({ socTable: 'army' })]) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });

  for (const role of ROLES) {
    it(`${role}: reads the defaults; ${MAY_MANAGE[role] ? 'may' : 'may not'} change them`, async () => {
      const own = await makeTeam();
      const client = await signIn(app, own.emails[role], PASSWORD);
      const read = await client.get(URL);
      expect(read.status).toBe(200);
      expect(read.body).toEqual(BATTERY_DEFAULTS);
      const changed = await client.patch(URL, { minimumStartChargePercent: 85 });
      expect(changed.status).toBe(MAY_MANAGE[role] ? 200 : 403);
      if (!MAY_MANAGE[role]) expect(changed.body).toEqual(FORBIDDEN);
      expect((await client.get(URL)).body.minimumStartChargePercent).toBe(MAY_MANAGE[role] ? 85 : 90);
    });
  }

  it('changes only what is sent, keeps it per team, and accepts no absolute limit', async () => {
    const own = await ownHandler();
    const answer = await own.handler.patch(URL, { socTable: 'army', replaceAboveMilliohm: null, chargeFactor: 1.08 });
    expect(answer.status).toBe(200);
    const expected = { ...BATTERY_DEFAULTS, socTable: 'army', replaceAboveMilliohm: null, chargeFactor: 1.08 };
    expect(answer.body).toEqual(expected);
    expect((await own.handler.patch(URL, { chargeTailMinutes: 30 })).body).toEqual({ ...expected, chargeTailMinutes: 30 });
    const other = await ownHandler();
    expect((await other.handler.get(URL)).body).toEqual(BATTERY_DEFAULTS);
  });

  it('keeps the watch threshold below the replace threshold, against what is stored', async () => {
    const own = await ownHandler();
    expect((await own.handler.patch(URL, { watchIncreasePercent: 50 })).body).toEqual(invalid({ watchIncreasePercent: 'Must be below the replace threshold' }));
    expect((await own.handler.patch(URL, { replaceIncreasePercent: 15 })).body).toEqual(invalid({ replaceIncreasePercent: 'Must be above the watch threshold' }));
    expect((await own.handler.patch(URL, { watchIncreasePercent: 30, replaceIncreasePercent: 30 })).body).toEqual(
      invalid({ replaceIncreasePercent: 'Must be above the watch threshold' }),
    );
    expect((await own.handler.patch(URL, { watchIncreasePercent: 60, replaceIncreasePercent: 80 })).status).toBe(200);
  });

  it('answers 400 naming each bad field', async () => {
    const own = await ownHandler();
    const cases: [Record<string, unknown>, Record<string, string>][] = [
      [{ socTable: 'agm' }, { socTable: 'bci or army' }],
      [{ baselineReadings: 0 }, { baselineReadings: 'Readings from 1 to 10' }],
      [{ minimumStartChargePercent: 101 }, { minimumStartChargePercent: 'Percent from 0 to 100' }],
      [{ peukertExponent: 0.9 }, { peukertExponent: 'An exponent from 1 to 2' }],
      [{ chargeTailMinutes: 10.5 }, { chargeTailMinutes: 'A whole number from 0 to 240' }],
      [{ colour: 'plum' }, { colour: 'Not a field of this request' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await own.handler.patch(URL, body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
    expect((await own.handler.get(URL)).body).toEqual(BATTERY_DEFAULTS);
  });

  it('the health thresholds apply to the fleet at once', async () => {
    const own = await ownHandler();
    const battery = await makeBattery(own.handler);
    for (const resistance of [10, 10, 10, 13]) await logReading(own.handler, battery.id, { internalResistanceMilliohm: resistance });
    expect((await own.handler.get(`/api/batteries/${battery.id}`)).body.health).toEqual({ status: 'watch', baselineMilliohm: 10, increasePercent: 30 });
    await own.handler.patch(URL, { watchIncreasePercent: 35 });
    expect((await own.handler.get('/api/batteries')).body[0].health.status).toBe('good');
  });
});
