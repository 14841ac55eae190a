import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MarkValue } from '@shared/domain/checklist';
import type { RunItemJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';
import { useViewer } from '../../../lib/authorization';
import { itemScope, markedItem, marksMutationKey, optimisticMarkHandlers } from './run-cache';

export interface MarkItemInput {
  value: MarkValue;
  note?: string | null;
}

export function markItem(runId: string, itemId: string, body: MarkItemInput): Promise<RunItemJson> {
  return api.put<RunItemJson>(`/api/checklist-runs/${encodeURIComponent(runId)}/items/${encodeURIComponent(itemId)}`, body);
}

/**
 * Marks one item: shown at once with this person's name, confirmed by the server's answer, and
 * rolled back when refused (the mutation's error says why). A number out of limits is not
 * refused: it is stored and shows as failed.
 */
export function useMarkItem(runId: string, itemId: string) {
  const queryClient = useQueryClient();
  const { user } = useViewer();
  const by = { id: user.id, name: user.name };
  return useMutation({
    mutationKey: marksMutationKey(runId),
    scope: itemScope(runId, itemId),
    mutationFn: (input: MarkItemInput) => markItem(runId, itemId, input),
    ...optimisticMarkHandlers(queryClient, runId, itemId, (item, input: MarkItemInput) => markedItem(item, input.value, by, input.note)),
  });
}
