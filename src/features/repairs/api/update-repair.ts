import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { RepairDetailJson, RepairJson, RepairListJson, UpdateRepairInput } from '@shared/schemas/repairs';
import { api } from '../../../lib/api-client';
import type { RepairAnswer } from './get-repair';
import { repairQueryKey, repairsQueryKey, staleRepair, withTicket } from './repairs-cache';

/** The PATCH body as sent: what changed, and always the version it was based on. */
export type RepairChanges = Partial<Omit<UpdateRepairInput, 'version'>> & { version: number };

export function updateRepair(id: string, changes: RepairChanges): Promise<RepairJson> {
  return api.patch<RepairJson>(`/api/repairs/${encodeURIComponent(id)}`, changes);
}

/** Puts a ticket answer (or a stale answer's `current`) into the list and the open ticket page. */
export function storeTicket(queryClient: QueryClient, ticket: RepairJson): void {
  queryClient.setQueryData<RepairListJson>(repairsQueryKey(ticket.eventId), (list) => list && withTicket(list, ticket));
  // The page keeps its photos and history until its refetch brings the new lines.
  queryClient.setQueryData<RepairAnswer>(repairQueryKey(ticket.id), (old) =>
    old && 'history' in old ? ({ ...old, ...ticket } satisfies RepairDetailJson) : old,
  );
}

/** Refetches what a ticket write changes: the board, the ticket's history, readiness. */
export function refreshAfterWrite(queryClient: QueryClient, ticket: Pick<RepairJson, 'id' | 'eventId'>): Promise<unknown> {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: repairsQueryKey(ticket.eventId) }),
    queryClient.invalidateQueries({ queryKey: repairQueryKey(ticket.id) }),
    queryClient.invalidateQueries({ queryKey: ['readiness', ticket.eventId] }),
  ]);
}

/**
 * Edits a ticket from its page (fields, or a move by button). A stale answer puts their version
 * into the caches; the form keeps the user's input and offers both ways on.
 */
export function useUpdateRepair(ticket: Pick<RepairJson, 'id' | 'eventId'>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: RepairChanges) => updateRepair(ticket.id, changes),
    onSuccess: (answer) => {
      storeTicket(queryClient, answer);
      return refreshAfterWrite(queryClient, answer);
    },
    onError: (error) => {
      const theirs = staleRepair(error);
      if (theirs) storeTicket(queryClient, theirs);
    },
  });
}
