import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UseJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';
import { serverNow } from '../../../lib/server-clock';
import { invalidateUse } from './record-use';

export function endUse(useId: string, removedAt: string): Promise<UseJson> {
  return api.patch<UseJson>(`/api/battery-uses/${encodeURIComponent(useId)}`, { removedAt });
}

/** Takes the battery out of the robot (it becomes spent), at the moment of the tap on the server's clock. */
export function useEndUse() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (useId: string) => endUse(useId, serverNow().toISOString()),
    onSuccess: (use) => invalidateUse(queryClient, use),
  });
}
