import type { QueryClient } from '@tanstack/react-query';
import type { IncidentJson, IncidentStatus } from '@shared/schemas/incidents';
import { isApiError } from '../../../lib/api-client';

/** Which incidents a log shows: one event's (or `all`), optionally one status. */
export interface IncidentFilter {
  eventId: string | 'all';
  status?: IncidentStatus;
}

// Both start with the resource name `incidents:changed` names, so one socket event reaches them.
export const incidentsQueryKey = (filter?: IncidentFilter) => (filter ? (['incidents', filter] as const) : (['incidents'] as const));
export const incidentQueryKey = (id: string) => ['incident', id] as const;

/** The incident as someone else saved it, when a write answers 409 `stale`. */
export function staleIncident(error: unknown): IncidentJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as IncidentJson) : null;
}

/** Puts an answer (or a stale answer's `current`) on the open page, and refetches the logs. */
export function storeIncident(queryClient: QueryClient, incident: IncidentJson): Promise<void> {
  queryClient.setQueryData(incidentQueryKey(incident.id), incident);
  return queryClient.invalidateQueries({ queryKey: incidentsQueryKey() });
}
