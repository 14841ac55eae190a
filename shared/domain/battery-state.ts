/**
 * A 12 V lead-acid robot battery's state and health from its readings (DESIGN §4.2). Sources and
 * check values: REFERENCES.md §1–§4; each constant names where it comes from.
 */
import { median } from './median';

/** One point of a resting-voltage → state-of-charge table. */
export interface SocPoint {
  volts: number;
  percent: number;
}

/**
 * Battery Council International table as quoted in Battery FAQ (B. Darden), "State of Charge
 * Measurement": flooded battery at 26.7 °C. The default.
 */
export const SOC_TABLE_BCI: readonly SocPoint[] = [
  { volts: 11.89, percent: 0 },
  { volts: 12.06, percent: 25 },
  { volts: 12.24, percent: 50 },
  { volts: 12.45, percent: 75 },
  { volts: 12.65, percent: 100 },
];

/** US Army TM 5-3805-262-20 §5-9 (voltage test); a team may pick it instead. */
export const SOC_TABLE_ARMY: readonly SocPoint[] = [
  { volts: 11.7, percent: 0 },
  { volts: 12.0, percent: 25 },
  { volts: 12.2, percent: 50 },
  { volts: 12.4, percent: 75 },
  { volts: 12.6, percent: 100 },
];

export const SOC_TABLES = { bci: SOC_TABLE_BCI, army: SOC_TABLE_ARMY } as const;
export type SocTableName = keyof typeof SOC_TABLES;
export const SOC_TABLE_LABELS: Record<SocTableName, string> = {
  bci: 'Battery Council International (default)',
  army: 'US Army TM 5-3805-262-20',
};

/** Battery University BU-903: a voltage means something only after at least 4 h of rest. */
export const RELIABLE_REST_MINUTES = 240;

export const CHEMISTRIES = ['sealed_agm', 'gel', 'flooded'] as const;
export type Chemistry = (typeof CHEMISTRIES)[number];

export const BATTERY_STATUSES = ['ready', 'charging', 'in_robot', 'spent', 'resting', 'retired'] as const;
export type BatteryStatus = (typeof BATTERY_STATUSES)[number];

export const HEALTH_STATUSES = ['good', 'watch', 'replace'] as const;
export type HealthStatus = (typeof HEALTH_STATUSES)[number];

/** The team's battery settings; every default names its source in BATTERY_DEFAULTS. */
export interface BatterySettings {
  socTable: SocTableName;
  /** Health: `watch` at this rise over the baseline (REFERENCES §2, memory/weak: +20 %). */
  watchIncreasePercent: number;
  /** Health: `replace` at this rise over the baseline (REFERENCES §2, IEEE 1188 tech note: +50 %). */
  replaceIncreasePercent: number;
  /** Health: `replace` above this absolute resistance, null for none (REFERENCES §2, common practice: ~25 mΩ). */
  replaceAboveMilliohm: number | null;
  /** How many of a battery's first readings make its baseline (their median). */
  baselineReadings: number;
  /** Rotation plan and readiness: a battery starts a match with at least this charge. */
  minimumStartChargePercent: number;
  /** Ah returned per Ah removed (REFERENCES §4: AGM 1.04–1.12; default 1.12). */
  chargeFactor: number;
  /** The charger's slow absorption tail added to every recharge (REFERENCES §4, common practice: 20 min). */
  chargeTailMinutes: number;
  /** Peukert exponent (REFERENCES §3: sealed AGM 1.10). */
  peukertExponent: number;
  /** Average current drawn during a match, for the draw estimate until enough before/after readings exist. */
  matchAverageCurrentA: number;
}

export const BATTERY_DEFAULTS: BatterySettings = {
  socTable: 'bci',
  watchIncreasePercent: 20,
  replaceIncreasePercent: 50,
  replaceAboveMilliohm: 25,
  baselineReadings: 3,
  minimumStartChargePercent: 90,
  chargeFactor: 1.12,
  chargeTailMinutes: 20,
  peukertExponent: 1.1,
  matchAverageCurrentA: 20,
};

/** Nominal capacity is rated at the 20-hour rate (REFERENCES §3). */
export const RATED_HOURS = 20;
export const DEFAULT_CAPACITY_AH = 18;

/**
 * State of charge (0–100) of a resting voltage by linear interpolation in the table, clamped at
 * both ends (a full sealed AGM battery reads 12.8–13.0 V: still 100 %).
 */
