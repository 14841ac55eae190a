import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { screensQueryOptions } from './get-screens';

/** Revokes a pit screen: its link stops working and the TV showing it is dropped at once. */
export function revokeScreen(id: string): Promise<void> {
  return api.delete(`/api/team/screens/${encodeURIComponent(id)}`);
}

export function useRevokeScreen() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeScreen,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: screensQueryOptions().queryKey }),
  });
}
