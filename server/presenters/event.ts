import type { EventJson } from '../../shared/schemas/events';
import type { Event } from '../models';

export const presentEvent = (event: Event, currentEventId: string | null): EventJson => ({
  id: event.id,
  name: event.name,
  venue: event.venue,
  timeZone: event.timeZone,
  startDate: event.startDate,
  endDate: event.endDate,
  teamNumber: event.teamNumber,
  current: event.id === currentEventId,
  version: event.version,
  createdAt: event.createdAt.toISOString(),
  updatedAt: event.updatedAt.toISOString(),
});
