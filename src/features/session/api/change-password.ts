import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '@shared/schemas/session';
import { api } from '../../../lib/api-client';

/**
 * A wrong current password answers 400 with `fields.currentPassword` (never a 401: that would
 * mean the session is over); 10 wrong ones in 15 minutes answer 429 `rate_limited` with
 * Retry-After. On success the other devices are signed out and this session, with its CSRF
 * token, stays as it is, so there is nothing in the cache to refresh.
 */
export function changePassword(input: ChangePasswordInput): Promise<void> {
  return api.put('/api/session/password', input);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
