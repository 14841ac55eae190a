import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateRunInput, RunJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';
import { runQueryKey } from './run-cache';

/**
 * Starts a run of a template's current version, optionally for one of our matches. `id` is made
 * by the caller and kept across resends; a second start for the same template and match answers
 * the run already there.
 */
export function createRun(eventId: string, input: CreateRunInput & { id: string }): Promise<RunJson> {
  return api.post<RunJson>(`/api/events/${encodeURIComponent(eventId)}/checklist-runs`, input);
}

export function useCreateRun(eventId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRunInput & { id: string }) => createRun(eventId, input),
    onSuccess: async (run) => {
      queryClient.setQueryData(runQueryKey(run.id), run);
      // Awaited: the button stays busy until the list shows the run, so a second tap cannot start another.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['checklist-runs', eventId] }),
        queryClient.invalidateQueries({ queryKey: ['readiness', eventId] }),
      ]);
    },
  });
}
