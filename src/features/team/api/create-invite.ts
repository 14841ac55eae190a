import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateInviteInput, InviteJson } from '@shared/schemas/mail';
import { api } from '../../../lib/api-client';
import { invitesQueryOptions } from './get-invites';

/**
 * Answers 202 once the mail is queued (sending happens after). `input.id` is kept across resends,
 * so a retried invite sends no second mail. An address already in the team is 409
 * `already_member` with `fields.email`; any other address gets the same answer, account or not.
 */
export function createInvite(input: CreateInviteInput & { id: string }): Promise<{ invite: InviteJson }> {
  return api.post<{ invite: InviteJson }>('/api/team/invites', input);
}

export function useCreateInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitesQueryOptions().queryKey }),
  });
}
