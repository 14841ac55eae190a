import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BatteryPlanJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

export function getBatteryPlan(eventId: string, signal?: AbortSignal): Promise<BatteryPlanJson> {
  // No `at`: the server plans from its own clock, the one every tablet agrees on.
  return api.get<BatteryPlanJson>(`/api/events/${encodeURIComponent(eventId)}/battery-plan`, signal);
}

// The plan follows the timeline's projections, which move with the clock even when nobody
// writes anything (a stalled field), and a socket message can be lost: read it every minute.
const REFRESH_MS = 60_000;

export const batteryPlanQueryOptions = (eventId: string) =>
  queryOptions({
    queryKey: ['battery-plan', eventId],
    queryFn: ({ signal }) => getBatteryPlan(eventId, signal),
    refetchInterval: REFRESH_MS,
  });

/** Which battery goes into which of our remaining matches, when each charges, and the warnings. */
export function useBatteryPlan(eventId: string) {
  return useQuery(batteryPlanQueryOptions(eventId));
}
