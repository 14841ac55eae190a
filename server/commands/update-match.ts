import { repeatedSeats, type UpdateMatchInput } from '../../shared/schemas/schedule';
import { inTransaction } from '../db/transaction';
import { HttpError, notFound, stale } from '../errors';
import { Event, Match } from '../models';
import { presentMatchWithStart } from '../presenters/match';
import { emitToEvent } from '../realtime/broadcast';
import { assertSlotFree, matchColumns } from './match-columns';

/** Edits one match of a team's event, refusing a stale `version`. */
export async function updateMatch(teamId: string, matchId: string, { version, ...fields }: UpdateMatchInput) {
  return inTransaction(async (transaction) => {
    // Found through its event, so another team's match is simply not found.
    const found = await Match.findOne({ where: { id: matchId }, include: [{ model: Event, as: 'event', where: { teamId }, attributes: [] }], transaction });
    if (!found) throw notFound('Match');
    await Event.ofTeam(teamId, found.eventId, { transaction, lock: true });
    const match = await Match.findByPk(matchId, { transaction, lock: transaction.LOCK.UPDATE, rejectOnEmpty: true });
    if (version !== undefined && version !== match.version) throw stale(await presentMatchWithStart(match, transaction));
    match.set(matchColumns(fields));
    // The body may carry one alliance only: the check must see the stored other one too.
    if (repeatedSeats({ red: [match.red1, match.red2, match.red3], blue: [match.blue1, match.blue2, match.blue3] }).length > 0) {
      const field = fields.red ? 'red' : 'blue';
      throw new HttpError(400, 'invalid', `Check these fields: ${field}`, { fields: { [field]: 'A team can only be in one seat of a match' } });
    }
    if (match.changed('level') || match.changed('number')) await assertSlotFree(match.eventId, match.level, match.number, match.id, transaction);
    if (match.changed()) {
      await match.save({ transaction });
      transaction.afterCommit(() => emitToEvent(match.eventId, 'matches:updated', { eventId: match.eventId, id: match.id }));
    }
    return presentMatchWithStart(match, transaction);
  });
}
