import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TemplateJson, UpdateTemplateInput } from '@shared/schemas/checks';
import { api, isApiError } from '../../../lib/api-client';
import { templateQueryOptions } from './get-template';
import { templatesQueryOptions } from './get-templates';

/** `items`, when sent, replaces the list: items keep their `id`, new ones go without. */
export function updateTemplate(id: string, changes: UpdateTemplateInput): Promise<TemplateJson> {
  return api.patch<TemplateJson>(`/api/checklist-templates/${encodeURIComponent(id)}`, changes);
}

/** The template as someone else saved it, when the answer is a 409 `stale`. */
export function staleTemplate(error: unknown): TemplateJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as TemplateJson) : null;
}

export function useUpdateTemplate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: UpdateTemplateInput }) => updateTemplate(id, changes),
    onSuccess: (template) => {
      queryClient.setQueryData(templateQueryOptions(template.id).queryKey, template);
      return queryClient.invalidateQueries({ queryKey: templatesQueryOptions().queryKey });
    },
    onError: (error, { id }) => {
      const theirs = staleTemplate(error);
      if (!theirs) return;
      // The list and any other view of this template should show their version too; the open
      // editor keeps the user's input (it was mounted with the version it started from).
      queryClient.setQueryData(templateQueryOptions(id).queryKey, theirs);
      return queryClient.invalidateQueries({ queryKey: templatesQueryOptions().queryKey });
    },
  });
}
