import type { EventSettingsInput, UpdateEventInput } from '../../shared/schemas/events';
import { inTransaction } from '../db/transaction';
import { HttpError, notFound, stale } from '../errors';
import { Event, Team } from '../models';
import { emitToTeam, moveTeamToEvent } from '../realtime/broadcast';
import { presentEvent } from '../presenters/event';

/** Edits an event (refusing a stale `version`) and, with `current: true`, makes it current. */
export async function updateEvent(teamId: string, eventId: string, { current, version, settings, ...fields }: UpdateEventInput) {
  return inTransaction(async (transaction) => {
    const team = await Team.lockRow(teamId, transaction);
    const event = await Event.findOne({ where: { id: eventId, teamId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!event) throw notFound('Event');
    if (version !== undefined && version !== event.version) throw stale(presentEvent(event, team.currentEventId));
    event.set(fields);
    if (settings) event.set(settingsColumns(settings));
    // The schema compares the two dates only when both are sent; one may be the stored one.
    if (event.endDate < event.startDate) {
      throw new HttpError(400, 'invalid', 'Check these fields: endDate', { fields: { endDate: 'Must not be before the start date' } });
    }
    if (event.changed()) await event.save({ transaction });
    const previousEventId = team.currentEventId;
    if (current && previousEventId !== event.id) {
      await team.update({ currentEventId: event.id }, { transaction });
      transaction.afterCommit(() => moveTeamToEvent(teamId, previousEventId, event.id));
    }
    transaction.afterCommit(() => emitToTeam(teamId, 'events:updated', { id: event.id }, { withScreens: true }));
    return { event, team };
  });
}

// Settings arrive nested as the client shows them; the columns are flat, one queue lead set.
function settingsColumns({ queueLead, ...rest }: EventSettingsInput) {
  const lead = queueLead ? { queueLeadMatches: queueLead.matches ?? null, queueLeadMinutes: queueLead.minutes ?? null } : {};
  return { ...rest, ...lead };
}
