import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AlertRulesJson } from '@shared/schemas/mail';
import { api } from '../../../lib/api-client';

/** Always all three rules; one the team never changed comes with its default roles and version 0. */
export function getAlertRules(signal?: AbortSignal): Promise<AlertRulesJson> {
  return api.get<AlertRulesJson>('/api/team/alert-rules', signal);
}

export const alertRulesQueryOptions = () =>
  queryOptions({
    queryKey: ['alert-rules'],
    queryFn: ({ signal }) => getAlertRules(signal),
  });

export function useAlertRules() {
  return useQuery(alertRulesQueryOptions());
}
