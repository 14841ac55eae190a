import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { IncidentJson, UpdateIncidentInput } from '@shared/schemas/incidents';
import { api } from '../../../lib/api-client';
import { staleIncident, storeIncident } from './incidents-cache';

/** The PATCH body as sent: what changed, always with the version it was based on. */
export type IncidentChanges = Partial<Omit<UpdateIncidentInput, 'version'>> & { version: number };

export function updateIncident(id: string, changes: IncidentChanges): Promise<IncidentJson> {
  return api.patch<IncidentJson>(`/api/incidents/${encodeURIComponent(id)}`, changes);
}

/**
 * Edits a report (safety and admin): follow-ups, closing, reopening, the details. A stale answer
 * puts their version on the page; the caller keeps what the user asked for and offers both ways on.
 */
export function useUpdateIncident(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: IncidentChanges) => updateIncident(id, changes),
    onSuccess: (incident) => storeIncident(queryClient, incident),
    onError: (error) => {
      const theirs = staleIncident(error);
      if (theirs) void storeIncident(queryClient, theirs);
    },
  });
}
