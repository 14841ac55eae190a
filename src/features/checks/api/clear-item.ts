import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RunItemJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';
import { useViewer } from '../../../lib/authorization';
import { itemScope, markedItem, marksMutationKey, optimisticMarkHandlers } from './run-cache';

export function clearItem(runId: string, itemId: string): Promise<RunItemJson> {
  return api.delete<RunItemJson>(`/api/checklist-runs/${encodeURIComponent(runId)}/items/${encodeURIComponent(itemId)}`);
}

/** Un-marks one item (the server keeps the earlier mark in the run's history); shown at once, like a mark. */
export function useClearItem(runId: string, itemId: string) {
  const queryClient = useQueryClient();
  const { user } = useViewer();
  const by = { id: user.id, name: user.name };
  return useMutation({
    mutationKey: marksMutationKey(runId),
    // The same scope as marks of this item: a tick then an un-tick reach the server in that order.
    scope: itemScope(runId, itemId),
    mutationFn: () => clearItem(runId, itemId),
    ...optimisticMarkHandlers(queryClient, runId, itemId, (item) => markedItem(item, null, by)),
  });
}
