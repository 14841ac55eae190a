import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportJson, ScheduleFileError } from '@shared/schemas/schedule';
import { api, isApiError } from '../../../lib/api-client';

export interface ImportScheduleInput {
  eventId: string;
  file: File;
  /** A preview: the server reads and matches the file but saves nothing. */
  dryRun: boolean;
}

export function importSchedule({ eventId, file, dryRun }: ImportScheduleInput): Promise<ImportJson> {
  // A fresh form per call: the same File is sent twice (preview, then apply).
  const form = new FormData();
  form.append('file', file);
  const query = dryRun ? '?dryRun=1' : '';
  return api.post<ImportJson>(`/api/events/${encodeURIComponent(eventId)}/matches/import${query}`, form);
}

/** The bad rows of a refused file (400 `invalid_file`), or null for any other failure. */
export function badRowsOf(error: unknown): ScheduleFileError[] | null {
  if (!isApiError(error, 'invalid_file')) return null;
  const rows = error.details.rows;
  return Array.isArray(rows) ? (rows as ScheduleFileError[]) : null;
}

/** Previews or applies a schedule file; only an applied import touches what others see. */
export function useImportSchedule(eventId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { file: File; dryRun: boolean }) => importSchedule({ eventId, ...input }),
    onSuccess: (_answer, { dryRun }) => {
      if (dryRun) return;
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: ['matches'] }),
        queryClient.invalidateQueries({ queryKey: ['timeline'] }),
      ]);
    },
  });
}
