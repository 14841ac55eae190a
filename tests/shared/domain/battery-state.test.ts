import { describe, expect, it } from 'vitest';
import {
  BATTERY_DEFAULTS,
  healthOf,
  isReliableRest,
  matchDrawPercent,
  modelledMatchDrawPercent,
  peukertCapacityAh,
  peukertRunHours,
  rechargeMinutes,
  SOC_TABLE_ARMY,
  SOC_TABLE_BCI,
  stateOfChargePercent,
} from '../../../shared/domain/battery-state';

// Every expected value below comes from REFERENCES.md; the tag after each source says how
// (published, derived = arithmetic on a published table or formula, memory, common practice).

/** Linear interpolation recomputed here from two table points, so derived checks are not pasted numbers. */
const between = (v: number, [v0, p0]: [number, number], [v1, p1]: [number, number]) => p0 + ((v - v0) / (v1 - v0)) * (p1 - p0);

describe('state of charge from a resting voltage', () => {
  it('BCI table as quoted in Battery FAQ (Darden), "State of Charge Measurement" (published): every table point', () => {
    const published: [number, number][] = [
      [12.65, 100],
      [12.45, 75],
      [12.24, 50],
      [12.06, 25],
      [11.89, 0],
    ];
    for (const [volts, percent] of published) expect(stateOfChargePercent(volts, SOC_TABLE_BCI)).toBeCloseTo(percent, 6);
  });

  it('BCI table, derived points (REFERENCES §1): interpolation between table points, clamped to 0–100 %', () => {
    expect(stateOfChargePercent(11.8)).toBe(0);
    expect(stateOfChargePercent(12.0)).toBeCloseTo(between(12.0, [11.89, 0], [12.06, 25]), 6);
    expect(stateOfChargePercent(12.0)).toBeCloseTo(16.2, 1);
    expect(stateOfChargePercent(12.1)).toBeCloseTo(between(12.1, [12.06, 25], [12.24, 50]), 6);
    expect(stateOfChargePercent(12.1)).toBeCloseTo(30.6, 1);
    expect(stateOfChargePercent(12.3)).toBeCloseTo(57.1, 1);
    expect(stateOfChargePercent(12.5)).toBeCloseTo(between(12.5, [12.45, 75], [12.65, 100]), 6);
    expect(stateOfChargePercent(12.5)).toBeCloseTo(81.3, 1);
    expect(stateOfChargePercent(12.7)).toBe(100);
  });

  it('a full sealed AGM battery reads 12.8–13.0 V after rest (US Army TM 9-6115-730-24 WP 0050, published): clamped at 100 %', () => {
    expect(stateOfChargePercent(12.8)).toBe(100);
    expect(stateOfChargePercent(13.0)).toBe(100);
  });

  it('US Army TM 5-3805-262-20 §5-9 table (published), and its derived points', () => {
    const published: [number, number][] = [
      [12.6, 100],
      [12.4, 75],
      [12.2, 50],
      [12.0, 25],
      [11.7, 0],
    ];
    for (const [volts, percent] of published) expect(stateOfChargePercent(volts, SOC_TABLE_ARMY)).toBeCloseTo(percent, 6);
    expect(stateOfChargePercent(11.5, SOC_TABLE_ARMY)).toBe(0);
    expect(stateOfChargePercent(12.3, SOC_TABLE_ARMY)).toBeCloseTo(62.5, 6);
    expect(stateOfChargePercent(12.5, SOC_TABLE_ARMY)).toBeCloseTo(87.5, 6);
  });

  it('Battery University BU-903 (published): a voltage is reliable after at least 4 h of rest', () => {
    expect(isReliableRest(false, null)).toBe(false);
    expect(isReliableRest(true, 239)).toBe(false);
    expect(isReliableRest(true, 240)).toBe(true);
    // Rested, with no minutes given: the person at the battery vouched for it.
    expect(isReliableRest(true, null)).toBe(true);
  });
});

