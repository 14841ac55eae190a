import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateScreenInput, CreatedScreenJson } from '@shared/schemas/screens';
import { api } from '../../../lib/api-client';
import { screensQueryOptions } from './get-screens';

/** `input.id` is chosen by the form and kept across resends, so a retried add makes no second screen. */
export function createScreen(input: CreateScreenInput & { id: string }): Promise<CreatedScreenJson> {
  return api.post<CreatedScreenJson>('/api/team/screens', input);
}

export function useCreateScreen() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createScreen,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: screensQueryOptions().queryKey }),
  });
}
