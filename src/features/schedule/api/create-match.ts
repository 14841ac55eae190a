import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateMatchInput, MatchJson } from '@shared/schemas/schedule';
import { api } from '../../../lib/api-client';

export function createMatch(eventId: string, body: CreateMatchInput): Promise<MatchJson> {
  return api.post<MatchJson>(`/api/events/${encodeURIComponent(eventId)}/matches`, body);
}

/** Adds one match by hand; the body carries a client id, so a retry after a lost answer adds nothing twice. */
export function useCreateMatch(eventId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateMatchInput) => createMatch(eventId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['matches', eventId] }),
        queryClient.invalidateQueries({ queryKey: ['timeline', eventId] }),
      ]),
  });
}
