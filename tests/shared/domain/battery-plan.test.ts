/**
 * The rotation plan on small cases worked out by hand. Unless a test says otherwise: now 09:00,
 * 10 Ah batteries, 6 A bays, charge factor 1, 20 min tail, 10 min from a match's start until its
 * battery is out, 20 % per match, minimum 90 %. So a battery out of a match at 80 % lacks
 * 2 Ah → 2 × 60 / 6 = 20 min + 20 min tail = 40 min on a bay (REFERENCES §4).
 */
import { describe, expect, it } from 'vitest';
import { planBatteries, type PlanBattery, type PlanBay, type PlanInput, type PlanMatch } from '../../../shared/domain/battery-plan';

/** `t('09:10')` → `2027-03-05T09:10:00.000Z`; seconds and milliseconds may be given. */
const t = (clock: string) => `2027-03-05T${clock.length === 5 ? `${clock}:00.000` : clock}Z`;

const battery = (label: string, facts: Partial<PlanBattery> = {}): PlanBattery => ({
  id: `battery-${label}`,
  label,
  status: 'ready',
  health: 'good',
  ratedAh: 10,
  stateOfChargePercent: 100,
  chargingUntil: null,
  chargingBay: null,
  installedForMatchId: null,
  usesThisEvent: 0,
  ...facts,
});

const bays = (...currents: number[]): PlanBay[] =>
  currents.map((currentA, index) => ({ bay: index + 1, chargerId: 'charger-1', label: `Bench charger · bay ${index + 1}`, currentA }));

/** Each match starts 10 min after its queue call. */
const matches = (...calls: string[]): PlanMatch[] =>
  calls.map((call, index) => ({ matchId: `m${index + 1}`, queueAt: t(call), projectedStart: new Date(Date.parse(t(call)) + 10 * 60_000).toISOString() }));

const input = (facts: Partial<PlanInput>): PlanInput => ({
  now: t('09:00'),
  batteries: [],
  bays: bays(6),
  matches: [],
  outOfRobotAfterMinutes: 10,
  drawPercent: 20,
  minimumStartChargePercent: 90,
  chargeFactor: 1,
  chargeTailMinutes: 20,
  ...facts,
});

const assigned = (matchId: string, label: string, expectedChargePercent: number) => ({ matchId, batteryId: `battery-${label}`, expectedChargePercent });
const charge = (label: string, bay: number, from: string, to: string) => ({ batteryId: `battery-${label}`, bay, from: t(from), to: t(to) });

