import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { IncidentPhotoJson } from '@shared/schemas/incidents';
import { api } from '../../../lib/api-client';
import { incidentQueryKey, incidentsQueryKey } from './incidents-cache';

/** Sends one photo as multipart field `photo`; the server checks its content, not its name or declared type. */
export function uploadIncidentPhoto(incidentId: string, file: Blob): Promise<IncidentPhotoJson> {
  const form = new FormData();
  form.append('photo', file);
  return api.post<IncidentPhotoJson>(`/api/incidents/${encodeURIComponent(incidentId)}/photos`, form);
}

export function deleteIncidentPhoto(incidentId: string, photoId: string): Promise<void> {
  return api.delete(`/api/incidents/${encodeURIComponent(incidentId)}/photos/${encodeURIComponent(photoId)}`);
}

function useRefresh(incidentId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([queryClient.invalidateQueries({ queryKey: incidentQueryKey(incidentId) }), queryClient.invalidateQueries({ queryKey: incidentsQueryKey() })]);
}

/** Adds a photo to a report (its reporter, or safety and admin); photos do not change the report's version. */
export function useUploadIncidentPhoto(incidentId: string) {
  const refresh = useRefresh(incidentId);
  return useMutation({ mutationFn: (file: Blob) => uploadIncidentPhoto(incidentId, file), onSuccess: refresh });
}

/** Removes a photo (safety and admin). */
export function useDeleteIncidentPhoto(incidentId: string) {
  const refresh = useRefresh(incidentId);
  return useMutation({ mutationFn: (photoId: string) => deleteIncidentPhoto(incidentId, photoId), onSuccess: refresh });
}
