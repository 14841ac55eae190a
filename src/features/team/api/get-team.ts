import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TeamJson } from '@shared/schemas/team';
import { api } from '../../../lib/api-client';

export function getTeam(signal?: AbortSignal): Promise<TeamJson> {
  return api.get<TeamJson>('/api/team', signal);
}

export const teamQueryOptions = () =>
  queryOptions({
    queryKey: ['team'],
    queryFn: ({ signal }) => getTeam(signal),
  });

export function useTeam() {
  return useQuery(teamQueryOptions());
}
