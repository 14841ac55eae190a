import { queryOptions, useQuery } from '@tanstack/react-query';
import type { IncidentJson } from '@shared/schemas/incidents';
import { api } from '../../../lib/api-client';
import { incidentQueryKey } from './incidents-cache';

export function getIncident(id: string, signal?: AbortSignal): Promise<IncidentJson> {
  return api.get<IncidentJson>(`/api/incidents/${encodeURIComponent(id)}`, signal);
}

export const incidentQueryOptions = (id: string) =>
  queryOptions({
    queryKey: incidentQueryKey(id),
    queryFn: ({ signal }) => getIncident(id, signal),
  });

/** One report: all of it for safety and admin, what was sent and its status for the one who reported it. */
export function useIncident(id: string) {
  return useQuery(incidentQueryOptions(id));
}

/** Where a photo of a report is served; the server checks that the caller may read the report. */
export const incidentPhotoUrl = (incidentId: string, photoId: string, size: 'thumb' | 'full') =>
  `/api/incidents/${encodeURIComponent(incidentId)}/photos/${encodeURIComponent(photoId)}?size=${size}`;
