/**
 * The rotation plan's invariants (issue 5, DESIGN §4.3) over random fleets, bays and schedules.
 * Seeded, so a failure reproduces; fast-check prints the smallest input that breaks a rule.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planBatteries, type BatteryPlanJson, type PlanBattery, type PlanInput } from '../../../shared/domain/battery-plan';
import { BATTERY_STATUSES, HEALTH_STATUSES } from '../../../shared/domain/battery-state';

const NOW = Date.parse('2027-03-05T09:00:00.000Z');
const MINUTE = 60_000;
const iso = (ms: number) => new Date(ms).toISOString();
const RUNS = { numRuns: 200, seed: 20270305 };

const bayList = fc.integer({ min: 0, max: 6 }).chain((count) =>
  fc.array(fc.integer({ min: 2, max: 12 }), { minLength: count, maxLength: count }).map((currents) =>
    currents.map((currentA, index) => ({ bay: index + 1, chargerId: index < 3 ? 'charger-1' : 'charger-2', label: `bay ${index + 1}`, currentA })),
  ),
);

/** Queue calls 5–60 min apart, the first from 20 min ago; each match starts 0–30 min after its call. */
const schedule = fc
  .record({
    first: fc.integer({ min: -20, max: 60 }),
    steps: fc.array(fc.record({ gap: fc.integer({ min: 5, max: 60 }), lead: fc.integer({ min: 0, max: 30 }) }), { maxLength: 40, size: 'max' }),
  })
  .map(({ first, steps }) => {
    let queueAt = NOW + first * MINUTE;
    return steps.map(({ gap, lead }, index) => {
      if (index > 0) queueAt += gap * MINUTE;
      return { matchId: `match-${String(index + 1).padStart(2, '0')}`, queueAt: iso(queueAt), projectedStart: iso(queueAt + lead * MINUTE) };
    });
  });

const batteryFacts = fc.record({
  status: fc.constantFrom(...BATTERY_STATUSES),
  health: fc.constantFrom(...HEALTH_STATUSES),
  ratedAh: fc.constantFrom(12, 18, 22),
  stateOfChargePercent: fc.option(fc.double({ min: 0, max: 100, noNaN: true }), { nil: null }),
  chargingFor: fc.option(fc.integer({ min: -30, max: 240 }), { nil: null, freq: 3 }),
  chargingBay: fc.integer({ min: 1, max: 6 }),
  installed: fc.option(fc.integer({ min: 0, max: 3 }), { nil: null, freq: 4 }),
  usesThisEvent: fc.integer({ min: 0, max: 5 }),
});

const planInput: fc.Arbitrary<PlanInput> = fc
  .record({
    bays: bayList,
    matches: schedule,
    facts: fc.array(batteryFacts, { minLength: 1, maxLength: 16, size: 'max' }),
    labels: fc.uniqueArray(fc.stringMatching(/^[A-H][1-3]?$/), { minLength: 16, maxLength: 16 }),
    outOfRobotAfterMinutes: fc.integer({ min: 3, max: 15 }),
    drawPercent: fc.double({ min: 0, max: 30, noNaN: true }),
    minimumStartChargePercent: fc.oneof(fc.integer({ min: 0, max: 100 }), fc.integer({ min: 80, max: 95 })),
    chargeFactor: fc.double({ min: 1, max: 1.3, noNaN: true }),
    chargeTailMinutes: fc.integer({ min: 0, max: 40 }),
  })
  .map(({ bays, matches, facts, labels, ...settings }) => {
    const busyBays = new Set<number>();
    const batteries = facts.map((fact, index): PlanBattery => {
      // One battery per bay, as the API enforces; a bay that does not exist is kept (a removed charger).
      const charging = fact.chargingFor !== null && !busyBays.has(fact.chargingBay);
      if (charging) busyBays.add(fact.chargingBay);
      // 0 = in the robot for a match already started; 1–3 = for one of the first planned matches.
      const installedFor = fact.installed === null ? null : fact.installed === 0 ? 'started-match' : (matches[fact.installed - 1]?.matchId ?? null);
      return {
        id: `battery-${String(index).padStart(2, '0')}`,
        label: labels[index],
        status: fact.status,
        health: fact.health,
        ratedAh: fact.ratedAh,
        stateOfChargePercent: fact.stateOfChargePercent,
        chargingUntil: charging ? iso(NOW + (fact.chargingFor as number) * MINUTE) : null,
        chargingBay: charging ? fact.chargingBay : null,
        installedForMatchId: installedFor,
        usesThisEvent: fact.usesThisEvent,
      };
    });
    return { now: iso(NOW), batteries, bays, matches, ...settings };
  });

