import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BatteryJson, UpdateBatteryInput } from '@shared/schemas/batteries';
import { api, isApiError } from '../../../lib/api-client';
import { batteriesQueryOptions } from './get-batteries';
import { batteryQueryKey } from './get-battery';

/** Sends only what changed, with the `version` it was based on; `{status: 'retired'}` retires it. */
export function updateBattery(id: string, changes: UpdateBatteryInput): Promise<BatteryJson> {
  return api.patch<BatteryJson>(`/api/batteries/${encodeURIComponent(id)}`, changes);
}

/** The battery as someone else saved it, when the answer is a 409 `stale`. */
export function staleBattery(error: unknown): BatteryJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as BatteryJson) : null;
}

export function useUpdateBattery(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: UpdateBatteryInput) => updateBattery(id, changes),
    // On a stale answer too: the page should show the other tablet's version behind the notice.
    // A retired battery leaves the rotation plan and may change readiness.
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: batteryQueryKey(id) }),
        queryClient.invalidateQueries({ queryKey: batteriesQueryOptions().queryKey }),
        queryClient.invalidateQueries({ queryKey: ['battery-plan'] }),
        queryClient.invalidateQueries({ queryKey: ['readiness'] }),
      ]),
  });
}
