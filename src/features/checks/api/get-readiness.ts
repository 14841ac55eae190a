import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReadinessJson } from '@shared/domain/readiness';
import { api } from '../../../lib/api-client';

export function getReadiness(eventId: string, matchId: string, signal?: AbortSignal): Promise<ReadinessJson> {
  return api.get<ReadinessJson>(`/api/events/${encodeURIComponent(eventId)}/matches/${encodeURIComponent(matchId)}/readiness`, signal);
}

// The queue call comes closer with no write at all ("Queue call in 4 min and required work is
// still open"), and a socket message can be lost: read it again every minute.
const REFRESH_MS = 60_000;

export const readinessQueryOptions = (eventId: string, matchId: string) =>
  queryOptions({
    // Starts with 'readiness': marks, new runs and field progress all make it stale.
    queryKey: ['readiness', eventId, matchId],
    queryFn: ({ signal }) => getReadiness(eventId, matchId, signal),
    refetchInterval: REFRESH_MS,
  });

/** Readiness of one of our matches; idle without a match. */
export function useReadiness(eventId: string, matchId: string | undefined) {
  return useQuery({ ...readinessQueryOptions(eventId, matchId ?? ''), enabled: matchId !== undefined });
}
