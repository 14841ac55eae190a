import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isNotFound } from '../../../lib/api-client';
import { mailFailuresQueryOptions } from './get-mail-failures';

/** Queues the mail again with fresh attempts (202); it leaves the list, and comes back only if it fails again. */
export function retryMailFailure(id: string): Promise<void> {
  return api.post(`/api/team/mail-failures/${encodeURIComponent(id)}/retry`);
}

export function useRetryMailFailure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryMailFailure,
    // A 404 too: one retried or dismissed already (on another tablet, or by a tap whose answer was lost) is gone.
    onSettled: (_answer, error) => {
      if (!error || isNotFound(error)) void queryClient.invalidateQueries({ queryKey: mailFailuresQueryOptions().queryKey });
    },
  });
}
