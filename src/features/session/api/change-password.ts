import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChangePasswordInput } from '@shared/schemas/session';
import { api } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export function changePassword(input: ChangePasswordInput): Promise<void> {
  return api.put('/api/session/password', input);
}

export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changePassword,
    // The server may renew the session (and its CSRF token) when the password changes.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionQueryOptions().queryKey }),
  });
}