export function stateOfChargePercent(volts: number, table: readonly SocPoint[] = SOC_TABLE_BCI): number {
  const first = table[0];
  const last = table[table.length - 1];
  if (volts <= first.volts) return first.percent;
  if (volts >= last.volts) return last.percent;
  const upper = table.findIndex((point) => point.volts >= volts);
  const low = table[upper - 1];
  const high = table[upper];
  return low.percent + ((volts - low.volts) / (high.volts - low.volts)) * (high.percent - low.percent);
}

/** A reading's voltage is trustworthy after RELIABLE_REST_MINUTES of rest (rested with no minutes given: trusted). */
export function isReliableRest(rested: boolean, restedMinutes: number | null): boolean {
  return rested && (restedMinutes === null || restedMinutes >= RELIABLE_REST_MINUTES);
}

export interface HealthJson {
  status: HealthStatus;
  /** Median of the first `baselineReadings` resistance readings; null without readings. */
  baselineMilliohm: number | null;
  /** Latest reading over the baseline, in percent (one decimal); null without readings. */
  increasePercent: number | null;
}

/** Health from resistance readings in time order (oldest first). No readings: `good`, nulls. */
export function healthOf(resistancesMilliohm: readonly number[], settings: BatterySettings = BATTERY_DEFAULTS): HealthJson {
  if (resistancesMilliohm.length === 0) return { status: 'good', baselineMilliohm: null, increasePercent: null };
  const baseline = median(resistancesMilliohm.slice(0, Math.max(1, settings.baselineReadings))) as number;
  const latest = resistancesMilliohm[resistancesMilliohm.length - 1];
  const increase = baseline > 0 ? ((latest - baseline) / baseline) * 100 : 0;
  const overAbsolute = settings.replaceAboveMilliohm !== null && latest > settings.replaceAboveMilliohm;
  const status: HealthStatus =
    overAbsolute || increase >= settings.replaceIncreasePercent ? 'replace' : increase >= settings.watchIncreasePercent ? 'watch' : 'good';
  return { status, baselineMilliohm: baseline, increasePercent: Math.round(increase * 10) / 10 };
}

/** Peukert (REFERENCES §3): usable capacity in Ah at a steady current. */
export function peukertCapacityAh(ratedAh: number, currentA: number, exponent: number, ratedHours = RATED_HOURS): number {
  return ratedAh * (ratedAh / (currentA * ratedHours)) ** (exponent - 1);
}

/** Peukert (REFERENCES §3): run time in hours at a steady current. */
export function peukertRunHours(ratedAh: number, currentA: number, exponent: number, ratedHours = RATED_HOURS): number {
  return ratedHours * (ratedAh / (currentA * ratedHours)) ** exponent;
}

/**
 * Charge one match takes, in percent of the battery's rated capacity: the Ah drawn at the match's
 * average current, scaled by rated / usable capacity at that current (REFERENCES §3 worked example:
 * 150 s at 20 A on 18 Ah, k 1.10 → 1.14 Ah ≈ 6.3 %).
 */
export function modelledMatchDrawPercent(ratedAh: number, matchSeconds: number, settings: BatterySettings = BATTERY_DEFAULTS): number {
  const current = settings.matchAverageCurrentA;
  const drawnAh = (current * matchSeconds) / 3600;
  const equivalentAh = drawnAh * (ratedAh / peukertCapacityAh(ratedAh, current, settings.peukertExponent));
  return (equivalentAh / ratedAh) * 100;
}

/** Uses with a reliable-enough charge before and after; at least this many → the learned draw is used. */
export const LEARNED_DRAW_MIN_USES = 3;

/** Median charge drop over uses with before and after readings, or the modelled draw with fewer than LEARNED_DRAW_MIN_USES. */
export function matchDrawPercent(drops: readonly number[], modelled: number): { percent: number; learned: boolean } {
  if (drops.length < LEARNED_DRAW_MIN_USES) return { percent: modelled, learned: false };
  return { percent: median(drops) as number, learned: true };
}

/** REFERENCES §4: minutes to put back `ahRemoved` at `currentA`, plus the absorption tail. */
export function rechargeMinutes(ahRemoved: number, currentA: number, settings: Pick<BatterySettings, 'chargeFactor' | 'chargeTailMinutes'> = BATTERY_DEFAULTS): number {
  if (ahRemoved <= 0) return 0;
  return (ahRemoved * settings.chargeFactor * 60) / currentA + settings.chargeTailMinutes;
}
