import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { IncidentListJson } from '@shared/schemas/incidents';
import { api } from '../../../lib/api-client';
import { incidentsQueryKey, type IncidentFilter } from './incidents-cache';

function search(filter: IncidentFilter): string {
  const params = new URLSearchParams({ eventId: filter.eventId });
  if (filter.status) params.set('status', filter.status);
  return params.toString();
}

export function getIncidents(filter: IncidentFilter, signal?: AbortSignal): Promise<IncidentListJson> {
  return api.get<IncidentListJson>(`/api/incidents?${search(filter)}`, signal);
}

/** The spreadsheet of the same incidents (every status): a plain link, so the browser downloads it. */
export const incidentsCsvUrl = (eventId: string | 'all') => `/api/incidents.csv?${new URLSearchParams({ eventId })}`;

export const incidentsQueryOptions = (filter: IncidentFilter) =>
  queryOptions({
    queryKey: incidentsQueryKey(filter),
    queryFn: ({ signal }) => getIncidents(filter, signal),
  });

/** The safety log (safety and admin only), newest first; the last list stays while another filter loads. */
export function useIncidents(filter: IncidentFilter) {
  return useQuery({ ...incidentsQueryOptions(filter), placeholderData: keepPreviousData });
}
