import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventJson } from '@shared/schemas/events';
import { api } from '../../../lib/api-client';

export function getEvent(id: string, signal?: AbortSignal): Promise<EventJson> {
  return api.get<EventJson>(`/api/events/${encodeURIComponent(id)}`, signal);
}

export const eventQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['events', id],
    queryFn: ({ signal }) => getEvent(id, signal),
  });

export function useEvent(id: string) {
  return useQuery(eventQueryOptions(id));
}
