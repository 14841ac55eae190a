import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SubsystemsJson } from '@shared/schemas/repairs';
import { api } from '../../../lib/api-client';

export function getSubsystems(signal?: AbortSignal): Promise<SubsystemsJson> {
  return api.get<SubsystemsJson>('/api/team/repair-subsystems', signal);
}

export const subsystemsQueryOptions = () =>
  queryOptions({
    // Starts with 'repair-subsystems': a lead's edit on another tablet reaches it.
    queryKey: ['repair-subsystems'],
    queryFn: ({ signal }) => getSubsystems(signal),
    // Changes a few times a season; the socket announces those.
    staleTime: 5 * 60_000,
  });

/** The team's subsystem list, in its order. */
export function useSubsystems() {
  return useQuery(subsystemsQueryOptions());
}

/** A subsystem's label; a key no longer in the list (removed later) shows as it is. */
export function subsystemLabel(list: SubsystemsJson | undefined, key: string): string {
  return list?.subsystems.find((subsystem) => subsystem.key === key)?.label ?? key;
}
