import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isNotFound } from '../../../lib/api-client';
import { invitesQueryOptions } from './get-invites';

/** The invite's link stops working at once; the person can be invited again later. */
export function revokeInvite(id: string): Promise<void> {
  return api.delete(`/api/team/invites/${encodeURIComponent(id)}`);
}

export function useRevokeInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvite,
    // A 404 too: an invite revoked already (by a tap whose answer was lost) or used meanwhile is gone.
    onSettled: (_answer, error) => {
      if (!error || isNotFound(error)) void queryClient.invalidateQueries({ queryKey: invitesQueryOptions().queryKey });
    },
  });
}
