import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RunJson, SignOffInput } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';
import { runQueryKey, withOwnMarks } from './run-cache';

export function signOffRun(runId: string, input: SignOffInput): Promise<RunJson> {
  return api.post<RunJson>(`/api/checklist-runs/${encodeURIComponent(runId)}/sign-off`, input);
}

/** A lead signs a run off as done; with items still open only with a written reason, which is kept. */
export function useSignOffRun(runId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignOffInput) => signOffRun(runId, input),
    onSuccess: async (run) => {
      queryClient.setQueryData(runQueryKey(runId), withOwnMarks(run, queryClient));
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['checklist-runs', run.eventId] }),
        queryClient.invalidateQueries({ queryKey: ['readiness', run.eventId] }),
      ]);
    },
  });
}