/** Each match's robot time as the plan defines it: a passed queue call counts from now. */
function robotTimes(input: PlanInput) {
  const out = input.outOfRobotAfterMinutes * MINUTE;
  return new Map(
    input.matches.map((match) => {
      const callAt = Math.max(Date.parse(match.queueAt), NOW);
      return [match.matchId, { callAt, outAt: Math.max(Date.parse(match.projectedStart), callAt) + out }];
    }),
  );
}

const inQueueOrder = (input: PlanInput) => [...input.matches].sort((a, b) => Date.parse(a.queueAt) - Date.parse(b.queueAt));
const warningsFor = (plan: BatteryPlanJson, matchId: string) => plan.warnings.filter((warning) => warning.matchId === matchId).map((warning) => warning.code);

/** A seeded Fisher–Yates shuffle (mulberry32), so the shuffled input is part of the reproducible case. */
function shuffled<T>(items: readonly T[], seed: number): T[] {
  let state = seed >>> 0;
  const random = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let x = Math.imul(state ^ (state >>> 15), 1 | state);
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x;
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
  const copy = [...items];
  for (let i = copy.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [copy[i], copy[j]] = [copy[j], copy[i]];
  }
  return copy;
}

function check(predicate: (input: PlanInput, plan: BatteryPlanJson) => void) {
  fc.assert(
    fc.property(planInput, (input) => predicate(input, planBatteries(input))),
    RUNS,
  );
}

