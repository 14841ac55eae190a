import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateMemberInput, CreatedMemberJson } from '@shared/schemas/team';
import { api } from '../../../lib/api-client';
import { membersQueryOptions } from './get-members';

/** `input.id` is chosen by the form and kept across resends, so a retried add makes no second member. */
export function createMember(input: CreateMemberInput & { id: string }): Promise<CreatedMemberJson> {
  return api.post<CreatedMemberJson>('/api/team/members', input);
}

export function useCreateMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: membersQueryOptions().queryKey }),
  });
}
