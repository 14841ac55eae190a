import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailboxJson } from '@shared/schemas/mail';
import { api, isApiError } from '../../../lib/api-client';

/**
 * What the local SMTP fake caught for this team, newest first. 404 `mailbox_off` when mail goes
 * to a real server instead.
 */
export function getMailbox(signal?: AbortSignal): Promise<MailboxJson> {
  return api.get<MailboxJson>('/api/mailbox', signal);
}

export const mailboxQueryOptions = () =>
  queryOptions({
    queryKey: ['mailbox'],
    queryFn: ({ signal }) => getMailbox(signal),
    // Mail is sent after the write that queued it, so it lands a moment later: look again while
    // the page is open, unless there is no mailbox to look in.
    refetchInterval: (query) => (isApiError(query.state.error, 'mailbox_off') ? false : 5_000),
  });

export function useMailbox() {
  return useQuery(mailboxQueryOptions());
}
