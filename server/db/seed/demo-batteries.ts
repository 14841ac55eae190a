import type { Transaction } from 'sequelize';
import { BATTERY_DEFAULTS, rechargeMinutes, type BatteryStatus } from '../../../shared/domain/battery-state';
import type { Role } from '../../../shared/roles';
import { socIn } from '../../batteries/settings';
import { Battery, BatteryReading, BatteryUse, Charger, ChargingSession, type Event, type Team, type User } from '../../models';
import type { DemoChecklistMatch } from './demo-checklists';

/**
 * The demo team's invented fleet: ten 18 Ah sealed batteries painted with the year they came into
 * service and a letter. Each has its shop readings from the weeks before (the baseline), one at
 * load-in last night and one this morning; one was retired at load-in, one is drifting to
 * `watch` and one to `replace`. Our played matches each used a battery with a reading before and
 * after (enough for the learned draw), those came off onto the chargers, and the battery for our
 * next match is already in the robot.
 */

/** What the analyzer showed on the battery of our last match as it came off (the post-match check notes it too). */
export const LAST_MATCH_AFTER_VOLTS = 12.57;

type Reading = readonly [volts: number, milliohm: number];
interface ReadingOptions {
  rested?: boolean;
  restedMinutes?: number | null;
  useId?: string | null;
}
interface DemoBattery {
  label: string;
  year: number;
  /** Shop readings, 6, 4 and 2 weeks ago: the baseline (resistance only; they were full). */
  baseline: readonly [number, number, number];
  loadIn: Reading;
  /** This morning's check; none for a battery retired at load-in. */
  morning: Reading | null;
  notes: string | null;
}

const FLEET: readonly DemoBattery[] = [
  { label: '23-A', year: 2023, baseline: [15.2, 15.8, 15.5], loadIn: [12.31, 27.4], morning: null, notes: 'Retired at load-in: 27 mΩ, and it sagged on the practice field' },
  { label: '24-A', year: 2024, baseline: [14.2, 13.8, 14.0], loadIn: [12.74, 19.6], morning: [12.71, 21.5], notes: 'Resistance climbing all weekend: practice-field spare only' },
  { label: '24-B', year: 2024, baseline: [13.1, 12.9, 13.0], loadIn: [12.78, 14.8], morning: [12.84, 15.9], notes: null },
  { label: '25-A', year: 2025, baseline: [12.1, 12.4, 12.2], loadIn: [12.8, 12.5], morning: [12.82, 12.6], notes: null },
  { label: '25-B', year: 2025, baseline: [11.9, 12.2, 12.0], loadIn: [12.79, 12.3], morning: [12.83, 12.4], notes: null },
  { label: '25-C', year: 2025, baseline: [12.6, 12.3, 12.5], loadIn: [12.81, 12.7], morning: [12.86, 12.9], notes: 'Cracked handle, taped' },
  { label: '26-A', year: 2026, baseline: [11.2, 11.0, 11.3], loadIn: [12.85, 11.4], morning: [12.85, 11.5], notes: null },
  { label: '26-B', year: 2026, baseline: [11.5, 11.4, 11.6], loadIn: [12.83, 11.6], morning: [12.83, 11.7], notes: null },
  { label: '26-C', year: 2026, baseline: [10.9, 11.1, 11.0], loadIn: [12.87, 11.2], morning: [12.88, 11.1], notes: null },
  { label: '26-D', year: 2026, baseline: [11.3, 11.4, 11.2], loadIn: [12.6, 11.5], morning: [12.52, 11.6], notes: null },
];

/** Our played matches, oldest first, take these batteries, with the volts before and after. */
const PLAYED: readonly { label: string; before: number; after: number }[] = [
  { label: '26-A', before: 12.85, after: 12.58 },
  { label: '25-B', before: 12.83, after: 12.59 },
  { label: '25-A', before: 12.82, after: LAST_MATCH_AFTER_VOLTS },
];
const NEXT_MATCH_BATTERY = '26-C';
/** What a battery just off the charger reads: above the table's top, from its surface charge. */
const OFF_CHARGER_VOLTS = 13.05;
/** A top-up on the bench: read a little low this morning. */
const TOPPING_UP = '26-D';

const MINUTE_MS = 60_000;
const DAY_MS = 24 * 60 * MINUTE_MS;
const shift = (at: Date, minutes: number) => new Date(at.getTime() + minutes * MINUTE_MS);
/** Rested overnight before the morning check. */
const OVERNIGHT_REST_MINUTES = 480;

