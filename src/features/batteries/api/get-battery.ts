import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BatteryDetailJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

export function getBattery(id: string, signal?: AbortSignal): Promise<BatteryDetailJson> {
  return api.get<BatteryDetailJson>(`/api/batteries/${encodeURIComponent(id)}`, signal);
}

export const batteryQueryKey = (id: string) => ['battery', id] as const;

export const batteryQueryOptions = (id: string) =>
  queryOptions({
    // Starts with 'battery': every battery change announced by another tablet refetches it.
    queryKey: batteryQueryKey(id),
    queryFn: ({ signal }) => getBattery(id, signal),
  });

/** One battery with all its readings (oldest first) and uses. */
export function useBattery(id: string) {
  return useQuery(batteryQueryOptions(id));
}
