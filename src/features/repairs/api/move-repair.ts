import { useMutation, useQueryClient } from '@tanstack/react-query';
import { movedTicket } from '@shared/domain/repair-board';
import type { ColumnPlace, RepairStatus } from '@shared/domain/repair-urgency';
import type { RepairJson, RepairListJson } from '@shared/schemas/repairs';
import { isDetailed, movesMutationKey, repairsQueryKey, staleRepair, withTicket, type MoveContext } from './repairs-cache';
import { refreshAfterWrite, storeTicket, updateRepair, type RepairChanges } from './update-repair';

export interface MoveRepairVariables {
  /** The card as the board showed it when it was dropped: its version goes with the move. */
  ticket: RepairJson;
  status: RepairStatus;
  /** Neighbours chosen by hand (leads and mentors only); null lets urgency place it, as it does for the crew. */
  byHand: ColumnPlace | null;
}

/** The PATCH of a move: the column if it changes, the neighbours if placed by hand, and the version. */
export function moveBody({ ticket, status, byHand }: MoveRepairVariables): RepairChanges {
  return {
    version: ticket.version,
    ...(status !== ticket.status && { status }),
    ...(byHand && { afterId: byHand.afterId, beforeId: byHand.beforeId }),
  };
}

/**
 * Moves a card on the board: shown at once where the server will put it, confirmed by its answer.
 * A 409 `stale` puts the card where the other person left it (`current`); any other refusal puts
 * it back. Either way the mutation's error and context say what happened, for the board's notice.
 */
export function useMoveRepair(eventId: string) {
  const queryClient = useQueryClient();
  const key = repairsQueryKey(eventId);
  return useMutation({
    mutationKey: movesMutationKey(eventId),
    mutationFn: (variables: MoveRepairVariables) => updateRepair(variables.ticket.id, moveBody(variables)),
    onMutate: async (variables): Promise<MoveContext | undefined> => {
      // A read on its way may predate the move; the overlay re-applies the move to the next one.
      await queryClient.cancelQueries({ queryKey: key });
      const list = queryClient.getQueryData<RepairListJson>(key);
      if (!isDetailed(list)) return undefined;
      const previous = list.repairs.find((ticket) => ticket.id === variables.ticket.id) ?? variables.ticket;
      const optimistic = movedTicket(list.repairs, previous, variables.status, variables.byHand);
      queryClient.setQueryData<RepairListJson>(key, withTicket(list, optimistic));
      return { previous, optimistic };
    },
    onSuccess: (answer, _variables, context) => {
      if (context) context.confirmed = answer;
      storeTicket(queryClient, answer);
    },
    onError: (error, _variables, context) => {
      // The refetch in onSettled must not lay the refused move over the server's list again.
      if (context) context.failed = true;
      const theirs = staleRepair(error);
      if (theirs) return storeTicket(queryClient, theirs);
      if (!context) return;
      // Back where it was, unless a newer version arrived meanwhile.
      queryClient.setQueryData<RepairListJson>(key, (list) => {
        if (!isDetailed(list)) return list;
        const now = list.repairs.find((ticket) => ticket.id === context.previous.id);
        return now && now.version === context.previous.version ? withTicket(list, context.previous) : list;
      });
    },
    onSettled: (_answer, _error, variables) => refreshAfterWrite(queryClient, variables.ticket),
  });
}
