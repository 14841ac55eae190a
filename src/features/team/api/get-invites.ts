import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitesJson } from '@shared/schemas/mail';
import { api } from '../../../lib/api-client';

/** Pending invites only: not used, not revoked, not expired. */
export function getInvites(signal?: AbortSignal): Promise<InvitesJson> {
  return api.get<InvitesJson>('/api/team/invites', signal);
}

export const invitesQueryOptions = () =>
  queryOptions({
    queryKey: ['invites'],
    queryFn: ({ signal }) => getInvites(signal),
  });

export function useInvites() {
  return useQuery(invitesQueryOptions());
}
