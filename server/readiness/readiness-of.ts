import type { Transaction } from 'sequelize';
import { computeReadiness, type ReadinessFacts, type ReadinessJson } from '../../shared/domain/readiness';
import { computeTimeline } from '../../shared/domain/timeline';
import { HttpError, notFound } from '../errors';
import { ChecklistRun, type Event } from '../models';
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
  const facts: ReadinessFacts = {
    match: { id: matchId, alliance: row.alliance, queueAt },
    preMatchRuns: runs.filter((run) => run.phase === 'pre_match'),
  };
  return computeReadiness(facts, now);
}
