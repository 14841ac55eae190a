import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/roles';
import type { ChargerJson } from '../../../shared/schemas/batteries';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { chargerBody, makeCharger } from '../../support/batteries';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';

// GET/POST /api/chargers.
const { app } = testApp();
let team: FactoryTeam;
let handler: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  handler = await signIn(app, team.emails.battery, PASSWORD);
});

const MAY_MANAGE: Record<Role, boolean> = { admin: true, lead: false, crew: false, battery: true, safety: false, viewer: false };

describe('charger routes', () => {
  it('answer 401 signed out', async () => {
    for (const answer of [await request(app).get('/api/chargers'), await request(app).post('/api/chargers').send(chargerBody())]) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });

  for (const role of ROLES) {
    it(`${role}: reads the chargers; ${MAY_MANAGE[role] ? 'may' : 'may not'} add one`, async () => {
      const own = await makeTeam();
      const client = await signIn(app, own.emails[role], PASSWORD);
      expect((await client.get('/api/chargers')).status).toBe(200);
      const answer = await client.post('/api/chargers', chargerBody());
      expect(answer.status).toBe(MAY_MANAGE[role] ? 201 : 403);
      if (!MAY_MANAGE[role]) expect(answer.body).toEqual(FORBIDDEN);
      if (!MAY_MANAGE[role]) expect((await client.post('/api/chargers', { bays: 0 })).body).toEqual(FORBIDDEN);
    });
  }

  it('adds chargers and lists the team’s own in the order they were added', async () => {
    const own = await makeTeam();
    const ownHandler = await signIn(app, own.emails.battery, PASSWORD);
    const answer = await ownHandler.post('/api/chargers', chargerBody({ name: 'Cart charger', bays: 1, currentPerBayA: 10 }));
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({ id: expect.any(String), name: 'Cart charger', bays: 1, currentPerBayA: 10 } satisfies ChargerJson);
    const bench = await makeCharger(ownHandler, { name: 'Bench charger', bays: 4, currentPerBayA: 2.5 });
    expect((await ownHandler.get('/api/chargers')).body).toEqual([answer.body, bench]);
    expect(((await handler.get('/api/chargers')).body as ChargerJson[]).some((charger) => charger.id === bench.id)).toBe(false);
  });

  it('answers the current per bay as the column keeps it (two decimals), the same as a later read', async () => {
    const own = await makeTeam();
    const ownHandler = await signIn(app, own.emails.battery, PASSWORD);
    const created = await makeCharger(ownHandler, { currentPerBayA: 6.125 });
    expect(created.currentPerBayA).toBe(6.13);
    expect((await ownHandler.get('/api/chargers')).body).toEqual([created]);
  });

  it('is idempotent on the client id; an id of another team answers 409 id_taken', async () => {
    const id = randomUUID();
    const first = await handler.post('/api/chargers', chargerBody({ id }));
    expect(first.status).toBe(201);
    const again = await handler.post('/api/chargers', chargerBody({ id }));
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    const other = await makeTeam();
    const foreign = await (await signIn(app, other.emails.admin, PASSWORD)).post('/api/chargers', chargerBody({ id }));
    expect(foreign.status).toBe(409);
    expect(foreign.body.error.code).toBe('id_taken');
  });

  it('answers 400 naming each bad field', async () => {
    const cases: [Record<string, unknown>, Record<string, string>][] = [
      [{}, { name: 'Required', bays: 'Required', currentPerBayA: 'Required' }],
      [chargerBody({ name: ' ' }), { name: 'Give it a name, e.g. Bench charger' }],
      [chargerBody({ bays: 0 }), { bays: 'Bays from 1 to 12' }],
      [chargerBody({ bays: 2.5 }), { bays: 'A whole number from 1 to 12' }],
      [chargerBody({ currentPerBayA: 0.1 }), { currentPerBayA: 'Amps from 0.5 to 40' }],
      [chargerBody({ volts: 14.4 }), { volts: 'Not a field of this request' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await handler.post('/api/chargers', body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
  });
});
