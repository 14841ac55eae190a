import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isNotFound } from '../../../lib/api-client';
import { mailFailuresQueryOptions } from './get-mail-failures';

/** Takes a failure off the list for good: someone passed the news on another way. */
export function dismissMailFailure(id: string): Promise<void> {
  return api.delete(`/api/team/mail-failures/${encodeURIComponent(id)}`);
}

export function useDismissMailFailure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: dismissMailFailure,
    // A 404 too: one retried or dismissed already (on another tablet, or by a tap whose answer was lost) is gone.
    onSettled: (_answer, error) => {
      if (!error || isNotFound(error)) void queryClient.invalidateQueries({ queryKey: mailFailuresQueryOptions().queryKey });
    },
  });
}
