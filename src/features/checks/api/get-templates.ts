import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TemplateJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';

export function getTemplates(signal?: AbortSignal): Promise<TemplateJson[]> {
  return api.get<TemplateJson[]>('/api/checklist-templates', signal);
}

export const templatesQueryOptions = () =>
  queryOptions({
    // Starts with 'checklist-templates' so edits saved on other tablets reach it.
    queryKey: ['checklist-templates'],
    queryFn: ({ signal }) => getTemplates(signal),
  });

/** The team's templates, each with its current version, by phase then name. */
export function useTemplates() {
  return useQuery(templatesQueryOptions());
}
