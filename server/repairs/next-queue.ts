import type { Transaction } from 'sequelize';
import { computeTimeline } from '../../shared/domain/timeline';
import type { NextQueueJson } from '../../shared/schemas/repairs';
import type { Event } from '../models';
import { timelineSettingsOf } from '../presenters/event';
import { presentSchedule } from '../presenters/match';

/**
 * The queue call every open ticket of the event is needed by: that of our next match still to
 * play (its call may have passed while the match waits to start), or null when none is left.
 */
export async function nextQueueOf(event: Event, now: Date, transaction?: Transaction): Promise<NextQueueJson | null> {
  const timeline = computeTimeline(await presentSchedule(event.id, transaction), timelineSettingsOf(event), now);
  const next = timeline.ourMatches[0];
  return next ? { matchId: next.matchId, queueAt: next.queueAt } : null;
}
