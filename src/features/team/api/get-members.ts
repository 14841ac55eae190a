import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MemberJson } from '@shared/schemas/team';
import { api } from '../../../lib/api-client';

export function getMembers(signal?: AbortSignal): Promise<MemberJson[]> {
  return api.get<MemberJson[]>('/api/team/members', signal);
}

export const membersQueryOptions = () =>
  queryOptions({
    queryKey: ['members'],
    queryFn: ({ signal }) => getMembers(signal),
  });

export function useMembers() {
  return useQuery(membersQueryOptions());
}
