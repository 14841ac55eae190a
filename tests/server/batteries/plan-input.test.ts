import { describe, expect, it } from 'vitest';
import { BATTERY_DEFAULTS, modelledMatchDrawPercent, stateOfChargePercent } from '../../../shared/domain/battery-state';
import type { PlanBattery } from '../../../shared/domain/battery-plan';
import type { TimelineJson } from '../../../shared/domain/timeline';
import { buildPlanInput } from '../../../server/batteries/plan-input';
import { Battery, BatteryReading, BatteryUse, ChargingSession, Event } from '../../../server/models';
import { signIn, testApp } from '../../support/app';
import { makeBattery, makeCharger } from '../../support/batteries';
import { makeOurMatch } from '../../support/checks';
import { makeTeam, PASSWORD } from '../../support/factories';

// What the rotation plan reads, built from a fleet whose records are placed at known times.
const { app } = testApp();

const at = (time: string) => new Date(`2026-12-05T${time}:00.000Z`);
const NOW = at('08:30');
// Estimates are answered to one decimal.
const soc = (volts: number) => Math.round(stateOfChargePercent(volts) * 10) / 10;
const MODELLED = modelledMatchDrawPercent(18, 150, BATTERY_DEFAULTS);

async function pit() {
  const own = await makeTeam();
  const handler = await signIn(app, own.emails.battery, PASSWORD);
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const userId = own.memberships.battery.userId;
  const read = (batteryId: string, time: string, voltage: number, internalResistanceMilliohm = 12, useId: string | null = null) =>
    BatteryReading.create({ batteryId, voltage, internalResistanceMilliohm, rested: true, restedMinutes: null, temperatureC: null, takenAt: at(time), takenById: userId, useId });
  const used = (batteryId: string, matchId: string, installed: string, removed: string | null) =>
    BatteryUse.create({ batteryId, eventId: own.event.id, matchId, installedAt: at(installed), installedById: userId, removedAt: removed ? at(removed) : null, removedById: removed ? userId : null });
  return { ...own, handler, lead, read, used, userId };
}

