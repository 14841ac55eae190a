import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/**
 * Always answers 202, whether or not the address has an account: the page must not tell a
 * stranger who is signed up. A 429 `rate_limited` (too many requests from this network) is the
 * only error that says anything.
 */
export function requestPasswordReset(email: string): Promise<void> {
  return api.post('/api/session/password-reset', { email });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
