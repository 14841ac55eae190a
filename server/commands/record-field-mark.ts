import type { FieldProgressInput } from '../../shared/schemas/schedule';
import { inTransaction } from '../db/transaction';
import { notFound } from '../errors';
import { Event, FieldMark, Match } from '../models';
import { presentMatchWithStart } from '../presenters/match';
import { emitToEvent } from '../realtime/broadcast';
import { assertInstant } from './input-guards';
import { startPreMatchRuns } from './start-pre-match-runs';

/**
 * Records that a match of the event went on the field (now, unless `startedAt` says when), and who
 * said so. When it is one of ours, the pre-match checks of our next match start with it.
 */
export async function recordFieldMark(teamId: string, eventId: string, userId: string, { matchId, startedAt }: FieldProgressInput) {
  return inTransaction(async (transaction) => {
    // The event's row lock puts marks and undos of one event in one order.
    const event = await Event.ofTeam(teamId, eventId, { transaction, lock: true });
    const match = await Match.findOne({ where: { id: matchId, eventId: event.id }, transaction });
    if (!match) throw notFound('Match');
    const at = startedAt ? new Date(startedAt) : new Date();
    // A start in the future (a typo, or a late tap read on the wrong day) would skew every projection.
    assertInstant('startedAt', at);
    await FieldMark.create(
      { eventId: event.id, matchId: match.id, startedAt: at, markedById: userId },
      { transaction },
    );
    await startPreMatchRuns(event, match.id, userId, transaction);
    transaction.afterCommit(() => emitToEvent(event.id, 'field:progressed', { eventId: event.id, matchId: match.id }));
    return presentMatchWithStart(match, transaction);
  });
}
