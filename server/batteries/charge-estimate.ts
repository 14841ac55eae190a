/**
 * A battery's charge between readings, from its own records: the latest reading, less one match's
 * draw for each use since, and full again after a charge that ran its course (a charge cut short
 * counts in proportion). Pure: the plan and the charging command read the same answer.
 */
import { median } from '../../shared/domain/median';
import { DEFAULT_CAPACITY_AH, matchDrawPercent, modelledMatchDrawPercent, type BatterySettings } from '../../shared/domain/battery-state';

export interface EstimateReading {
  takenAt: Date;
  voltage: number;
  useId: string | null;
}
export interface EstimateUse {
  id: string;
  installedAt: Date;
  removedAt: Date | null;
}
export interface EstimateSession {
  startedAt: Date;
  endedAt: Date | null;
  expectedEndAt: Date | null;
}
export interface BatteryRecords {
  readings: readonly EstimateReading[];
  uses: readonly EstimateUse[];
  sessions: readonly EstimateSession[];
}

/** Percent of charge a resting voltage means, in the team's table. */
export type SocOf = (volts: number) => number;

/** A percent as answers show it: one decimal. */
export const onePlace = (percent: number) => Math.round(percent * 10) / 10;

const MINUTE_MS = 60_000;
/** Readings this close to a use, not tied to another one, count as its before and after. */
export const USE_READING_WINDOW_MINUTES = 60;

// A use drew its match somewhere inside it; its middle splits readings into before and after.
const middleOf = (use: EstimateUse & { removedAt: Date }) => (use.installedAt.getTime() + use.removedAt.getTime()) / 2;
const isEnded = (use: EstimateUse): use is EstimateUse & { removedAt: Date } => use.removedAt !== null;
const clampPercent = (value: number) => Math.min(100, Math.max(0, value));

type Step = { at: number; order: number; apply: (soc: number | null) => number | null };

/**
 * Estimated charge (0–100, one decimal) at `at`, or null when nothing says: no reading and no
 * completed charge. Records after `at` are left out, so an "as of" question has one answer.
 */
export function estimateChargePercent(records: BatteryRecords, { at, drawPercent, socOf }: { at: Date; drawPercent: number; socOf: SocOf }): number | null {
  const steps: Step[] = [];
  // At one instant: a charge ends, then a match is drawn, then a reading (being measured) sets the
  // charge, and only then does a charge start from it.
  for (const reading of records.readings) steps.push({ at: reading.takenAt.getTime(), order: 2, apply: () => socOf(reading.voltage) });
  for (const use of records.uses.filter(isEnded)) {
    steps.push({ at: middleOf(use), order: 1, apply: (soc) => (soc === null ? null : soc - drawPercent) });
  }
  for (const session of records.sessions) {
    const started = session.startedAt.getTime();
    // Off again the moment it went on: nothing was charged.
    if (session.endedAt === null || session.endedAt.getTime() <= started) continue;
    const ended = session.endedAt.getTime();
    const span = session.expectedEndAt === null ? 0 : session.expectedEndAt.getTime() - started;
    const share = span <= 0 ? 1 : Math.min(1, (ended - started) / span);
    let atStart: number | null = null;
    const remember = (soc: number | null) => {
      atStart = soc;
      return soc;
    };
    steps.push({ at: started, order: 3, apply: remember });
    steps.push({ at: ended, order: 0, apply: () => (atStart ?? 0) + (100 - (atStart ?? 0)) * share });
  }
  steps.sort((a, b) => a.at - b.at || a.order - b.order);
  let soc: number | null = null;
  for (const step of steps) {
    if (step.at > at.getTime()) break;
    const next = step.apply(soc);
    soc = next === null ? null : clampPercent(next);
  }
  return soc === null ? null : onePlace(soc);
}

/**
 * The charge each ended use took: its last reading before the middle of the use less its first
 * reading after. A use's readings are those tied to it, and untied ones within the window before
 * its install or after its removal (a reading from the day before may precede an unlogged charge).
 */
export function useDrops({ readings, uses }: Pick<BatteryRecords, 'readings' | 'uses'>, socOf: SocOf): number[] {
  const window = USE_READING_WINDOW_MINUTES * MINUTE_MS;
  const drops: number[] = [];
  for (const use of uses.filter(isEnded)) {
    const installed = use.installedAt.getTime();
    const removed = use.removedAt.getTime();
    const middle = middleOf(use);
    const near = readings.filter((reading) => {
      const at = reading.takenAt.getTime();
      if (reading.useId !== null) return reading.useId === use.id;
      return (at >= installed - window && at <= installed) || (at >= removed && at <= removed + window);
    });
    const before = near.filter((reading) => reading.takenAt.getTime() <= middle).at(-1);
    const after = near.find((reading) => reading.takenAt.getTime() > middle);
    if (before && after) drops.push(socOf(before.voltage) - socOf(after.voltage));
  }
  return drops;
}

/**
 * Charge one match takes (percent of rating): the median measured drop once enough uses have
 * readings before and after, else the Peukert model at the fleet's median capacity.
 */
export function drawPercentOf(drops: readonly number[], capacitiesAh: readonly number[], matchSeconds: number, settings: BatterySettings) {
  const capacity = median(capacitiesAh) ?? DEFAULT_CAPACITY_AH;
  const draw = matchDrawPercent(drops, modelledMatchDrawPercent(capacity, matchSeconds, settings));
  return { percent: Math.max(0, draw.percent), learned: draw.learned };
}
