import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MatchJson } from '@shared/schemas/schedule';
import { api } from '../../../lib/api-client';

export function getMatches(eventId: string, signal?: AbortSignal): Promise<MatchJson[]> {
  return api.get<MatchJson[]>(`/api/events/${encodeURIComponent(eventId)}/matches`, signal);
}

export const matchesQueryOptions = (eventId: string) =>
  queryOptions({
    // Starts with 'matches' so imports, edits and field marks from other tablets reach it.
    queryKey: ['matches', eventId],
    queryFn: ({ signal }) => getMatches(eventId, signal),
  });

export function useMatches(eventId: string) {
  return useQuery(matchesQueryOptions(eventId));
}
