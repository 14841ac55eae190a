import { useMutation } from '@tanstack/react-query';
import type { SessionJson } from '@shared/schemas/session';
import { api } from '../../../lib/api-client';

/**
 * Uses the link: sets the password (a reset, or an invite to a new account) or proves the
 * existing one (an invite to an address with an account), and answers the new session. A
 * refused password is a 400 with `fields.password`; a link used meanwhile is 404 `link_not_valid`.
 */
export function redeemAccountLink(input: { token: string; password: string }): Promise<SessionJson> {
  return api.post<SessionJson>('/api/account-links/use', input);
}

export function useRedeemAccountLink() {
  return useMutation({ mutationFn: redeemAccountLink });
}
