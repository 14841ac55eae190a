import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateRepairInput, RepairJson, RepairListJson } from '@shared/schemas/repairs';
import { api } from '../../../lib/api-client';
import { repairsQueryKey, withTicket } from './repairs-cache';

/** The body as the form sends it; `id` is made by the form and kept across resends. */
export type CreateRepairBody = Omit<CreateRepairInput, 'id'> & { id: string };

/** Reports a problem; resending the same `id` answers the ticket already made (200), never a second one. */
export function createRepair(eventId: string, input: CreateRepairBody): Promise<RepairJson> {
  return api.post<RepairJson>(`/api/events/${encodeURIComponent(eventId)}/repairs`, input);
}

export function useCreateRepair(eventId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRepairBody) => createRepair(eventId, input),
    onSuccess: (ticket) => {
      // On the board at once, where the server placed it; the refetch confirms.
      queryClient.setQueryData<RepairListJson>(repairsQueryKey(eventId), (list) => list && withTicket(list, ticket));
      void queryClient.invalidateQueries({ queryKey: repairsQueryKey(eventId) });
      void queryClient.invalidateQueries({ queryKey: ['readiness', eventId] });
    },
  });
}
