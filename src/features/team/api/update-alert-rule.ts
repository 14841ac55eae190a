import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AlertRuleInput, AlertRuleJson, AlertRuleKey, AlertRulesJson } from '@shared/schemas/mail';
import { api, isApiError } from '../../../lib/api-client';
import { alertRulesQueryOptions } from './get-alert-rules';

/** The rule as stored now, when a save answers 409 `stale`. */
export function staleAlertRule(error: unknown): AlertRuleJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as AlertRuleJson) : null;
}

/** The rule's whole setting with the version it was based on; a newer one saved meanwhile answers 409 `stale`. */
export function updateAlertRule({ key, ...rule }: AlertRuleInput & { key: AlertRuleKey }): Promise<AlertRuleJson> {
  return api.put<AlertRuleJson>(`/api/team/alert-rules/${encodeURIComponent(key)}`, rule);
}

export function useUpdateAlertRule() {
  const queryClient = useQueryClient();
  const { queryKey } = alertRulesQueryOptions();
  const store = (saved: AlertRuleJson) =>
    queryClient.setQueryData<AlertRulesJson>(queryKey, (old) => old && { rules: old.rules.map((rule) => (rule.key === saved.key ? saved : rule)) });
  return useMutation({
    mutationFn: updateAlertRule,
    onSuccess: store,
    onError: (error) => {
      // Someone else saved first (or this tablet did, and the answer was lost): the answer carries
      // what is stored now, ready for the reload the form offers.
      const current = staleAlertRule(error);
      if (current) store(current);
    },
  });
}
