import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mailFailuresQueryOptions } from './get-mail-failures';

/** Takes a failure off the list for good: someone passed the news on another way. */
export function dismissMailFailure(id: string): Promise<void> {
  return api.delete(`/api/team/mail-failures/${encodeURIComponent(id)}`);
}

export function useDismissMailFailure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: dismissMailFailure,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mailFailuresQueryOptions().queryKey }),
  });
}
