import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionJson, SignInInput } from '@shared/schemas/session';
import { api } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export function signIn(input: SignInInput): Promise<SessionJson> {
  return api.post<SessionJson>('/api/session', input);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      // A shared pit tablet changes hands: nothing cached for the last person may show to this one.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'session' });
      queryClient.setQueryData(sessionQueryOptions().queryKey, session);
    },
  });
}
