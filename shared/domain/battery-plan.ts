/**
 * The battery rotation plan (DESIGN §4.3): for our remaining matches, which battery goes into
 * which match and when each charges on which bay, with warnings where no battery will be ready.
 * Pure and deterministic: equal input, equal output (ties broken by label, then id).
 *
 * The rules (the simulation itself is in battery-plan-simulation.ts):
 * - Matches go in queue order (queue call, projected start, id). A queue call already past is
 *   judged at `now`. A match holds its battery in the robot from the queue call until
 *   projected start + outOfRobotAfterMinutes, and takes drawPercent of its charge.
 * - A battery qualifies at a queue call when it is not retired, not in the robot, not on a
 *   charger (a charge starting at that very moment counts), not kept for another match, and has
 *   at least minimumStartChargePercent. A never-read battery counts as empty; charge does not
 *   drain while a battery waits (no self-discharge).
 * - A battery installed for one of the matches (installedForMatchId) is kept for it and is its
 *   assignment, whatever the other rules prefer, when it is not retired, not charging and has
 *   the minimum now; installed below the minimum, it is taken out and charged like any other.
 *   A battery in the robot for a match that is not in the list (already started) comes out at
 *   now + outOfRobotAfterMinutes at the latest with one match's draw taken (an open use has not
 *   been taken off its estimate yet), and counts as the first match's previous one.
 * - Among those that qualify: never the previous match's battery while another qualifies (else
 *   it goes back in, warning reused_previous); a battery marked for replacement only when
 *   nothing healthier qualifies (warning only_worn_battery); then fewest uses this event
 *   (planned ones included), good before watch, most charge, label, id. A match left without a
 *   battery leaves none to avoid in the next.
 * - Charging: at `now` every battery below the minimum that is not charging or in the robot
 *   joins the charge queue (lowest charge first); a battery joins it when it comes out of a
 *   match. First come first served: the battery that joined earliest goes on the bay where it
 *   can start soonest (ties: lowest bay number), for rechargeMinutes of what it lacks to full,
 *   and ends at 100 %. A battery still waiting for a bay is off the charger, so it may go into a
 *   match if it has the minimum (and then leaves the queue). A battery charging now keeps its bay
 *   until chargingUntil (retired or not), then is full; one whose chargingUntil has passed is
 *   full. After the last match the queue is charged to the end.
 * - When nothing qualifies: no assignment, warning no_battery_ready, shortfallMinutes = whole
 *   minutes (rounded up) from the queue call until the first moment a battery would qualify if
 *   the pit waited, and readyAt = that moment; readyAt null and shortfallMinutes 0 when none
 *   ever would without a change (no bay, every battery retired).
 */
import { advance, byText, choose, firstReady, instant, iso, MINUTE_MS, putInRobot, qualifies, setUp, type Sim } from './battery-plan-simulation';
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
  /** no_battery_ready only: when the first battery would qualify; null when none would without a change. */
  readyAt?: string | null;
}

export interface BatteryPlanJson {
  assignments: PlanAssignment[];
  charging: PlanCharging[];
  warnings: PlanWarning[];
}

interface Match {
  match: PlanMatch;
  queueAt: number;
  start: number;
  callAt: number;
  outAt: number;
}

const listOf = (words: readonly string[]) => (words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}`);

/** Why no battery is ready and what would help, in the pit's words. */
function shortageMessage(input: PlanInput, ready: { at: number; sim: Sim } | null, shortfall: number, retired: readonly string[]): string {
  const minimum = `${input.minimumStartChargePercent} %`;
  const what =
    ready === null
      ? `No battery will reach ${minimum} for this match as things stand.`
      : `No battery has ${minimum} at the queue call; the first to get there, ${ready.sim.battery.label}, is ${shortfall} min late.`;
  const currents = [...new Set(input.bays.map((bay) => bay.currentA))].sort((a, b) => a - b);
  const helps = [
    input.bays.length === 0 ? 'a charger bay (there is none)' : 'another charger bay',
    ...(currents.length > 0 ? [`more than ${currents.length === 1 ? currents[0] : `${currents[0]}–${currents[currents.length - 1]}`} A per bay`] : []),
    retired.length > 0 ? `bringing back a retired battery (${retired.join(', ')})` : 'another battery',
  ];
  return `${what} Would help: ${listOf(helps)}.`;
}

const reusedMessage = (sim: Sim) =>
  `No other battery is ready, so ${sim.battery.label} goes straight back in after the previous match.`;
const wornMessage = (sim: Sim) =>
  `${sim.battery.label} is due for replacement, but no healthier battery is ready for this match.`;

/** See the rules in the file comment; DEVELOPERS.md ("Rotation plan") gives the reasons. */
export function planBatteries(input: PlanInput): BatteryPlanJson {
  const now = instant(input.now);
  const outMs = input.outOfRobotAfterMinutes * MINUTE_MS;
  const matches: Match[] = input.matches
    .map((match) => {
      const queueAt = instant(match.queueAt);
      const callAt = Math.max(queueAt, now);
      return { match, queueAt, callAt, outAt: Math.max(instant(match.projectedStart), callAt) + outMs, start: instant(match.projectedStart) };
    })
    .sort((a, b) => a.queueAt - b.queueAt || a.start - b.start || byText(a.match.matchId, b.match.matchId));
  const { world, previous: inRobot } = setUp(input, new Set(matches.map(({ match }) => match.matchId)), now);
  const minimum = input.minimumStartChargePercent;
  const retired = world.sims.filter((sim) => sim.battery.status === 'retired').map((sim) => sim.battery.label);
  const assignments: PlanAssignment[] = [];
  const warnings: PlanWarning[] = [];
  let previous = inRobot;

  for (const { match, queueAt, callAt, outAt } of matches) {
    advance(world, callAt, input);
    const matchId = match.matchId;
    // A battery installed for this match is its assignment; otherwise the best that qualifies.
    let sim = world.sims.find((each) => each.keptFor === matchId);
    if (sim === undefined) {
      const ready = world.sims.filter((each) => qualifies(each, minimum));
      if (ready.length === 0) {
        const first = firstReady(world, callAt, minimum, input);
        const shortfall = first === null ? 0 : Math.ceil((first.at - queueAt) / MINUTE_MS);
        const message = shortageMessage(input, first, shortfall, retired);
        warnings.push({ matchId, code: 'no_battery_ready', shortfallMinutes: shortfall, message, readyAt: first === null ? null : iso(first.at) });
        previous = null;
        continue;
      }
      const choice = choose(ready, previous);
      sim = choice.sim;
      if (choice.reused) warnings.push({ matchId, code: 'reused_previous', shortfallMinutes: 0, message: reusedMessage(sim) });
      if (choice.worn) warnings.push({ matchId, code: 'only_worn_battery', shortfallMinutes: 0, message: wornMessage(sim) });
    }
    assignments.push({ matchId, batteryId: sim.battery.id, expectedChargePercent: Math.round(sim.charge * 10) / 10 });
    putInRobot(sim, outAt, input.drawPercent);
    sim.uses += 1;
    previous = sim;
  }
  advance(world, Infinity, input);
  const charging = world.charging.sort((a, b) => byText(a.from, b.from) || a.bay - b.bay || byText(a.batteryId, b.batteryId));
  return { assignments, charging, warnings };
}
