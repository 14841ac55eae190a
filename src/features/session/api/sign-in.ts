import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { SessionJson, SignInInput } from '@shared/schemas/session';
import { api } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export function signIn(input: SignInInput): Promise<SessionJson> {
  return api.post<SessionJson>('/api/session', input);
}

/** Makes a new session the one the app works with: the sign-in form, or a link from an e-mail that signs in. */
export function rememberSession(queryClient: QueryClient, session: SessionJson): void {
  // A shared pit tablet changes hands: nothing cached for the last person may show to this one.
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'session' });
  queryClient.setQueryData(sessionQueryOptions().queryKey, session);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => rememberSession(queryClient, session),
  });
}
