/**
 * The battery rotation plan (DESIGN §4.3): for our remaining matches, which battery goes into
 * which match and when each charges on which bay, with warnings where no battery will be ready.
 * Pure and deterministic: equal input, equal output (ties broken by label, then id).
 */
import type { BatteryStatus, HealthStatus } from './battery-state';

export interface PlanBattery {
  id: string;
  label: string;
  status: BatteryStatus;
  health: HealthStatus;
  ratedAh: number;
  /** Best estimate of its charge now (latest reading, less any match since); null when never read (taken as full after a charge, else as empty). */
  stateOfChargePercent: number | null;
  /** While on a charger: when the charge ends (the bay is busy until then). */
  chargingUntil: string | null;
  /** The bay it is charging on, when charging. */
  chargingBay: number | null;
  /** In the robot for this match (an open use), if any. */
  installedForMatchId: string | null;
  /** Matches it went into at this event, for spreading use across the fleet. */
  usesThisEvent: number;
}

export interface PlanBay {
  /** 1-based, across the team's chargers in order. */
  bay: number;
  chargerId: string;
  /** "Bench charger · bay 2": how the pit names it. */
  label: string;
  currentA: number;
}

export interface PlanMatch {
  matchId: string;
  /** When the battery must be in the robot and ready. */
  queueAt: string;
  projectedStart: string;
}

export interface PlanInput {
  now: string;
  batteries: readonly PlanBattery[];
  bays: readonly PlanBay[];
  /** Our remaining matches, from the timeline. */
  matches: readonly PlanMatch[];
  /** Minutes from a match's projected start until its battery is out of the robot (match length + return to the pit). */
  outOfRobotAfterMinutes: number;
  /** Charge one match takes, in percent of rated capacity. */
  drawPercent: number;
  minimumStartChargePercent: number;
  chargeFactor: number;
  chargeTailMinutes: number;
}

export interface PlanAssignment {
  matchId: string;
  batteryId: string;
  /** Its expected charge at the queue call. */
  expectedChargePercent: number;
}

export interface PlanCharging {
  batteryId: string;
  bay: number;
  from: string;
  to: string;
}

export type PlanWarningCode = 'no_battery_ready' | 'reused_previous' | 'only_worn_battery';

export interface PlanWarning {
  matchId: string;
  code: PlanWarningCode;
  /** Minutes after the queue call until a battery would be ready; 0 when a battery is assigned anyway. */
  shortfallMinutes: number;
  /** What happened and what would fix it (another bay, a battery back from retirement). */
  message: string;
}

export interface BatteryPlanJson {
  assignments: PlanAssignment[];
  charging: PlanCharging[];
  warnings: PlanWarning[];
}

/** See the file comment; the rules are listed in DEVELOPERS.md ("Rotation plan"). */
export function planBatteries(input: PlanInput): BatteryPlanJson {
  void input;
  throw new Error('not built yet');
}
