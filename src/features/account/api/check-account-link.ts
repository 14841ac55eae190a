import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AccountLinkJson } from '@shared/schemas/mail';
import { api } from '../../../lib/api-client';

/** What a one-time link is for; 404 `link_not_valid` when it is unknown, used, revoked or expired (one answer for all). */
export function checkAccountLink(token: string): Promise<AccountLinkJson> {
  return api.post<AccountLinkJson>('/api/account-links/check', { token });
}

export const accountLinkQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['account-link', token],
    queryFn: () => checkAccountLink(token),
    // Checked once per visit: once the link is used, a refocus would only turn the page into "not valid".
    staleTime: Infinity,
    refetchOnWindowFocus: false,
    refetchOnReconnect: false,
  });

export function useAccountLink(token: string) {
  return useQuery(accountLinkQueryOptions(token));
}
