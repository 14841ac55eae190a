import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MatchJson } from '@shared/schemas/schedule';
import { api } from '../../../lib/api-client';

export function undoFieldProgress(eventId: string): Promise<MatchJson> {
  return api.delete<MatchJson>(`/api/events/${encodeURIComponent(eventId)}/field-progress/latest`);
}

/** Takes back the latest "on the field" mark (a tap on the wrong match, or too early). */
export function useUndoFieldProgress(eventId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => undoFieldProgress(eventId),
    // On failure too: a 404 or 409 usually means another tablet changed the field first.
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['matches', eventId] }),
        queryClient.invalidateQueries({ queryKey: ['timeline', eventId] }),
      ]),
  });
}
