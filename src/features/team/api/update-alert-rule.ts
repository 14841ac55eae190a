import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AlertRuleInput, AlertRuleJson, AlertRuleKey, AlertRulesJson } from '@shared/schemas/mail';
import { api, isApiError } from '../../../lib/api-client';
import { alertRulesQueryOptions } from './get-alert-rules';

/** The rule's whole setting with the version it was based on; a newer one saved meanwhile answers 409 `stale`. */
export function updateAlertRule({ key, ...rule }: AlertRuleInput & { key: AlertRuleKey }): Promise<AlertRuleJson> {
  return api.put<AlertRuleJson>(`/api/team/alert-rules/${encodeURIComponent(key)}`, rule);
}

export function useUpdateAlertRule() {
  const queryClient = useQueryClient();
  const { queryKey } = alertRulesQueryOptions();
  return useMutation({
    mutationFn: updateAlertRule,
    onSuccess: (saved) => {
      queryClient.setQueryData<AlertRulesJson>(queryKey, (old) => old && { rules: old.rules.map((rule) => (rule.key === saved.key ? saved : rule)) });
    },
    onError: (error) => {
      // Someone else saved first: load what is stored now, ready for the reload the form offers.
      if (isApiError(error, 'stale')) void queryClient.invalidateQueries({ queryKey });
    },
  });
}
