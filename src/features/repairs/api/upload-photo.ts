import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RepairPhotoJson } from '@shared/schemas/repairs';
import { api } from '../../../lib/api-client';
import { refreshAfterWrite } from './update-repair';

/** Sends one photo as multipart field `photo`; the server checks its content, not its name or declared type. */
export function uploadPhoto(repairId: string, file: Blob): Promise<RepairPhotoJson> {
  const form = new FormData();
  form.append('photo', file);
  return api.post<RepairPhotoJson>(`/api/repairs/${encodeURIComponent(repairId)}/photos`, form);
}

/** Adds a photo to a ticket; photos never conflict with edits (they do not change the ticket's version). */
export function useUploadPhoto(ticket: { id: string; eventId: string }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: Blob) => uploadPhoto(ticket.id, file),
    onSuccess: () => refreshAfterWrite(queryClient, ticket),
  });
}
