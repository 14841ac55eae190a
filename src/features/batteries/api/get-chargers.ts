import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ChargerJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

export function getChargers(signal?: AbortSignal): Promise<ChargerJson[]> {
  return api.get<ChargerJson[]>('/api/chargers', signal);
}

export const chargersQueryOptions = () =>
  queryOptions({
    // 'chargers': what 'batteries:changed' makes stale.
    queryKey: ['chargers'],
    queryFn: ({ signal }) => getChargers(signal),
  });

/** The team's chargers, in the order their bays are numbered across the pit. */
export function useChargers() {
  return useQuery(chargersQueryOptions());
}
