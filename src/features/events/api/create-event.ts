import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateEventInput, EventJson } from '@shared/schemas/events';
import { api } from '../../../lib/api-client';
import { eventsQueryOptions } from './get-events';

/** `input.id` is chosen by the form and kept across resends, so a retried create makes no second event. */
export function createEvent(input: CreateEventInput & { id: string }): Promise<EventJson> {
  return api.post<EventJson>('/api/events', input);
}

export function useCreateEvent() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEvent,
    onSuccess: (event) => {
      // A new current event also moves the team's pointer to it.
      if (event.current) void queryClient.invalidateQueries({ queryKey: ['team'] });
      return queryClient.invalidateQueries({ queryKey: eventsQueryOptions().queryKey });
    },
  });
}
