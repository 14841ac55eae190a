import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TemplateJson } from '@shared/schemas/checks';
import { api } from '../../../lib/api-client';

export function getTemplate(id: string, signal?: AbortSignal): Promise<TemplateJson> {
  return api.get<TemplateJson>(`/api/checklist-templates/${encodeURIComponent(id)}`, signal);
}

export const templateQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['checklist-template', id],
    queryFn: ({ signal }) => getTemplate(id, signal),
  });

export function useTemplate(id: string) {
  return useQuery(templateQueryOptions(id));
}
