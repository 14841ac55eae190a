import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateTemplateInput, TemplateJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';
import { templateQueryOptions } from './get-template';
import { templatesQueryOptions } from './get-templates';

/** `input.id` is chosen by the form and kept across resends, so a retried create makes no second template. */
export function createTemplate(input: CreateTemplateInput & { id: string }): Promise<TemplateJson> {
  return api.post<TemplateJson>('/api/checklist-templates', input);
}

export function useCreateTemplate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTemplate,
    onSuccess: (template) => {
      queryClient.setQueryData(templateQueryOptions(template.id).queryKey, template);
      return queryClient.invalidateQueries({ queryKey: templatesQueryOptions().queryKey });
    },
  });
}