describe('buildPlanInput', () => {
  it('numbers the bays across chargers in the order they were added, and reads the event and settings', async () => {
    const own = await pit();
    const bench = await makeCharger(own.handler, { name: 'Bench charger', bays: 2, currentPerBayA: 6 });
    const cart = await makeCharger(own.handler, { name: 'Cart charger', bays: 1, currentPerBayA: 10 });
    const first = await makeOurMatch(own.lead, own.event, { number: 4, scheduledStart: '2026-12-05T09:00:00.000Z' });
    await makeOurMatch(own.lead, own.event, { number: 9, alliance: 'blue', scheduledStart: '2026-12-05T09:40:00.000Z' });
    const event = await Event.findByPk(own.event.id, { rejectOnEmpty: true });

    const input = await buildPlanInput(event, NOW);
    expect(input.bays).toEqual([
      { bay: 1, chargerId: bench.id, label: 'Bench charger · bay 1', currentA: 6 },
      { bay: 2, chargerId: bench.id, label: 'Bench charger · bay 2', currentA: 6 },
      { bay: 3, chargerId: cart.id, label: 'Cart charger · bay 1', currentA: 10 },
    ]);
    const timeline = (await own.lead.get(`/api/events/${own.event.id}/timeline?at=${NOW.toISOString()}`)).body as TimelineJson;
    expect(input.matches).toEqual(timeline.ourMatches.map(({ matchId, queueAt, projectedStart }) => ({ matchId, queueAt, projectedStart })));
    expect(input.matches[0].matchId).toBe(first.id);
    expect(input).toMatchObject({
      now: NOW.toISOString(),
      batteries: [],
      // 150 s match + 5 min back to the pit.
      outOfRobotAfterMinutes: 7.5,
      drawPercent: MODELLED,
      minimumStartChargePercent: 90,
      chargeFactor: 1.12,
      chargeTailMinutes: 20,
    });
  });

  it('estimates each battery: latest reading less a draw per use since, full after a charge, charging until its expected end, in the robot for its match', async () => {
    const own = await pit();
    await makeCharger(own.handler, { name: 'Bench charger', bays: 2, currentPerBayA: 6 });
    const cart = await makeCharger(own.handler, { name: 'Cart charger', bays: 1, currentPerBayA: 10 });
    const early = await makeOurMatch(own.lead, own.event, { number: 1, scheduledStart: '2026-12-05T06:35:00.000Z' });
    const next = await makeOurMatch(own.lead, own.event, { number: 8, scheduledStart: '2026-12-05T09:00:00.000Z' });
    const [a, b, c, d, e, f] = await Promise.all(['A', 'B', 'C', 'D', 'E', 'F'].map((label) => makeBattery(own.handler, { label })));

    await own.read(a.id, '07:00', 12.65);
    await own.read(b.id, '06:00', 12.45);
    await own.used(b.id, early.id, '06:30', '06:45');
    await own.read(c.id, '06:00', 12.24);
    await ChargingSession.create({ batteryId: c.id, chargerId: cart.id, bay: 1, startedAt: at('06:10'), endedAt: at('07:30'), startedById: own.userId, endedById: own.userId, expectedEndAt: at('07:20') });
    await own.read(d.id, '07:50', 12.06);
    await ChargingSession.create({ batteryId: d.id, chargerId: cart.id, bay: 1, startedAt: at('08:00'), startedById: own.userId, expectedEndAt: at('09:10') });
    await Battery.update({ status: 'charging' }, { where: { id: d.id } });
    await own.read(e.id, '08:10', 12.7);
    await own.used(e.id, next.id, '08:20', null);
    await Battery.update({ status: 'in_robot' }, { where: { id: e.id } });
    // A minute apart: readings of one instant have no order to tell the latest by.
    for (const [minute, resistance] of [12, 12, 12, 30].entries()) await own.read(f.id, `05:0${minute}`, 12.5, resistance);
    await own.handler.patch(`/api/batteries/${f.id}`, { status: 'retired' });

    const input = await buildPlanInput(await Event.findByPk(own.event.id, { rejectOnEmpty: true }), NOW);
    const base = { ratedAh: 18, health: 'good' as const, chargingUntil: null, chargingBay: null, installedForMatchId: null, usesThisEvent: 0 };
    expect(input.batteries).toEqual([
      { ...base, id: a.id, label: 'A', status: 'ready', stateOfChargePercent: 100 },
      // REFERENCES §1 (BCI): 12.45 V is 75 %; one match since, at the modelled draw.
      { ...base, id: b.id, label: 'B', status: 'ready', stateOfChargePercent: Math.round((75 - MODELLED) * 10) / 10, usesThisEvent: 1 },
      { ...base, id: c.id, label: 'C', status: 'ready', stateOfChargePercent: 100 },
      { ...base, id: d.id, label: 'D', status: 'charging', stateOfChargePercent: soc(12.06), chargingUntil: at('09:10').toISOString(), chargingBay: 3 },
      { ...base, id: e.id, label: 'E', status: 'in_robot', stateOfChargePercent: 100, installedForMatchId: next.id, usesThisEvent: 1 },
      { ...base, id: f.id, label: 'F', status: 'retired', health: 'replace', stateOfChargePercent: soc(12.5) },
    ] satisfies PlanBattery[]);

    // Asked before C's charge ended, C is still at its reading.
    const earlier = await buildPlanInput(await Event.findByPk(own.event.id, { rejectOnEmpty: true }), at('07:00'));
    expect(earlier.batteries.find((battery) => battery.id === c.id)?.stateOfChargePercent).toBe(50);
  });

  it('learns the draw from three uses with readings before and after (the median drop)', async () => {
    const own = await pit();
    const matches = await Promise.all(
      [1, 2, 3].map((number) => makeOurMatch(own.lead, own.event, { number, scheduledStart: `2026-12-05T0${number + 5}:00:00.000Z` })),
    );
    const battery = await makeBattery(own.handler);
    const drops: number[] = [];
    for (const [index, [before, after]] of [[12.65, 12.56], [12.62, 12.55], [12.64, 12.52]].entries()) {
      const hour = index + 6;
      await own.read(battery.id, `0${hour}:00`, before);
      await own.used(battery.id, matches[index].id, `0${hour}:05`, `0${hour}:15`);
      await own.read(battery.id, `0${hour}:20`, after);
      drops.push(stateOfChargePercent(before) - stateOfChargePercent(after));
    }
    const event = await Event.findByPk(own.event.id, { rejectOnEmpty: true });
    const input = await buildPlanInput(event, NOW);
    expect(input.drawPercent).toBeCloseTo([...drops].sort((x, y) => x - y)[1], 6);
    expect(input.drawPercent).not.toBeCloseTo(MODELLED, 1);
  });
});
