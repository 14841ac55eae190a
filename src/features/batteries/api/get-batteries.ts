import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BatteryJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

export function getBatteries(signal?: AbortSignal): Promise<BatteryJson[]> {
  return api.get<BatteryJson[]>('/api/batteries', signal);
}

export const batteriesQueryOptions = () =>
  queryOptions({
    // Starts with 'batteries' so readings, charging and edits from other tablets reach it.
    queryKey: ['batteries'],
    queryFn: ({ signal }) => getBatteries(signal),
  });

/** The team's batteries, retired ones included, by label. */
export function useBatteries() {
  return useQuery(batteriesQueryOptions());
}
