import type { CreateEventInput } from '../../shared/schemas/events';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Event, Team } from '../models';
import { emitToTeam, moveTeamToEvent } from '../realtime/broadcast';

/**
 * Creates an event for a team; the team's first event, or one asked for as current, becomes
 * the current one. Resending the same `id` returns the event the first call made.
 */
export async function createEvent(teamId: string, { id, current, ...fields }: CreateEventInput) {
  return inTransaction(async (transaction) => {
    const team = await Team.lockRow(teamId, transaction);
    if (id) {
      const existing = await Event.findByPk(id, { transaction });
      if (existing?.teamId === teamId) return { event: existing, team, created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const event = await Event.create({ id, teamId, ...fields }, { transaction });
    const previousEventId = team.currentEventId;
    if (current || !previousEventId) {
      await team.update({ currentEventId: event.id }, { transaction });
      transaction.afterCommit(() => moveTeamToEvent(teamId, previousEventId, event.id));
    }
    transaction.afterCommit(() => emitToTeam(teamId, 'events:updated', { id: event.id }, { withScreens: true }));
    return { event, team, created: true };
  });
}
