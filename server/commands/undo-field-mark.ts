import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Event, FieldMark, Match } from '../models';
import { presentMatchWithStart } from '../presenters/match';
import { emitToEvent } from '../realtime/broadcast';

/**
 * Takes back the event's latest field mark not yet undone (a tap on the wrong match), keeping
 * the row with who undid it. Repeated, it walks back through earlier marks.
 */
export async function undoFieldMark(teamId: string, eventId: string, userId: string) {
  return inTransaction(async (transaction) => {
    const event = await Event.ofTeam(teamId, eventId, { transaction, lock: true });
    const mark = await FieldMark.findOne({
      where: { eventId: event.id, undoneAt: null },
      order: [['createdAt', 'DESC'], ['id', 'DESC']],
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!mark) throw new HttpError(404, 'nothing_to_undo', 'No field mark to undo');
    await mark.update({ undoneAt: new Date(), undoneById: userId }, { transaction });
    const match = await Match.findByPk(mark.matchId, { transaction, rejectOnEmpty: true });
    transaction.afterCommit(() => emitToEvent(event.id, 'field:progressed', { eventId: event.id, matchId: match.id }));
    return presentMatchWithStart(match, transaction);
  });
}
