import type { ScreenEventJson, ScreenJson } from '../../shared/schemas/screens';
import type { Event, ScreenToken } from '../models';

export const presentScreen = (screen: ScreenToken): ScreenJson => ({
  id: screen.id,
  name: screen.name,
  createdAt: screen.createdAt.toISOString(),
  revokedAt: screen.revokedAt ? screen.revokedAt.toISOString() : null,
});

/** The event fields a pit screen shows; written out so that a new event column never leaks to it. */
export const presentScreenEvent = (event: Event): ScreenEventJson => ({
  id: event.id,
  name: event.name,
  venue: event.venue,
  timeZone: event.timeZone,
  startDate: event.startDate,
  endDate: event.endDate,
  teamNumber: event.teamNumber,
});
