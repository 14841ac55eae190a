import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateUseInput, UseJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

/** Installs a battery in the robot for one of our matches of the current event. */
export function recordUse(batteryId: string, input: CreateUseInput & { id: string }): Promise<UseJson> {
  return api.post<UseJson>(`/api/batteries/${encodeURIComponent(batteryId)}/uses`, input);
}

/** A battery went into or came out of the robot: its status, the plan and the match's readiness change. */
export function invalidateUse(queryClient: ReturnType<typeof useQueryClient>, use: UseJson) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: ['batteries'] }),
    queryClient.invalidateQueries({ queryKey: ['battery', use.batteryId] }),
    queryClient.invalidateQueries({ queryKey: ['battery-plan'] }),
    queryClient.invalidateQueries({ queryKey: ['readiness'] }),
  ]);
}

export function useRecordUse() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ batteryId, ...input }: CreateUseInput & { id: string; batteryId: string }) => recordUse(batteryId, input),
    onSuccess: (use) => invalidateUse(queryClient, use),
  });
}
