import { Op, type Transaction } from 'sequelize';
import { compareUrgency, urgencyOf } from '../../shared/domain/repair-urgency';
import { computeReadiness, type ReadinessFacts, type ReadinessJson } from '../../shared/domain/readiness';
import { computeTimeline, type TimelineJson } from '../../shared/domain/timeline';
import { chargeOf, fleetDraw } from '../batteries/fleet-charge';
import { fleetRecords } from '../batteries/fleet-records';
import { settingsOf } from '../batteries/settings';
import { HttpError, notFound } from '../errors';
import { Battery, BatteryUse, ChecklistRun, Repair, type Event } from '../models';
import { presentRuns } from '../presenters/checklist';
import { timelineSettingsOf } from '../presenters/event';
import { presentSchedule } from '../presenters/match';
import { urgencyTicketOf } from '../repairs/urgency-ticket';

/**
 * Readiness of one of our matches at `now`: gathers the facts `computeReadiness` reads: the
 * match's pre-match runs, the battery in the robot, and the open repairs that block it. 404
 * for a match not in the event, 400 `not_our_match` for one we do not play in.
 */
export async function readinessOf(event: Event, matchId: string, now: Date, transaction?: Transaction): Promise<ReadinessJson> {
  const schedule = await presentSchedule(event.id, transaction);
  if (!schedule.some((match) => match.id === matchId)) throw notFound('Match');
  return readinessOnTimeline(event, computeTimeline(schedule, timelineSettingsOf(event), now), matchId, now, transaction);
}

/** The same, on a timeline the caller already projected at `now` (the pit screen has one in hand). */
export async function readinessOnTimeline(
  event: Event,
  timeline: TimelineJson,
  matchId: string,
  now: Date,
  transaction?: Transaction,
): Promise<ReadinessJson> {
  const row = timeline.matches.find((match) => match.id === matchId);
  if (!row) throw notFound('Match');
  if (row.alliance === null) throw new HttpError(400, 'not_our_match', 'We do not play in this match');
  // A match already on the field has no queue call ahead; ourMatches lists only those to play.
  const queueAt = timeline.ourMatches.find((match) => match.matchId === matchId)?.queueAt ?? null;
  const runs = await presentRuns(
    await ChecklistRun.findAll({ where: { eventId: event.id, matchId }, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction }),
    transaction,
  );
  const battery = await batteryFactOf(event, matchId, now, transaction);
  const facts: ReadinessFacts = {
    match: { id: matchId, alliance: row.alliance, queueAt },
    preMatchRuns: runs.filter((run) => run.phase === 'pre_match'),
    ...(battery ? { battery } : {}),
    blockingRepairs: await blockingRepairsOf(event, queueAt, now, transaction),
  };
  return computeReadiness(facts, now);
}

/**
 * Open tickets of the event that block a match, most urgent first: each is work still to do
 * before the match's queue call, and `late` when it cannot make it (the call has passed, or the
 * work estimated is longer than the minutes left).
 */
async function blockingRepairsOf(event: Event, queueAt: string | null, now: Date, transaction?: Transaction): Promise<ReadinessFacts['blockingRepairs']> {
  const repairs = await Repair.findAll({ where: { eventId: event.id, severity: 'blocks_match', status: { [Op.ne]: 'done' } }, transaction });
  return repairs
    .map((repair) => ({ repair, ticket: urgencyTicketOf(repair) }))
    .sort((a, b) => compareUrgency(a.ticket, b.ticket))
    .map(({ repair, ticket }) => ({ id: repair.id, title: repair.title, late: urgencyOf(ticket, queueAt, now).late }));
}

/**
 * The battery in the robot for the match (an open use) with its estimated charge now (the same
 * estimate the rotation plan reads: its latest reading, less the matches since, full after a
 * finished charge), and the team's minimum. Left out for a team with no battery in service.
 */
async function batteryFactOf(event: Event, matchId: string, now: Date, transaction?: Transaction): Promise<ReadinessFacts['battery']> {
  const teamId = event.teamId;
  const batteries = await Battery.findAll({ where: { teamId }, transaction });
  const inService = batteries.filter((battery) => battery.status !== 'retired');
  if (inService.length === 0) return undefined;
  const settings = await settingsOf(teamId, transaction);
  const use = await BatteryUse.findOne({ where: { matchId, removedAt: null, batteryId: batteries.map((battery) => battery.id) }, transaction });
  const installed = use && batteries.find((battery) => battery.id === use.batteryId);
  if (!installed) return { installed: null, minimumChargePercent: settings.minimumStartChargePercent };
  const records = await fleetRecords(
    batteries.map((battery) => battery.id),
    transaction,
  );
  const { percent: drawPercent } = fleetDraw({ batteries, records, event, settings });
  return {
    installed: { label: installed.label, stateOfChargePercent: chargeOf(installed, records, { at: now, drawPercent, settings }) },
    minimumChargePercent: settings.minimumStartChargePercent,
  };
}