export async function seedDemoBatteries(
  { team, event, users, matches, now }: { team: Team; event: Event; users: Record<Role, User>; matches: readonly DemoChecklistMatch[]; now: Date },
  transaction: Transaction,
) {
  const socOf = socIn(BATTERY_DEFAULTS);
  const firstStart = matches[0]?.scheduledStart ?? now;
  const morningAt = shift(firstStart, -60);
  const loadInAt = new Date(now.getTime() - 16 * 60 * MINUTE_MS);
  const restedSinceMorning = (at: Date) => OVERNIGHT_REST_MINUTES + Math.max(0, Math.round((at.getTime() - morningAt.getTime()) / MINUTE_MS));

  const byLabel = new Map<string, Battery>();
  const read = (battery: Battery, takenAt: Date, [voltage, internalResistanceMilliohm]: Reading, options: ReadingOptions = {}) => {
    const { rested = true, restedMinutes = null, useId = null } = options;
    return BatteryReading.create(
      { batteryId: battery.id, voltage, internalResistanceMilliohm, rested, restedMinutes, temperatureC: 21, takenAt, takenById: users.battery.id, useId },
      { transaction },
    );
  };

  for (const demo of FLEET) {
    const status: BatteryStatus = demo.morning === null ? 'retired' : 'ready';
    const battery = await Battery.create(
      { teamId: team.id, label: demo.label, yearInService: demo.year, nominalCapacityAh: 18, chemistry: 'sealed_agm', notes: demo.notes, status },
      { transaction },
    );
    byLabel.set(demo.label, battery);
    for (const [index, milliohm] of demo.baseline.entries()) {
      await read(battery, new Date(now.getTime() - (6 - 2 * index) * 7 * DAY_MS), [12.8, milliohm], { restedMinutes: 1440 });
    }
    await read(battery, loadInAt, demo.loadIn, { restedMinutes: 1440 });
    if (demo.morning) await read(battery, morningAt, demo.morning, { restedMinutes: OVERNIGHT_REST_MINUTES });
  }
  const battery = (label: string) => byLabel.get(label)!;
  const morningOf = (label: string) => FLEET.find((demo) => demo.label === label)!.morning!;
  // Kept out of the rotation for now, not yet retired.
  await battery('24-A').update({ status: 'resting' }, { transaction });

  // Created one after the other: the plan numbers bays in this order.
  const charger = async (name: string, bays: number, currentPerBayA: number, daysAgo: number) => {
    const createdAt = new Date(now.getTime() - daysAgo * DAY_MS);
    return Charger.create({ teamId: team.id, name, bays, currentPerBayA, createdAt, updatedAt: createdAt }, { transaction, silent: true });
  };
  const bench = await charger('Bench charger', 2, 6, 43);
  const cart = await charger('Cart charger', 1, 10, 42);

  /**
   * On a bay for REFERENCES §4's time to put back what its reading says it lacks; with `finish`,
   * taken off a few minutes after that time when it has passed, as a handler would.
   */
  const charge = async (subject: Battery, on: Charger, bay: number, startedAt: Date, fromVolts: number, { finish }: { finish: boolean }) => {
    const missingAh = ((100 - socOf(fromVolts)) / 100) * subject.nominalCapacityAh;
    const expectedEndAt = shift(startedAt, rechargeMinutes(missingAh, on.currentPerBayA, BATTERY_DEFAULTS));
    const takenOff = shift(expectedEndAt, 3);
    const endedAt = finish && takenOff < now ? takenOff : null;
    await ChargingSession.create(
      { batteryId: subject.id, chargerId: on.id, bay, startedAt, startedById: users.battery.id, expectedEndAt, endedAt, endedById: endedAt ? users.battery.id : null },
      { transaction },
    );
    if (!endedAt) await subject.update({ status: 'charging' }, { transaction });
    // Read as it came off: full, with the surface charge of a battery just charged (not rested).
    else await read(subject, shift(endedAt, 1), [OFF_CHARGER_VOLTS, morningOf(subject.label)[1]], { rested: false });
  };

  const ours = matches.filter((match) => match.alliance !== null);
  const played = ours.filter((match) => match.startedAt !== null).slice(-PLAYED.length);
  // Onto a charger a few minutes after each match: the first two have finished, the last is on now.
  const bays: readonly (readonly [Charger, number])[] = [
    [bench, 2],
    [cart, 1],
    [bench, 1],
  ];
  for (const [index, match] of played.entries()) {
    const { label, before, after } = PLAYED[index];
    const subject = battery(label);
    const startedAt = match.startedAt!;
    const installedAt = shift(startedAt, -18);
    const removedAt = shift(startedAt, 7);
    const use = await BatteryUse.create(
      { batteryId: subject.id, eventId: event.id, matchId: match.id, installedAt, installedById: users.crew.id, removedAt, removedById: users.crew.id },
      { transaction },
    );
    const [, milliohm] = morningOf(label);
    const beforeAt = shift(installedAt, -3);
    await read(subject, beforeAt, [before, milliohm], { restedMinutes: restedSinceMorning(beforeAt), useId: use.id });
    // Read as the crew noted it in the post-match check, warm from the match.
    await read(subject, shift(startedAt, 8), [after, milliohm + 0.2], { rested: false, useId: use.id });
    const [on, bay] = bays[index];
    await charge(subject, on, bay, shift(removedAt, 4), after, { finish: index < played.length - 1 });
  }
  await charge(battery(TOPPING_UP), bench, 2, shift(now, -40), morningOf(TOPPING_UP)[0], { finish: false });

  // Our next match's battery: read and strapped in just before the crew ticked "Battery latched".
  const next = ours.find((match) => match.startedAt === null);
  if (next) {
    const subject = battery(NEXT_MATCH_BATTERY);
    const readAt = shift(now, -8);
    await read(subject, readAt, morningOf(NEXT_MATCH_BATTERY), { restedMinutes: restedSinceMorning(readAt) });
    await BatteryUse.create({ batteryId: subject.id, eventId: event.id, matchId: next.id, installedAt: shift(now, -6), installedById: users.crew.id }, { transaction });
    await subject.update({ status: 'in_robot' }, { transaction });
  }
}
