import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function signOut(): Promise<void> {
  return api.delete('/api/session');
}

/**
 * The cache is not touched here: the caller moves to /sign-in, whose loader asks the server
 * afresh and drops the team's data. Clearing it first would make the still-mounted screens
 * refetch, meet 401s and race that navigation.
 */
export function useSignOut() {
  return useMutation({ mutationFn: signOut });
}