describe('health from internal resistance against the battery’s own baseline', () => {
  // Baseline = the battery's own early readings (IEEE 1188 practice, tech note "Ohmic Measurements
  // and IEEE Standard 1188-2005", published secondary); here the median of the first three.
  const settings = { ...BATTERY_DEFAULTS, replaceAboveMilliohm: null };

  it('watch at +20 % (REFERENCES §2: memory/weak) and replace at +50 % (same tech note: "50 % or more deviation", published secondary)', () => {
    const base = [12, 12, 12];
    expect(healthOf([...base, 14.3], settings)).toEqual({ status: 'good', baselineMilliohm: 12, increasePercent: 19.2 });
    expect(healthOf([...base, 14.4], settings)).toEqual({ status: 'watch', baselineMilliohm: 12, increasePercent: 20 });
    expect(healthOf([...base, 17.9], settings)).toEqual({ status: 'watch', baselineMilliohm: 12, increasePercent: 49.2 });
    expect(healthOf([...base, 18], settings)).toEqual({ status: 'replace', baselineMilliohm: 12, increasePercent: 50 });
  });

  it('the baseline is the median of the first readings, so one bad probe placement does not set it', () => {
    expect(healthOf([11, 30, 12, 13], settings).baselineMilliohm).toBe(12);
    expect(healthOf([11, 30, 12, 13], settings).status).toBe('good');
  });

  it('a single reading is its own baseline; no readings: good, nothing known', () => {
    expect(healthOf([15], settings)).toEqual({ status: 'good', baselineMilliohm: 15, increasePercent: 0 });
    expect(healthOf([], settings)).toEqual({ status: 'good', baselineMilliohm: null, increasePercent: null });
  });

  it('above the absolute limit (REFERENCES §2, common practice: teams pull batteries above ~25 mΩ) it is replace, whatever the baseline', () => {
    expect(healthOf([24, 24, 24, 25.5]).status).toBe('replace');
    expect(healthOf([24, 24, 24, 25]).status).toBe('good');
  });

  it('the thresholds are the team’s', () => {
    expect(healthOf([10, 10, 10, 11.5], { ...settings, watchIncreasePercent: 10, replaceIncreasePercent: 30 }).status).toBe('watch');
  });
});

describe("Peukert's law (Wikipedia, \"Peukert's law\", published form)", () => {
  it('identity: at the rated current C/H every exponent gives the rated capacity (18 Ah, 20 h, 0.9 A)', () => {
    for (const k of [1, 1.05, 1.1, 1.2, 1.6]) expect(peukertCapacityAh(18, 0.9, k)).toBeCloseTo(18, 9);
    expect(peukertRunHours(18, 0.9, 1.3)).toBeCloseTo(20, 9);
  });

  it('worked example: 100 Ah at 20 h, k 1.2, 10 A → about 8.71 h (memory; arithmetic derived)', () => {
    expect(peukertRunHours(100, 10, 1.2)).toBeCloseTo(20 * (100 / 200) ** 1.2, 9);
    expect(peukertRunHours(100, 10, 1.2)).toBeCloseTo(8.71, 2);
  });

  it('18 Ah at 20 h drawn at 20 A: 13.20 Ah at k 1.10 and 9.68 Ah at k 1.20 (derived)', () => {
    expect(peukertCapacityAh(18, 20, 1.1)).toBeCloseTo(13.2, 2);
    expect(peukertCapacityAh(18, 20, 1.2)).toBeCloseTo(9.68, 2);
  });

  it('a 2½-minute match at 20 A takes 0.83 Ah nominal, 1.14 Ah Peukert-equivalent at k 1.10 (derived): 6.3 % of 18 Ah', () => {
    const equivalentAh = (modelledMatchDrawPercent(18, 150) / 100) * 18;
    expect(equivalentAh).toBeCloseTo(((20 * 150) / 3600) * (18 / peukertCapacityAh(18, 20, 1.1)), 9);
    expect(equivalentAh).toBeCloseTo(1.14, 2);
    expect(modelledMatchDrawPercent(18, 150)).toBeCloseTo(6.3, 1);
  });

  it('the learned draw replaces the model once three uses have before and after readings', () => {
    expect(matchDrawPercent([8, 7], 6.3)).toEqual({ percent: 6.3, learned: false });
    expect(matchDrawPercent([8, 7, 12], 6.3)).toEqual({ percent: 8, learned: true });
  });
});

describe('recharge time (REFERENCES §4)', () => {
  // Ah removed × charge factor ÷ charger current (derived from the battery maker's article's formula).
  it('2 Ah removed on a 6 A charger: 20.0 min at factor 1.00, 22.4 min at 1.12, 24.0 min at 1.20 (no tail)', () => {
    expect(rechargeMinutes(2, 6, { chargeFactor: 1, chargeTailMinutes: 0 })).toBeCloseTo(20, 9);
    expect(rechargeMinutes(2, 6, { chargeFactor: 1.12, chargeTailMinutes: 0 })).toBeCloseTo(22.4, 9);
    expect(rechargeMinutes(2, 6, { chargeFactor: 1.2, chargeTailMinutes: 0 })).toBeCloseTo(24, 9);
  });

  it('the absorption tail (common practice, default 20 min) is added; nothing removed, nothing to charge', () => {
    expect(rechargeMinutes(2, 6)).toBeCloseTo(42.4, 9);
    expect(rechargeMinutes(0, 6)).toBe(0);
  });
});
