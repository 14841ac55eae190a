import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateIncidentInput, IncidentJson } from '@shared/schemas/incidents';
import { api } from '../../../lib/api-client';
import { storeIncident } from './incidents-cache';

/** The body as the form sends it; `id` is made by the form and kept across resends. */
export type CreateIncidentBody = Omit<CreateIncidentInput, 'id'> & { id: string };

/** Reports an incident; resending the same `id` answers the report already made (200), never a second one. */
export function createIncident(input: CreateIncidentBody): Promise<IncidentJson> {
  return api.post<IncidentJson>('/api/incidents', input);
}

export function useCreateIncident() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createIncident,
    onSuccess: (incident) => storeIncident(queryClient, incident),
  });
}
