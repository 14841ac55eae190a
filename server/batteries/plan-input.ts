import type { Transaction } from 'sequelize';
import type { PlanBattery, PlanBay, PlanInput } from '../../shared/domain/battery-plan';
import { computeTimeline } from '../../shared/domain/timeline';
import { Battery, Charger, type Event } from '../models';
import { healthOfReadings } from '../presenters/battery';
import { timelineSettingsOf } from '../presenters/event';
import { presentSchedule } from '../presenters/match';
import { chargeOf, fleetDraw } from './fleet-charge';
import { fleetRecords } from './fleet-records';
import { settingsOf } from './settings';

/** Every bay of the team's chargers, numbered 1… across them in the order they were added. */
export function baysOf(chargers: readonly Charger[]): PlanBay[] {
  let next = 1;
  return chargers.flatMap((charger) =>
    Array.from({ length: charger.bays }, (_, index) => ({
      bay: next++,
      chargerId: charger.id,
      label: `${charger.name} · bay ${index + 1}`,
      currentA: charger.currentPerBayA,
    })),
  );
}

/** The plan's number of a charger's bay (1-based within the charger). */
function planBayOf(bays: readonly PlanBay[], chargerId: string, bay: number): number | null {
  const first = bays.find((candidate) => candidate.chargerId === chargerId);
  return first ? first.bay + bay - 1 : null;
}

/**
 * What the rotation plan reads for an event at `now`: our remaining matches from the timeline,
 * every battery of the team (retired ones too: the plan may suggest bringing one back) with its
 * estimated charge, health and what it is doing, the bays, and the team's settings.
 */
export async function buildPlanInput(event: Event, now: Date, transaction?: Transaction): Promise<PlanInput> {
  const teamId = event.teamId;
  const settings = await settingsOf(teamId, transaction);
  const timeline = computeTimeline(await presentSchedule(event.id, transaction), timelineSettingsOf(event), now);
  const batteries = await Battery.findAll({ where: { teamId }, order: [['label', 'ASC'], ['id', 'ASC']], transaction });
  const chargers = await Charger.findAll({ where: { teamId }, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction });
  const records = await fleetRecords(
    batteries.map((battery) => battery.id),
    transaction,
  );
  const bays = baysOf(chargers);
  const draw = fleetDraw({ batteries, records, event, settings });

  const planBatteries = batteries.map((battery): PlanBattery => {
    const open = records.sessionsOf(battery.id).find((session) => session.endedAt === null);
    const inRobot = records.usesOf(battery.id).find((use) => use.removedAt === null);
    return {
      id: battery.id,
      label: battery.label,
      status: battery.status,
      health: healthOfReadings(records.readingsOf(battery.id), settings).status,
      ratedAh: battery.nominalCapacityAh,
      stateOfChargePercent: chargeOf(battery, records, { at: now, drawPercent: draw.percent, settings }),
      chargingUntil: open?.expectedEndAt ? open.expectedEndAt.toISOString() : null,
      chargingBay: open ? planBayOf(bays, open.chargerId, open.bay) : null,
      installedForMatchId: inRobot?.matchId ?? null,
      usesThisEvent: records.usesOf(battery.id).filter((use) => use.eventId === event.id).length,
    };
  });

  return {
    now: now.toISOString(),
    batteries: planBatteries,
    bays,
    matches: timeline.ourMatches.map(({ matchId, queueAt, projectedStart }) => ({ matchId, queueAt, projectedStart })),
    outOfRobotAfterMinutes: event.matchLengthSeconds / 60 + event.returnToPitMinutes,
    drawPercent: draw.percent,
    minimumStartChargePercent: settings.minimumStartChargePercent,
    chargeFactor: settings.chargeFactor,
    chargeTailMinutes: settings.chargeTailMinutes,
  };
}
