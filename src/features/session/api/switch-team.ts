import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionJson } from '@shared/schemas/session';
import { api } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export function switchTeam(teamId: string): Promise<SessionJson> {
  return api.patch<SessionJson>('/api/session', { teamId });
}

export function useSwitchTeam() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: switchTeam,
    onSuccess: (session) => {
      queryClient.setQueryData(sessionQueryOptions().queryKey, session);
      // Every other entry belongs to the previous team. Reset rather than invalidate, so screens
      // show "loading" instead of the other team's data while the new answers arrive.
      return queryClient.resetQueries({ predicate: (query) => query.queryKey[0] !== 'session' });
    },
  });
}