describe('planBatteries: invariants over random fleets and schedules', () => {
  it('never assigns a retired battery', () => {
    check((input, plan) => {
      const retired = new Set(input.batteries.filter((battery) => battery.status === 'retired').map((battery) => battery.id));
      for (const assignment of plan.assignments) expect(retired.has(assignment.batteryId)).toBe(false);
    });
  });

  it('never assigns a battery that is charging at the queue call (its own plan and the input)', () => {
    check((input, plan) => {
      const times = robotTimes(input);
      for (const { matchId, batteryId } of plan.assignments) {
        const { callAt } = times.get(matchId)!;
        const battery = input.batteries.find((each) => each.id === batteryId)!;
        if (battery.chargingUntil !== null) expect(Date.parse(battery.chargingUntil) > callAt).toBe(false);
        for (const charge of plan.charging.filter((each) => each.batteryId === batteryId)) {
          expect(Date.parse(charge.from) <= callAt && callAt < Date.parse(charge.to)).toBe(false);
        }
      }
    });
  });

  it('starts every match with at least the minimum charge (the plan never needs the warning that would excuse it)', () => {
    check((input, plan) => {
      for (const assignment of plan.assignments) expect(assignment.expectedChargePercent).toBeGreaterThanOrEqual(input.minimumStartChargePercent);
    });
  });

  it('never puts one battery into two matches whose robot times overlap', () => {
    check((input, plan) => {
      const times = robotTimes(input);
      const byBattery = new Map<string, { callAt: number; outAt: number }[]>();
      for (const { matchId, batteryId } of plan.assignments) byBattery.set(batteryId, [...(byBattery.get(batteryId) ?? []), times.get(matchId)!]);
      for (const spans of byBattery.values()) {
        spans.sort((a, b) => a.callAt - b.callAt);
        for (let i = 1; i < spans.length; i++) expect(spans[i].callAt).toBeGreaterThanOrEqual(spans[i - 1].outAt);
      }
    });
  });

  it('never has a bay hold two batteries at once', () => {
    check((_input, plan) => {
      const byBay = new Map<number, { from: number; to: number }[]>();
      for (const charge of plan.charging) byBay.set(charge.bay, [...(byBay.get(charge.bay) ?? []), { from: Date.parse(charge.from), to: Date.parse(charge.to) }]);
      for (const spans of byBay.values()) {
        spans.sort((a, b) => a.from - b.from);
        for (let i = 1; i < spans.length; i++) expect(spans[i].from).toBeGreaterThanOrEqual(spans[i - 1].to);
      }
    });
  });

  it('charges only from now on, and never while the battery is in the robot', () => {
    check((input, plan) => {
      const times = robotTimes(input);
      for (const charge of plan.charging) {
        const [from, to] = [Date.parse(charge.from), Date.parse(charge.to)];
        expect(from).toBeGreaterThanOrEqual(NOW);
        expect(to).toBeGreaterThan(from);
        for (const { matchId } of plan.assignments.filter((each) => each.batteryId === charge.batteryId)) {
          const { callAt, outAt } = times.get(matchId)!;
          expect(to <= callAt || from >= outAt).toBe(true);
        }
      }
    });
  });

  it('gives every match either a battery or a no_battery_ready warning, never both', () => {
    check((input, plan) => {
      for (const { matchId } of input.matches) {
        const assigned = plan.assignments.filter((each) => each.matchId === matchId).length;
        const short = warningsFor(plan, matchId).includes('no_battery_ready');
        expect(assigned + (short ? 1 : 0)).toBe(1);
      }
      for (const warning of plan.warnings.filter((each) => each.code === 'no_battery_ready')) {
        if (warning.readyAt === null) expect(warning.shortfallMinutes).toBe(0);
        else expect(warning.shortfallMinutes).toBeGreaterThanOrEqual(1);
      }
    });
  });

  it('puts the previous match battery back in only with reused_previous, and says so only then', () => {
    check((input, plan) => {
      const order = inQueueOrder(input);
      const planned = new Set(order.map((match) => match.matchId));
      const batteryOf = new Map(plan.assignments.map((each) => [each.matchId, each.batteryId]));
      order.forEach(({ matchId }, index) => {
        const reused = warningsFor(plan, matchId).includes('reused_previous');
        if (index > 0) {
          const previous = batteryOf.get(order[index - 1].matchId);
          expect(reused).toBe(previous !== undefined && previous === batteryOf.get(matchId));
        } else if (reused) {
          // Before our first match, the previous battery is the one in the robot for a match already started.
          const battery = input.batteries.find((each) => each.id === batteryOf.get(matchId))!;
          const installed = battery.installedForMatchId;
          expect(installed === null ? battery.status === 'in_robot' : !planned.has(installed)).toBe(true);
        }
      });
    });
  });

  it('uses a battery due for replacement only with only_worn_battery, unless it was installed for that match', () => {
    check((input, plan) => {
      for (const { matchId, batteryId } of plan.assignments) {
        const battery = input.batteries.find((each) => each.id === batteryId)!;
        if (battery.health === 'replace' && battery.installedForMatchId !== matchId) expect(warningsFor(plan, matchId)).toContain('only_worn_battery');
      }
    });
  });

  it('answers the same plan for the same input in any order', () => {
    fc.assert(
      fc.property(planInput, fc.integer(), (input, seed) => {
        const plan = planBatteries(input);
        expect(planBatteries(input)).toEqual(plan);
        const reordered = { ...input, batteries: shuffled(input.batteries, seed), bays: shuffled(input.bays, seed + 1), matches: shuffled(input.matches, seed + 2) };
        expect(planBatteries(reordered)).toEqual(plan);
      }),
      RUNS,
    );
  });
});
