import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EventJson, UpdateEventInput } from '@shared/schemas/events';
import { api, isApiError } from '../../../lib/api-client';
import { eventQueryOptions } from './get-event';
import { eventsQueryOptions } from './get-events';

export function updateEvent({ id, ...changes }: UpdateEventInput & { id: string }): Promise<EventJson> {
  return api.patch<EventJson>(`/api/events/${encodeURIComponent(id)}`, changes);
}

/** The event as someone else saved it, when the answer is a 409 `stale`. */
export function staleEvent(error: unknown): EventJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as EventJson) : null;
}

export function useUpdateEvent() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateEvent,
    onSuccess: (event, changes) => {
      queryClient.setQueryData(eventQueryOptions(event.id).queryKey, event);
      // Making an event current also moves the team's pointer and clears the flag on the old one.
      if (changes.current) void queryClient.invalidateQueries({ queryKey: ['team'] });
      return queryClient.invalidateQueries({ queryKey: eventsQueryOptions().queryKey });
    },
    onError: (error, { id }) => {
      const theirs = staleEvent(error);
      if (!theirs) return;
      // Everything else on screen (the header's event name, the list) should show their version too.
      queryClient.setQueryData(eventQueryOptions(id).queryKey, theirs);
      return queryClient.invalidateQueries({ queryKey: eventsQueryOptions().queryKey, exact: true });
    },
  });
}
