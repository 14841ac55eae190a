import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventJson } from '@shared/schemas/events';
import { api } from '../../../lib/api-client';

export function getEvents(signal?: AbortSignal): Promise<EventJson[]> {
  return api.get<EventJson[]>('/api/events', signal);
}

export const eventsQueryOptions = () =>
  queryOptions({
    queryKey: ['events'],
    queryFn: ({ signal }) => getEvents(signal),
  });

export function useEvents() {
  return useQuery(eventsQueryOptions());
}

const pickCurrent = (events: EventJson[]) => events.find((event) => event.current) ?? null;

/** The team's current event, or null; read from the list so the shell and board share one request. */
export function useCurrentEvent(options: { enabled?: boolean } = {}) {
  return useQuery({ ...eventsQueryOptions(), select: pickCurrent, enabled: options.enabled });
}