describe('planBatteries: worked examples', () => {
  it('rotates two batteries on one bay, a battery waiting when the bay is busy', () => {
    // m1 (call 09:10): A and B full, unused → A by label. Out 09:30 at 80 %, bay 1 09:30–10:10.
    // m2 (call 09:40): A charging → B. Out 10:00 at 80 %; bay 1 busy → waits, 10:10–10:50.
    // m3 (call 10:30): A full since 10:10; B charging → A. Out 10:50 at 80 %, bay 1 10:50–11:30.
    const plan = planBatteries(input({ batteries: [battery('A'), battery('B')], matches: matches('09:10', '09:40', '10:30') }));
    expect(plan).toEqual({
      assignments: [assigned('m1', 'A', 100), assigned('m2', 'B', 100), assigned('m3', 'A', 100)],
      charging: [charge('A', 1, '09:30', '10:10'), charge('B', 1, '10:10', '10:50'), charge('A', 1, '10:50', '11:30')],
      warnings: [],
    });
  });

  it('spreads use: fewest uses first, planned uses counted', () => {
    // Uses so far A 2, B 0, C 1; two bays.
    // m1 (09:10): B (0 uses). Out 09:30 → bay 1 09:30–10:10.
    // m2 (09:40): A (2) or C (1) → C. Out 10:00 → bay 1 busy, bay 2 free: 10:00–10:40.
    // m3 (10:30): A (2 uses), B (full at 10:10, now 1 use) → B. Out 10:50: both bays free → the
    //   lowest number, bay 1, 10:50–11:30.
    const plan = planBatteries(
      input({
        batteries: [battery('A', { usesThisEvent: 2 }), battery('B'), battery('C', { usesThisEvent: 1 })],
        bays: bays(6, 6),
        matches: matches('09:10', '09:40', '10:30'),
      }),
    );
    expect(plan.assignments).toEqual([assigned('m1', 'B', 100), assigned('m2', 'C', 100), assigned('m3', 'B', 100)]);
    expect(plan.charging).toEqual([charge('B', 1, '09:30', '10:10'), charge('C', 2, '10:00', '10:40'), charge('B', 1, '10:50', '11:30')]);
    expect(plan.warnings).toEqual([]);
  });

  it('prefers healthier batteries; one due for replacement only when nothing else qualifies', () => {
    // A watch, B good, C replace, all full and unused; one bay.
    // m1 (09:10): B (good before watch, though A comes first by label). Out 09:30 → 09:30–10:10.
    // m2 (09:40): A (watch) rather than C (replace). Out 10:00 at 80 %, waits for the bay.
    // m3 (10:05): B charging, A off the charger but at 80 % < 90 % → only C → only_worn_battery.
    //   Bay: A (waiting since 10:00) 10:10–10:50, then C (out 10:25 at 80 %) 10:50–11:30.
    const plan = planBatteries(
      input({
        batteries: [battery('A', { health: 'watch' }), battery('B'), battery('C', { health: 'replace' })],
        matches: matches('09:10', '09:40', '10:05'),
      }),
    );
    expect(plan.assignments).toEqual([assigned('m1', 'B', 100), assigned('m2', 'A', 100), assigned('m3', 'C', 100)]);
    expect(plan.charging).toEqual([charge('B', 1, '09:30', '10:10'), charge('A', 1, '10:10', '10:50'), charge('C', 1, '10:50', '11:30')]);
    expect(plan.warnings).toEqual([
      { matchId: 'm3', code: 'only_worn_battery', shortfallMinutes: 0, message: 'C is due for replacement, but no healthier battery is ready for this match.' },
    ]);
  });

  it('skips the battery that just came out of the previous match', () => {
    // No bays, minimum 70 %: a battery out of a match at 80 % still qualifies. Uses A 0, B 3.
    // m1 (09:10): A (fewer uses). Out 09:30 at 80 %.
    // m2 (09:40): A has fewer uses (1 < 3) but just came out of m1 → B. Out 10:00 at 80 %.
    // m3 (10:10): A (1 use, 80 %) vs B (4 uses, previous) → A at 80 %.
    const plan = planBatteries(
      input({
        batteries: [battery('A'), battery('B', { usesThisEvent: 3 })],
        bays: [],
        minimumStartChargePercent: 70,
        matches: matches('09:10', '09:40', '10:10'),
      }),
    );
    expect(plan).toEqual({ assignments: [assigned('m1', 'A', 100), assigned('m2', 'B', 100), assigned('m3', 'A', 80)], charging: [], warnings: [] });
  });

  it('puts the same battery back in with reused_previous when nothing else is ready; a retired one stays out', () => {
    // A and a retired, full B. m1 (09:10): A. Out 09:30 → bay 1 09:30–10:10.
    // m2 (10:20): A full again but it was in m1; B is retired → A, reused_previous. Out 10:40 → 10:40–11:20.
    const plan = planBatteries(input({ batteries: [battery('A'), battery('B', { status: 'retired' })], matches: matches('09:10', '10:20') }));
    expect(plan).toEqual({
      assignments: [assigned('m1', 'A', 100), assigned('m2', 'A', 100)],
      charging: [charge('A', 1, '09:30', '10:10'), charge('A', 1, '10:40', '11:20')],
      warnings: [
        { matchId: 'm2', code: 'reused_previous', shortfallMinutes: 0, message: 'No other battery is ready, so A goes straight back in after the previous match.' },
      ],
    });
  });

  it('warns no_battery_ready with the shortfall in whole minutes, rounded up, and what would help', () => {
    // One 7 A bay: 2 Ah back takes 2 × 60 / 7 = 17.142857 min + 20 = 37.142857 min
    //   = 2 228 571.43 ms → 2 228 572 ms (rounded up) = 37 min 8.572 s.
    // m1 (09:10): A. Out 09:30 → 09:30:00 – 10:07:08.572.
    // m2 (09:40): B (C is retired). Out 10:00 at 80 %; waits → 10:07:08.572 – 10:44:17.144.
    // m3 (10:00): A charging, B just out at 80 % < 90 %, C retired → nothing. A is full at
    //   10:07:08.572 → 7.14 min after the call → 8 min short.
    const plan = planBatteries(
      input({
        batteries: [battery('A'), battery('B'), battery('C', { status: 'retired' })],
        bays: bays(7),
        matches: matches('09:10', '09:40', '10:00'),
      }),
    );
    expect(plan.assignments).toEqual([assigned('m1', 'A', 100), assigned('m2', 'B', 100)]);
    expect(plan.charging).toEqual([charge('A', 1, '09:30', '10:07:08.572'), charge('B', 1, '10:07:08.572', '10:44:17.144')]);
    expect(plan.warnings).toEqual([
      {
        matchId: 'm3',
        code: 'no_battery_ready',
        shortfallMinutes: 8,
        readyAt: t('10:07:08.572'),
        message:
          'No battery has 90 % at the queue call; the first to get there, A, is 8 min late. Would help: another charger bay, more than 7 A per bay or bringing back a retired battery (C).',
      },
    ]);
  });

  it('says when no battery will ever be ready as things stand', () => {
    // No bay and A at 50 %: nothing charges it. Shortfall 0 and readyAt null: there is no moment to count to.
    const plan = planBatteries(input({ batteries: [battery('A', { stateOfChargePercent: 50 })], bays: [], matches: matches('09:10') }));
    expect(plan).toEqual({
      assignments: [],
      charging: [],
      warnings: [
        {
          matchId: 'm1',
          code: 'no_battery_ready',
          shortfallMinutes: 0,
          readyAt: null,
          message: 'No battery will reach 90 % for this match as things stand. Would help: a charger bay (there is none) or another battery.',
        },
      ],
    });
  });

  it('leaves a charging battery on its bay until it is done; the rest charge lowest first', () => {
    // Bays 1 and 2. A is charging on bay 2 until 09:25. B 50 %, C 40 % (never reached 90 %).
    // At 09:00 the lowest goes first: C on bay 1 (free now): 6 Ah → 60 + 20 = 80 min → 10:20.
    //   B: bay 1 free at 10:20, bay 2 at 09:25 → bay 2: 5 Ah → 50 + 20 = 70 min → 09:25–10:35.
    // m1 (09:20): nothing qualifies; A is full at 09:25 → 5 min short.
    // m2 (09:30): A (full). Out 09:50 at 80 % → bay 1 at 10:20 (bay 2 at 10:35) → 10:20–11:00.
    const plan = planBatteries(
      input({
        batteries: [battery('A', { status: 'charging', stateOfChargePercent: 60, chargingUntil: t('09:25'), chargingBay: 2 }), battery('B', { stateOfChargePercent: 50 }), battery('C', { stateOfChargePercent: 40 })],
        bays: bays(6, 6),
        matches: matches('09:20', '09:30'),
      }),
    );
    expect(plan).toEqual({
      assignments: [assigned('m2', 'A', 100)],
      charging: [charge('C', 1, '09:00', '10:20'), charge('A', 2, '09:00', '09:25'), charge('B', 2, '09:25', '10:35'), charge('A', 1, '10:20', '11:00')],
      warnings: [
        {
          matchId: 'm1',
          code: 'no_battery_ready',
          shortfallMinutes: 5,
          readyAt: t('09:25'),
          message: 'No battery has 90 % at the queue call; the first to get there, A, is 5 min late. Would help: another charger bay, more than 6 A per bay or another battery.',
        },
      ],
    });
  });

  it('a retired battery never goes in, but keeps the bay it is charging on', () => {
    // A retired and full; R retired, charging on bay 1 until 09:20; B at 50 % waits for the bay:
    // 5 Ah → 70 min → 09:20–10:30. m1 (09:10): nothing qualifies until B at 10:30 → 80 min short.
    const plan = planBatteries(
      input({
        batteries: [
          battery('A', { status: 'retired' }),
          battery('B', { stateOfChargePercent: 50 }),
          battery('R', { status: 'retired', chargingUntil: t('09:20'), chargingBay: 1 }),
        ],
        matches: matches('09:10'),
      }),
    );
    expect(plan.assignments).toEqual([]);
    expect(plan.charging).toEqual([charge('R', 1, '09:00', '09:20'), charge('B', 1, '09:20', '10:30')]);
    expect(plan.warnings).toEqual([
      {
        matchId: 'm1',
        code: 'no_battery_ready',
        shortfallMinutes: 80,
        readyAt: t('10:30'),
        message:
          'No battery has 90 % at the queue call; the first to get there, B, is 80 min late. Would help: another charger bay, more than 6 A per bay or bringing back a retired battery (A, R).',
      },
    ]);
  });

  it('keeps a battery installed for a match as its assignment', () => {
    // A is in the robot for m1 at 92 % with 3 uses; B is full and unused (the usual pick).
    // m1: A, 92 %. Out 09:30 at 72 %: 2.8 Ah → 28 + 20 = 48 min → 09:30–10:18. m2 (09:40): B.
    const plan = planBatteries(
      input({
        batteries: [battery('A', { status: 'in_robot', stateOfChargePercent: 92, installedForMatchId: 'm1', usesThisEvent: 3 }), battery('B')],
        matches: matches('09:10', '09:40'),
      }),
    );
    expect(plan.assignments).toEqual([assigned('m1', 'A', 92), assigned('m2', 'B', 100)]);
    expect(plan.charging).toEqual([charge('A', 1, '09:30', '10:18'), charge('B', 1, '10:18', '10:58')]);
    expect(plan.warnings).toEqual([]);
  });

  it('takes out and charges an installed battery below the minimum', () => {
    // A installed for m1 at 85 % < 90 %: on bay 1 from 09:00, 1.5 Ah → 15 + 20 = 35 min → 09:35.
    // m1 (09:10): B. Out 09:30 at 80 %, waits → 09:35–10:15. m2 (09:40): A, full. Out 10:00 at
    //   80 %, waits for B → 10:15–10:55.
    const plan = planBatteries(
      input({
        batteries: [battery('A', { status: 'in_robot', stateOfChargePercent: 85, installedForMatchId: 'm1' }), battery('B')],
        matches: matches('09:10', '09:40'),
      }),
    );
    expect(plan.assignments).toEqual([assigned('m1', 'B', 100), assigned('m2', 'A', 100)]);
    expect(plan.charging).toEqual([charge('A', 1, '09:00', '09:35'), charge('B', 1, '09:35', '10:15'), charge('A', 1, '10:15', '10:55')]);
  });

  it('counts the battery in the robot for a match already on the field as the previous one', () => {
    // A is in the robot for m0 (started) at 95 % before it: out by 09:10 at 75 % (no bays: it
    // stays off the charger; minimum 70 %). Uses A 1, B 2.
    // m1 (09:20): A would win on uses but just came out → B. Out 09:40 at 80 %.
    // m2 (09:50): A (1 use, 75 %) vs B (3 uses, previous) → A at 75 %.
    const plan = planBatteries(
      input({
        batteries: [battery('A', { status: 'in_robot', stateOfChargePercent: 95, installedForMatchId: 'm0', usesThisEvent: 1 }), battery('B', { usesThisEvent: 2 })],
        bays: [],
        minimumStartChargePercent: 70,
        matches: matches('09:20', '09:50'),
      }),
    );
    expect(plan).toEqual({ assignments: [assigned('m1', 'B', 100), assigned('m2', 'A', 75)], charging: [], warnings: [] });
  });

  it('charges the battery from a match already on the field once it is out', () => {
    // A in the robot for m0 at 100 % before it: out at 09:10 at 80 % → bay 1 09:10–09:50.
    const plan = planBatteries(input({ batteries: [battery('A', { status: 'in_robot', installedForMatchId: 'm0' })] }));
    expect(plan).toEqual({ assignments: [], charging: [charge('A', 1, '09:10', '09:50')], warnings: [] });
  });
});

