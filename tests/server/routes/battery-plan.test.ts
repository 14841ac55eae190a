import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { BatteryPlanJson } from '../../../shared/domain/battery-plan';
import { ROLES } from '../../../shared/roles';
import { signIn, testApp } from '../../support/app';
import { logReading, makeBattery, makeCharger } from '../../support/batteries';
import { makeOurMatch } from '../../support/checks';
import { invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';

// GET /api/events/:eventId/battery-plan?at=: the route builds the input, shared/domain/battery-plan.ts plans.
const { app } = testApp();
const AT = '2026-12-05T08:00:00.000Z';

/** A team with three full batteries, a retired one, a charger and three of our matches. */
async function pit() {
  const own = await makeTeam();
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const handler = await signIn(app, own.emails.battery, PASSWORD);
  const matches = [];
  for (const [index, start] of ['09:00', '09:30', '10:00'].entries()) {
    matches.push(await makeOurMatch(lead, own.event, { number: index * 5 + 2, scheduledStart: `2026-12-05T${start}:00.000Z` }));
  }
  const batteries = [];
  for (const label of ['A', 'B', 'C']) {
    const battery = await makeBattery(handler, { label });
    await logReading(handler, battery.id, { voltage: 12.7 });
    batteries.push(battery);
  }
  const retired = await makeBattery(handler, { label: 'OLD' });
  await logReading(handler, retired.id, { voltage: 12.7 });
  await handler.patch(`/api/batteries/${retired.id}`, { status: 'retired' });
  const charger = await makeCharger(handler, { bays: 1 });
  const url = `/api/events/${own.event.id}/battery-plan?at=${AT}`;
  return { ...own, lead, handler, matches, batteries, retired, charger, url };
}

describe('battery plan route', () => {
  it('answers 401 signed out', async () => {
    const answer = await request(app).get(`/api/events/${randomUUID()}/battery-plan`);
    expect(answer.status).toBe(401);
    expect(answer.body).toEqual(UNAUTHENTICATED);
  });

  it('every role reads the plan: a battery for each of our matches, never a retired one, spread over the fleet', async () => {
    const own = await pit();
    for (const role of ROLES) {
      const client = await signIn(app, own.emails[role], PASSWORD);
      const answer = await client.get(own.url);
      expect(answer.status, role).toBe(200);
      const plan = answer.body as BatteryPlanJson;
      expect(Object.keys(plan).sort()).toEqual(['assignments', 'charging', 'warnings']);
      expect(plan.assignments.map((assignment) => assignment.matchId)).toEqual(own.matches.map((match) => match.id));
      const used = plan.assignments.map((assignment) => assignment.batteryId);
      expect(new Set(used).size).toBe(3);
      expect(used).not.toContain(own.retired.id);
      for (const assignment of plan.assignments) expect(assignment.expectedChargePercent).toBe(100);
      expect(plan.warnings).toEqual([]);
      for (const session of plan.charging) {
        expect(session).toEqual({ batteryId: expect.any(String), bay: 1, from: expect.any(String), to: expect.any(String) });
        expect(Date.parse(session.to)).toBeGreaterThanOrEqual(Date.parse(session.from));
      }
    }
  });

  it('warns for each match when no battery will be ready, and plans nothing for a team without batteries', async () => {
    const own = await makeTeam();
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const handler = await signIn(app, own.emails.battery, PASSWORD);
    const match = await makeOurMatch(lead, own.event, { scheduledStart: '2026-12-05T09:00:00.000Z' });
    const url = `/api/events/${own.event.id}/battery-plan?at=${AT}`;
    const empty = (await lead.get(url)).body as BatteryPlanJson;
    expect(empty.assignments).toEqual([]);
    expect(empty.warnings.map((warning) => [warning.matchId, warning.code])).toEqual([[match.id, 'no_battery_ready']]);

    const flat = await makeBattery(handler, { label: 'FLAT' });
    await logReading(handler, flat.id, { voltage: 11.9 });
    const plan = (await lead.get(url)).body as BatteryPlanJson;
    expect(plan.assignments).toEqual([]);
    expect(plan.warnings).toEqual([expect.objectContaining({ matchId: match.id, code: 'no_battery_ready', message: expect.any(String) })]);
  });

  it('keeps a battery installed for a match as that match’s battery', async () => {
    const own = await pit();
    // Installed now, days before the moment the plan is asked about.
    const crew = await signIn(app, own.emails.crew, PASSWORD);
    expect((await crew.post(`/api/batteries/${own.batteries[2].id}/uses`, { matchId: own.matches[0].id })).status).toBe(201);
    const plan = (await crew.get(own.url)).body as BatteryPlanJson;
    expect(plan.assignments[0]).toEqual({ matchId: own.matches[0].id, batteryId: own.batteries[2].id, expectedChargePercent: 100 });
  });

  it('answers 404 for another team’s event and 400 for a bad instant', async () => {
    const own = await pit();
    const other = await makeTeam();
    for (const eventId of [other.event.id, randomUUID()]) {
      const answer = await own.lead.get(`/api/events/${eventId}/battery-plan`);
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Event not found' } });
    }
    expect((await own.lead.get(`/api/events/${own.event.id}/battery-plan?at=tomorrow`)).body).toEqual(
      invalid({ at: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }),
    );
    expect((await own.lead.get('/api/events/q1/battery-plan')).body).toEqual(invalid({ eventId: 'Must be a UUID' }));
  });
});
