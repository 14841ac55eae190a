import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshAfterWrite } from './update-repair';

export function deletePhoto(repairId: string, photoId: string): Promise<void> {
  return api.delete(`/api/repairs/${encodeURIComponent(repairId)}/photos/${encodeURIComponent(photoId)}`);
}

/** Removes a photo: its uploader may, and leads and mentors may remove any. */
export function useDeletePhoto(ticket: { id: string; eventId: string }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => deletePhoto(ticket.id, photoId),
    onSuccess: () => refreshAfterWrite(queryClient, ticket),
  });
}
