import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MatchJson, UpdateMatchInput } from '@shared/schemas/schedule';
import { api, isApiError } from '../../../lib/api-client';

export function updateMatch(id: string, changes: UpdateMatchInput): Promise<MatchJson> {
  return api.patch<MatchJson>(`/api/matches/${encodeURIComponent(id)}`, changes);
}

/** The match as someone else saved it, when the answer is a 409 `stale`. */
export function staleMatch(error: unknown): MatchJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as MatchJson) : null;
}

export function useUpdateMatch(eventId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: UpdateMatchInput }) => updateMatch(id, changes),
    // On a stale answer too: the list should show the other tablet's version behind the notice.
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['matches', eventId] }),
        queryClient.invalidateQueries({ queryKey: ['timeline', eventId] }),
      ]),
  });
}
