import type { z } from 'zod';
import type { incidentListQuery } from '../../shared/schemas/incidents';
import { Event, Incident, Team } from '../models';

type LogQuery = z.output<typeof incidentListQuery>;

/**
 * The incidents a log or an export shows, newest first: one event's (the team's current one by
 * default, any of the team's by id) or, with `all` or while the team has no current event,
 * every one of the team's, those outside any event included. Answers the event it read.
 */
export async function incidentLog(teamId: string, { eventId, status }: LogQuery) {
  const team = await Team.findByPk(teamId, { rejectOnEmpty: true });
  const wanted = eventId === undefined ? team.currentEventId : eventId === 'all' ? null : eventId;
  const event = wanted ? await Event.ofTeam(teamId, wanted) : null;
  const incidents = await Incident.findAll({
    where: { teamId, ...(event ? { eventId: event.id } : {}), ...(status ? { status } : {}) },
    order: [['occurredAt', 'DESC'], ['createdAt', 'DESC'], ['id', 'ASC']],
  });
  return { incidents, event };
}

/** The time zone of each event the incidents belong to (UTC outside an event), for the export's local times. */
export async function zonesOf(teamId: string, incidents: readonly Incident[]) {
  const ids = [...new Set(incidents.flatMap((incident) => (incident.eventId ? [incident.eventId] : [])))];
  const events = ids.length ? await Event.findAll({ where: { id: ids, teamId }, attributes: ['id', 'timeZone'] }) : [];
  const zones = new Map(events.map((event) => [event.id, event.timeZone]));
  return (eventId: string | null) => (eventId ? (zones.get(eventId) ?? 'UTC') : 'UTC');
}
