import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mailFailuresQueryOptions } from './get-mail-failures';

/** Queues the mail again with fresh attempts (202); it leaves the list, and comes back only if it fails again. */
export function retryMailFailure(id: string): Promise<void> {
  return api.post(`/api/team/mail-failures/${encodeURIComponent(id)}/retry`);
}

export function useRetryMailFailure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryMailFailure,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mailFailuresQueryOptions().queryKey }),
  });
}
