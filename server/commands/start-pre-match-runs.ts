import type { Transaction } from 'sequelize';
import { computeTimeline } from '../../shared/domain/timeline';
import { ChecklistTemplate, type Event } from '../models';
import { timelineSettingsOf } from '../presenters/event';
import { presentSchedule } from '../presenters/match';
import { startRun } from './create-run';

/**
 * Field progress reached one of our matches: the pre-match checks for our next match start now,
 * one run per `pre_match` template that has none for that match yet. Runs inside the field
 * mark's transaction, which holds the event's row lock.
 */
export async function startPreMatchRuns(event: Event, markedMatchId: string, userId: string, transaction: Transaction) {
  const schedule = await presentSchedule(event.id, transaction);
  const { matches } = computeTimeline(schedule, timelineSettingsOf(event), new Date());
  const marked = matches.findIndex((match) => match.id === markedMatchId);
  if (marked < 0 || !matches[marked].ours) return;
  // Schedule order; an earlier match of ours left unmarked is not "next" any more.
  const next = matches.slice(marked + 1).find((match) => match.ours && match.startedAt === null);
  if (!next) return;
  const templates = await ChecklistTemplate.findAll({
    where: { teamId: event.teamId, phase: 'pre_match' },
    order: [['name', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  for (const template of templates) await startRun({ event, template, matchId: next.id, userId }, transaction);
}
