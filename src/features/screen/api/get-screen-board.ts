import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ScreenBoardJson } from '@shared/schemas/screens';
import { api } from '../../../lib/api-client';

export function getScreenBoard(token: string, signal?: AbortSignal): Promise<ScreenBoardJson> {
  return api.get<ScreenBoardJson>(`/api/screen/${encodeURIComponent(token)}`, signal);
}

// Projections move with the clock even when nobody touches the schedule, and a socket message
// can be lost on arena Wi-Fi: refetch once a minute, also when the TV's tab is in the background.
const REFRESH_MS = 60_000;

export const screenBoardQueryOptions = (token: string) =>
  queryOptions({
    // Starts with 'timeline': the answer carries the timeline, and the live map's keys reach it.
    queryKey: ['timeline', 'screen', token],
    queryFn: ({ signal }) => getScreenBoard(token, signal),
    refetchInterval: REFRESH_MS,
    refetchIntervalInBackground: true,
  });

export function useScreenBoard(token: string) {
  return useQuery(screenBoardQueryOptions(token));
}
