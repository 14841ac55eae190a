import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RepairListJson } from '@shared/schemas/repairs';
import { api } from '../../../lib/api-client';
import { repairsQueryKey, withPendingMoves } from './repairs-cache';

export function getRepairs(eventId: string, signal?: AbortSignal): Promise<RepairListJson> {
  return api.get<RepairListJson>(`/api/events/${encodeURIComponent(eventId)}/repairs`, signal);
}

// The next queue call moves with the field's pace even when nobody touches a ticket, and a socket
// message can be lost on arena Wi-Fi: read the board again every minute, as the timeline does.
const REFRESH_MS = 60_000;

export const repairsQueryOptions = (eventId: string) =>
  queryOptions({
    // Starts with 'repairs': every ticket written on another tablet reaches it.
    queryKey: repairsQueryKey(eventId),
    queryFn: async ({ signal, client }) => withPendingMoves(await getRepairs(eventId, signal), client, eventId),
    refetchInterval: REFRESH_MS,
  });

/** Every ticket of the event in board order, with the queue call they are needed by; this tablet's moves on their way already show. */
export function useRepairs(eventId: string) {
  return useQuery(repairsQueryOptions(eventId));
}