describe('planBatteries: deterministic', () => {
  const busy = input({
    batteries: [battery('A', { chargingUntil: t('09:25'), chargingBay: 2 }), battery('B', { stateOfChargePercent: 50 }), battery('C', { stateOfChargePercent: 40 }), battery('D'), battery('E', { health: 'watch' })],
    bays: [...bays(6, 6), { bay: 3, chargerId: 'charger-2', label: 'Spare charger · bay 3', currentA: 10 }],
    matches: matches('09:20', '09:30', '09:55', '10:15', '10:40'),
  });

  it('answers the same plan for the same input', () => {
    expect(planBatteries(busy)).toEqual(planBatteries(busy));
  });

  it('answers the same plan whatever order the batteries, bays and matches come in', () => {
    const reversed = { ...busy, batteries: [...busy.batteries].reverse(), bays: [...busy.bays].reverse(), matches: [...busy.matches].reverse() };
    expect(planBatteries(reversed)).toEqual(planBatteries(busy));
  });

  it('breaks a tie by label, then by id', () => {
    const pick = (batteries: PlanBattery[]) => planBatteries(input({ batteries, matches: matches('09:10') })).assignments[0].batteryId;
    expect(pick([battery('B', { id: 'a' }), battery('A', { id: 'z' })])).toBe('z');
    expect(pick([battery('A', { id: 'id-2' }), battery('A', { id: 'id-1' })])).toBe('id-1');
  });
});
