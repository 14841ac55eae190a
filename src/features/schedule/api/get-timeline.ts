import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TimelineJson } from '@shared/domain/timeline';
import { api } from '../../../lib/api-client';

export function getTimeline(eventId: string, signal?: AbortSignal): Promise<TimelineJson> {
  // No `at`: the server projects from its own clock, the one every tablet then agrees on.
  return api.get<TimelineJson>(`/api/events/${encodeURIComponent(eventId)}/timeline`, signal);
}

// Projections move with the clock even when nobody touches the schedule (a stalled field pushes
// every match back), and a socket message can be lost on arena Wi-Fi: refetch once a minute.
const REFRESH_MS = 60_000;

export const timelineQueryOptions = (eventId: string) =>
  queryOptions({
    // Starts with 'timeline' so the live updates' map reaches it.
    queryKey: ['timeline', eventId],
    queryFn: ({ signal }) => getTimeline(eventId, signal),
    refetchInterval: REFRESH_MS,
    // The pit screen stays on one tab for hours; keep it fresh in the background too.
    refetchIntervalInBackground: true,
  });

export function useTimeline(eventId: string) {
  return useQuery(timelineQueryOptions(eventId));
}
