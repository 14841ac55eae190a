import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailFailuresJson } from '@shared/schemas/mail';
import { api } from '../../../lib/api-client';

/** Mail given up after every retry. Admins see every kind; safety captains see incident alerts only. */
export function getMailFailures(signal?: AbortSignal): Promise<MailFailuresJson> {
  return api.get<MailFailuresJson>('/api/team/mail-failures', signal);
}

export const mailFailuresQueryOptions = () =>
  queryOptions({
    queryKey: ['mail-failures'],
    queryFn: ({ signal }) => getMailFailures(signal),
    // No socket event announces a failure (it happens minutes after the write, in the sender):
    // an open team page looks again now and then.
    refetchInterval: 60_000,
  });

export function useMailFailures() {
  return useQuery(mailFailuresQueryOptions());
}
