import type { TimelineSettings } from '../../shared/domain/timeline';
import type { EventJson, EventSettingsJson } from '../../shared/schemas/events';
import type { Event } from '../models';

/** The event's timeline settings (what `computeTimeline` reads, less the team number). */
export const presentSettings = (event: Event): EventSettingsJson => ({
  // The database holds exactly one lead (a CHECK); minutes win should that ever be broken.
  queueLead: event.queueLeadMinutes !== null ? { minutes: event.queueLeadMinutes } : { matches: event.queueLeadMatches ?? 2 },
  matchLengthSeconds: event.matchLengthSeconds,
  returnToPitMinutes: event.returnToPitMinutes,
  tightTurnaroundMinutes: event.tightTurnaroundMinutes,
  allowRunningAhead: event.allowRunningAhead,
});

export const timelineSettingsOf = (event: Event): TimelineSettings => ({ teamNumber: event.teamNumber, ...presentSettings(event) });

export const presentEvent = (event: Event, currentEventId: string | null): EventJson => ({
  id: event.id,
  name: event.name,
  venue: event.venue,
  timeZone: event.timeZone,
  startDate: event.startDate,
  endDate: event.endDate,
  teamNumber: event.teamNumber,
  settings: presentSettings(event),
  current: event.id === currentEventId,
  version: event.version,
  createdAt: event.createdAt.toISOString(),
  updatedAt: event.updatedAt.toISOString(),
});
