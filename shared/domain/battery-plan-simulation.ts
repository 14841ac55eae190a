/**
 * The rotation plan's simulation (see battery-plan.ts for the rules): batteries move between the
 * robot, the charge queue and the bays as the clock moves from one queue call to the next.
 */
import { rechargeMinutes, type HealthStatus } from './battery-state';
import type { PlanBattery, PlanBay, PlanCharging, PlanInput } from './battery-plan';

export const MINUTE_MS = 60_000;
const HEALTH_RANK: Record<HealthStatus, number> = { good: 0, watch: 1, replace: 2 };

/** Code-point order: the same on every machine, unlike localeCompare. */
export const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
export const instant = (iso: string) => Date.parse(iso);
export const iso = (ms: number) => new Date(ms).toISOString();
const clampPercent = (value: number) => Math.min(100, Math.max(0, value));

/** One battery as the simulation moves it along. */
export interface Sim {
  battery: PlanBattery;
  /** Its place in label-then-id order: the last tie-break everywhere. */
  order: number;
  state: 'free' | 'robot' | 'charging';
  /** End of its robot time or of its charge. */
  until: number;
  /** Percent; the charge it goes into a match with, or comes out with. */
  charge: number;
  /** When it joined the charge queue; null when not waiting for a bay. */
  queuedSince: number | null;
  uses: number;
  keptFor: string | null;
}

interface Bay {
  bay: PlanBay;
  freeAt: number;
}

interface World {
  sims: Sim[];
  bays: Bay[];
  charging: PlanCharging[];
}

type ChargeSettings = Pick<PlanInput, 'chargeFactor' | 'chargeTailMinutes'>;

const queuedBefore = (a: Sim, b: Sim) =>
  (a.queuedSince as number) - (b.queuedSince as number) || a.charge - b.charge || a.order - b.order;

/** Moves the world to time t: batteries out of the robot join the queue, bays take the queue in turn, finished charges end full. */
export function advance(world: World, t: number, settings: ChargeSettings): void {
  for (const sim of world.sims) {
    if (sim.state === 'robot' && sim.until <= t) {
      sim.state = 'free';
      sim.queuedSince = sim.until;
    }
  }
  for (;;) {
    let next: Sim | null = null;
    for (const sim of world.sims) if (sim.queuedSince !== null && (next === null || queuedBefore(sim, next) < 0)) next = sim;
    if (next === null) break;
    let slot: Bay | null = null;
    let start = Infinity;
    // Bays are in number order, so a strict comparison keeps the lowest number on a tie.
    for (const bay of world.bays) {
      const from = Math.max(bay.freeAt, next.queuedSince as number);
      if (from < start) [slot, start] = [bay, from];
    }
    if (slot === null || start > t) break;
    const minutes = rechargeMinutes(((100 - next.charge) / 100) * next.battery.ratedAh, slot.bay.currentA, settings);
    // Whole milliseconds, rounded up: an instant must not end before the charge does.
    const end = start + Math.ceil(minutes * MINUTE_MS);
    next.queuedSince = null;
    if (end === start) continue;
    next.state = 'charging';
    next.until = slot.freeAt = end;
    world.charging.push({ batteryId: next.battery.id, bay: slot.bay.bay, from: iso(start), to: iso(end) });
  }
  for (const sim of world.sims) {
    if (sim.state === 'charging' && sim.until <= t) {
      sim.state = 'free';
      sim.charge = 100;
    }
  }
}

export const qualifies = (sim: Sim, minimum: number) =>
  sim.state === 'free' && sim.keptFor === null && sim.battery.status !== 'retired' && sim.charge >= minimum;

const better = (a: Sim, b: Sim) =>
  a.uses - b.uses || HEALTH_RANK[a.battery.health] - HEALTH_RANK[b.battery.health] || b.charge - a.charge || a.order - b.order;

