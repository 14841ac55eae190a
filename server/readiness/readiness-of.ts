import { Op, type Transaction } from 'sequelize';
import { computeReadiness, type ReadinessFacts, type ReadinessJson } from '../../shared/domain/readiness';
import { computeTimeline } from '../../shared/domain/timeline';
import { settingsOf, socIn } from '../batteries/settings';
import { HttpError, notFound } from '../errors';
import { Battery, BatteryReading, BatteryUse, ChecklistRun, type Event } from '../models';
import { presentRuns } from '../presenters/checklist';
import { timelineSettingsOf } from '../presenters/event';
import { presentSchedule } from '../presenters/match';

/**
 * Readiness of one of our matches at `now`: gathers the facts `computeReadiness` reads. The
 * battery and repair areas add their facts here (`battery`, `blockingRepairs`), and no caller
 * changes. 404 for a match not in the event, 400 `not_our_match` for one we do not play in.
 */
export async function readinessOf(event: Event, matchId: string, now: Date, transaction?: Transaction): Promise<ReadinessJson> {
  const schedule = await presentSchedule(event.id, transaction);
  if (!schedule.some((match) => match.id === matchId)) throw notFound('Match');
  const timeline = computeTimeline(schedule, timelineSettingsOf(event), now);
  const row = timeline.matches.find((match) => match.id === matchId)!;
  if (row.alliance === null) throw new HttpError(400, 'not_our_match', 'We do not play in this match');
  // A match already on the field has no queue call ahead; ourMatches lists only those to play.
  const queueAt = timeline.ourMatches.find((match) => match.matchId === matchId)?.queueAt ?? null;
  const runs = await presentRuns(
    await ChecklistRun.findAll({ where: { eventId: event.id, matchId }, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction }),
    transaction,
  );
  const battery = await batteryFactOf(event, matchId, transaction);
  const facts: ReadinessFacts = {
    match: { id: matchId, alliance: row.alliance, queueAt },
    preMatchRuns: runs.filter((run) => run.phase === 'pre_match'),
    ...(battery ? { battery } : {}),
  };
  return computeReadiness(facts, now);
}

/**
 * The battery in the robot for the match (an open use) with the charge of its latest reading, and
 * the team's minimum. Left out for a team with no battery in service: it does not track batteries.
 */
async function batteryFactOf(event: Event, matchId: string, transaction?: Transaction): Promise<ReadinessFacts['battery']> {
  const teamId = event.teamId;
  if ((await Battery.count({ where: { teamId, status: { [Op.ne]: 'retired' } }, transaction })) === 0) return undefined;
  const settings = await settingsOf(teamId, transaction);
  const use = await BatteryUse.findOne({
    where: { matchId, removedAt: null },
    include: [{ model: Battery, as: 'battery', where: { teamId }, attributes: ['label'] }],
    transaction,
  });
  if (!use?.battery) return { installed: null, minimumChargePercent: settings.minimumStartChargePercent };
  const latest = await BatteryReading.findOne({
    where: { batteryId: use.batteryId },
    order: [['takenAt', 'DESC'], ['createdAt', 'DESC'], ['id', 'DESC']],
    transaction,
  });
  return {
    installed: { label: use.battery.label, stateOfChargePercent: latest ? socIn(settings)(latest.voltage) : null },
    minimumChargePercent: settings.minimumStartChargePercent,
  };
}
