import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MatchJson } from '@shared/schemas/schedule';
import { api } from '../../../lib/api-client';
import { serverNow } from '../../../lib/server-clock';

export interface MarkFieldProgressInput {
  eventId: string;
  matchId: string;
  /** When the match started; the moment of the tap, so a slow request does not shift it. */
  startedAt: string;
}

export function markFieldProgress({ eventId, ...body }: MarkFieldProgressInput): Promise<MatchJson> {
  return api.post<MatchJson>(`/api/events/${encodeURIComponent(eventId)}/field-progress`, body);
}

/**
 * Marks a match as on the field, now or at a time the lead gives (a tap that came late); the
 * whole schedule's projection moves with it.
 */
export function useMarkFieldProgress(eventId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ matchId, startedAt }: { matchId: string; startedAt?: Date }) =>
      markFieldProgress({ eventId, matchId, startedAt: (startedAt ?? serverNow()).toISOString() }),
    // Awaited, so the button stays busy until the screen shows the new next match: a second tap
    // meanwhile would otherwise mark the same match again.
    // On failure too: a 404 or 409 usually means another tablet changed the field first.
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['matches', eventId] }),
        queryClient.invalidateQueries({ queryKey: ['timeline', eventId] }),
      ]),
  });
}