/** The pick among batteries that qualify, and why it needs a warning. */
export function choose(ready: readonly Sim[], previous: Sim | null): { sim: Sim; reused: boolean; worn: boolean } {
  const others = ready.filter((sim) => sim !== previous);
  const pool = others.length > 0 ? others : ready;
  const healthy = pool.filter((sim) => sim.battery.health !== 'replace');
  const sim = (healthy.length > 0 ? healthy : pool).reduce((best, sim) => (better(sim, best) < 0 ? sim : best));
  return { sim, reused: others.length === 0, worn: healthy.length === 0 };
}

/** If the pit waited from t: the first moment a battery would qualify, and which; null when none ever would. */
export function firstReady(world: World, t: number, minimum: number, settings: ChargeSettings): { at: number; sim: Sim } | null {
  const copy: World = { sims: world.sims.map((sim) => ({ ...sim })), bays: world.bays.map((bay) => ({ ...bay })), charging: [] };
  for (;;) {
    // Something changes only when a battery leaves the robot or a charge ends (which frees a bay).
    let next = Infinity;
    for (const sim of copy.sims) if (sim.state !== 'free' && sim.until > t && sim.until < next) next = sim.until;
    if (next === Infinity) return null;
    t = next;
    advance(copy, t, settings);
    const ready = copy.sims.filter((sim) => qualifies(sim, minimum));
    if (ready.length > 0) return { at: t, sim: choose(ready, null).sim };
  }
}

/** The world at `now`: charges under way, the queue for the bays, batteries in the robot and those kept for a match. */
export function setUp(input: PlanInput, planned: ReadonlySet<string>, now: number): { world: World; previous: Sim | null } {
  const bays = [...input.bays]
    .filter((bay) => bay.currentA > 0)
    .sort((a, b) => a.bay - b.bay || byText(a.chargerId, b.chargerId))
    .map((bay) => ({ bay, freeAt: now }));
  const world: World = { sims: [], bays, charging: [] };
  const batteries = [...input.batteries].sort((a, b) => byText(a.label, b.label) || byText(a.id, b.id));
  let previous: Sim | null = null;
  for (const [order, battery] of batteries.entries()) {
    const chargingUntil = battery.chargingUntil === null ? null : instant(battery.chargingUntil);
    const sim: Sim = {
      battery,
      order,
      state: 'free',
      until: now,
      // A finished charge means full; a never-read battery counts as empty.
      charge: chargingUntil !== null ? 100 : clampPercent(battery.stateOfChargePercent ?? 0),
      queuedSince: null,
      uses: battery.usesThisEvent,
      keptFor: null,
    };
    world.sims.push(sim);
    if (chargingUntil !== null && chargingUntil > now) {
      // Retired or not, it holds its bay until the charge ends.
      sim.state = 'charging';
      sim.until = chargingUntil;
      const bay = bays.find((each) => each.bay.bay === battery.chargingBay);
      if (bay) bay.freeAt = Math.max(bay.freeAt, chargingUntil);
      if (battery.chargingBay !== null) world.charging.push({ batteryId: battery.id, bay: battery.chargingBay, from: iso(now), to: iso(chargingUntil) });
      continue;
    }
    if (battery.status === 'retired') continue;
    const installedFor = battery.installedForMatchId;
    const inRobot = installedFor !== null || battery.status === 'in_robot';
    if (installedFor !== null && planned.has(installedFor) && sim.charge >= input.minimumStartChargePercent) {
      if (!world.sims.some((other) => other.keptFor === installedFor)) sim.keptFor = installedFor;
    } else if (inRobot && (installedFor === null || !planned.has(installedFor))) {
      // Its charge is from before that match (an open use takes nothing yet): it comes out with one match less.
      putInRobot(sim, now + input.outOfRobotAfterMinutes * MINUTE_MS, input.drawPercent);
      previous ??= sim;
    } else if (sim.charge < input.minimumStartChargePercent) {
      sim.queuedSince = now;
    }
  }
  return { world, previous };
}

/** Into the robot for a match: out at `outAt` with one match's draw taken, then to the charge queue. */
export function putInRobot(sim: Sim, outAt: number, drawPercent: number): void {
  sim.state = 'robot';
  sim.until = outAt;
  sim.queuedSince = null;
  sim.keptFor = null;
  sim.charge = Math.max(0, sim.charge - drawPercent);
}
