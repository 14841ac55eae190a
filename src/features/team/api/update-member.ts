import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MemberJson, UpdateMemberInput } from '@shared/schemas/team';
import { api, isApiError } from '../../../lib/api-client';
import { useViewer } from '../../../lib/authorization';
import { membersQueryOptions } from './get-members';

export function updateMember({ id, ...changes }: UpdateMemberInput & { id: string }): Promise<MemberJson> {
  return api.patch<MemberJson>(`/api/team/members/${encodeURIComponent(id)}`, changes);
}

export function useUpdateMember() {
  const queryClient = useQueryClient();
  const { membership } = useViewer();
  return useMutation({
    mutationFn: updateMember,
    onSuccess: (_member, { id }) => {
      // Changing one's own roles changes what the session allows, and so what the shell shows.
      if (id === membership.id) void queryClient.invalidateQueries({ queryKey: ['session'] });
      return queryClient.invalidateQueries({ queryKey: membersQueryOptions().queryKey });
    },
    onError: (error) => {
      // Someone else saved first: show the list as it is now so the next try starts from there.
      if (isApiError(error, 'stale')) void queryClient.invalidateQueries({ queryKey: membersQueryOptions().queryKey });
    },
  });
}
