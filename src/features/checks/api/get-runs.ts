import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RunSummaryJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';

export function getRuns(eventId: string, signal?: AbortSignal): Promise<RunSummaryJson[]> {
  return api.get<RunSummaryJson[]>(`/api/events/${encodeURIComponent(eventId)}/checklist-runs`, signal);
}

export const runsQueryOptions = (eventId: string) =>
  queryOptions({
    // Starts with 'checklist-runs' so runs started, marked or signed off on other tablets reach it.
    queryKey: ['checklist-runs', eventId],
    queryFn: ({ signal }) => getRuns(eventId, signal),
  });

/** Every run of the event, newest first (one list: the page groups it by match and phase). */
export function useRuns(eventId: string) {
  return useQuery(runsQueryOptions(eventId));
}
