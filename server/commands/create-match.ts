import type { CreateMatchInput } from '../../shared/schemas/schedule';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Event, Match } from '../models';
import { presentMatchWithStart } from '../presenters/match';
import { emitToEvent } from '../realtime/broadcast';
import { assertSlotFree, matchColumns } from './match-columns';

/**
 * Adds one match to a team's event. Resending the same `id` returns the match the first call
 * made; an id in use elsewhere answers 409 `id_taken`, a taken level and number 409 `match_exists`.
 */
export async function createMatch(teamId: string, eventId: string, { id, ...fields }: CreateMatchInput) {
  return inTransaction(async (transaction) => {
    const event = await Event.ofTeam(teamId, eventId, { transaction, lock: true });
    if (id) {
      const existing = await Match.findByPk(id, { transaction });
      if (existing?.eventId === event.id) return { match: await presentMatchWithStart(existing, transaction), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    await assertSlotFree(event.id, fields.level, fields.number, null, transaction);
    const match = await Match.create({ id, eventId: event.id, ...matchColumns(fields) }, { transaction });
    transaction.afterCommit(() => emitToEvent(event.id, 'matches:updated', { eventId: event.id, id: match.id }));
    return { match: await presentMatchWithStart(match, transaction), created: true };
  });
}
