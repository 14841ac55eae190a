import { describe, expect, it } from 'vitest';
import { BATTERY_DEFAULTS, modelledMatchDrawPercent, stateOfChargePercent } from '../../../shared/domain/battery-state';
import { drawPercentOf, estimateChargePercent, useDrops, type BatteryRecords } from '../../../server/batteries/charge-estimate';

// The charge between readings (pure; no database). Voltages are turned into percent by the BCI
// table (REFERENCES §1) as the server does; estimates are answered to one decimal.
const socOf = (volts: number) => stateOfChargePercent(volts);
const at = (time: string) => new Date(`2026-12-05T${time}:00.000Z`);
const reading = (time: string, voltage: number, useId: string | null = null) => ({ takenAt: at(time), voltage, useId });
const use = (id: string, installed: string, removed: string | null) => ({ id, installedAt: at(installed), removedAt: removed === null ? null : at(removed) });
const session = (started: string, ended: string | null, expected: string | null) => ({
  startedAt: at(started),
  endedAt: ended === null ? null : at(ended),
  expectedEndAt: expected === null ? null : at(expected),
});
const records = (overrides: Partial<BatteryRecords>): BatteryRecords => ({ readings: [], uses: [], sessions: [], ...overrides });
const estimate = (value: BatteryRecords, time: string, drawPercent = 8) => estimateChargePercent(value, { at: at(time), drawPercent, socOf });

describe('estimateChargePercent', () => {
  it('is null when nothing says, and the latest reading as of the moment asked', () => {
    expect(estimate(records({}), '12:00')).toBeNull();
    const read = records({ readings: [reading('09:00', 12.65), reading('11:00', 12.3)] });
    expect(estimate(read, '10:00')).toBe(100);
    // REFERENCES §1 (derived, BCI): 12.30 V → 57.1 %.
    expect(estimate(read, '12:00')).toBe(57.1);
  });

  it('takes one match draw for each use ended since the reading, never below 0', () => {
    const value = records({
      readings: [reading('09:00', 12.65)],
      uses: [use('u1', '09:30', '09:45'), use('u2', '10:30', '10:45'), use('u3', '11:30', null)],
    });
    expect(estimate(value, '10:00')).toBe(92);
    // The open use has not drawn its match yet.
    expect(estimate(value, '12:00')).toBe(84);
    expect(estimate(value, '12:00', 60)).toBe(0);
  });

  it('a reading after a use replaces the estimate; a use splits readings at its middle', () => {
    const value = records({ readings: [reading('09:00', 12.65), reading('09:40', 12.45, 'u1')], uses: [use('u1', '09:30', '09:45')] });
    // 09:40 is after the use's middle (09:37:30): the match was drawn before it, and it stands.
    expect(estimate(value, '10:00')).toBe(75);
    // 09:32 is before the middle: the match is drawn after it (75 % − 8).
    const early = records({ readings: [reading('09:00', 12.65), reading('09:32', 12.45, 'u1')], uses: [use('u1', '09:30', '09:45')] });
    expect(estimate(early, '10:00')).toBe(67);
  });

  it('full after a charge that ran its course; in proportion when cut short; empty-start when never read', () => {
    const full = records({ readings: [reading('09:00', 12.24)], sessions: [session('09:10', '11:20', '11:10')] });
    expect(estimate(full, '11:00')).toBe(50);
    expect(estimate(full, '11:30')).toBe(100);
    // Half of the expected 120 min: from 50 % halfway to full.
    const cut = records({ readings: [reading('09:00', 12.24)], sessions: [session('09:00', '10:00', '11:00')] });
    expect(estimate(cut, '10:30')).toBe(75);
    expect(estimate(records({ sessions: [session('09:00', '10:00', '11:00')] }), '10:30')).toBe(50);
    expect(estimate(records({ sessions: [session('09:00', '10:00', null)] }), '10:30')).toBe(100);
    // An open session changes nothing yet: the plan reads when it ends.
    expect(estimate(records({ readings: [reading('09:00', 12.24)], sessions: [session('09:10', null, '11:10')] }), '12:00')).toBe(50);
  });

  it('a reading taken as a charge ends wins over it', () => {
    const value = records({ readings: [reading('09:00', 12.24), reading('11:00', 12.45)], sessions: [session('09:10', '11:00', '10:50')] });
    expect(estimate(value, '11:30')).toBe(75);
  });
});

describe('useDrops and drawPercentOf', () => {
  const matchWith = (id: string, installed: string, removed: string) => use(id, installed, removed);

  it('measures each ended use from its last reading before to its first after, within an hour or tied to it', () => {
    const value = {
      readings: [
        reading('07:00', 12.65), // too early to stand for u1
        reading('08:55', 12.62),
        reading('09:20', 12.55),
        reading('10:50', 12.6, 'u2'),
        reading('11:30', 12.5, 'u2'),
        reading('13:30', 12.6), // more than an hour after u3 came out
      ],
      uses: [matchWith('u1', '09:00', '09:10'), matchWith('u2', '11:00', '11:10'), matchWith('u3', '12:00', '12:10'), use('u4', '14:00', null)],
    };
    const drops = useDrops(value, socOf);
    expect(drops).toHaveLength(2);
    expect(drops[0]).toBeCloseTo(socOf(12.62) - socOf(12.55), 6);
    expect(drops[1]).toBeCloseTo(socOf(12.6) - socOf(12.5), 6);
  });

  it('uses the Peukert model until 3 uses are measured, then their median (REFERENCES §3: 150 s at 20 A on 18 Ah → about 6.3 %)', () => {
    const modelled = modelledMatchDrawPercent(18, 150, BATTERY_DEFAULTS);
    expect(modelled).toBeCloseTo(6.3, 1);
    expect(drawPercentOf([9, 7], [18, 18, 17], 150, BATTERY_DEFAULTS)).toEqual({ percent: modelled, learned: false });
    expect(drawPercentOf([9, 7, 8.5], [18], 150, BATTERY_DEFAULTS)).toEqual({ percent: 8.5, learned: true });
    expect(drawPercentOf([], [], 150, BATTERY_DEFAULTS).percent).toBe(modelled);
    expect(drawPercentOf([-3, -2, -1], [18], 150, BATTERY_DEFAULTS)).toEqual({ percent: 0, learned: true });
  });
});
