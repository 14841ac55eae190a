import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RunJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';
import { runQueryKey, withOwnMarks } from './run-cache';

export function getRun(runId: string, signal?: AbortSignal): Promise<RunJson> {
  return api.get<RunJson>(`/api/checklist-runs/${encodeURIComponent(runId)}`, signal);
}

export const runQueryOptions = (runId: string) =>
  queryOptions({
    // Starts with 'checklist-run': every mark announced by another tablet refetches it.
    queryKey: runQueryKey(runId),
    queryFn: async ({ signal, client }) => withOwnMarks(await getRun(runId, signal), client),
  });

/** One run with its items; this tablet's marks on their way already show. */
export function useRun(runId: string) {
  return useQuery(runQueryOptions(runId));
}
