import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SubsystemsInput, SubsystemsJson } from '@shared/schemas/repairs';
import { api, isApiError } from '../../../lib/api-client';
import { subsystemsQueryOptions } from './get-subsystems';

export function updateSubsystems(input: SubsystemsInput): Promise<SubsystemsJson> {
  return api.put<SubsystemsJson>('/api/team/repair-subsystems', input);
}

/** The list as someone else saved it, when the answer is a 409 `stale`. */
export function staleSubsystems(error: unknown): SubsystemsJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as SubsystemsJson) : null;
}

/** Saves the whole list in order (a lead's edit); entries without a key are new. */
export function useUpdateSubsystems() {
  const queryClient = useQueryClient();
  const key = subsystemsQueryOptions().queryKey;
  return useMutation({
    mutationFn: updateSubsystems,
    onSuccess: (saved) => queryClient.setQueryData(key, saved),
    onError: (error) => {
      const theirs = staleSubsystems(error);
      if (theirs) queryClient.setQueryData(key, theirs);
    },
  });
}
