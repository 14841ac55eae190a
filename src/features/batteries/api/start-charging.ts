import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChargingSessionJson, StartChargingInput } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

/** Puts a battery on a charger bay (a busy bay answers 409 `bay_busy`). */
export function startCharging(batteryId: string, input: StartChargingInput & { id: string }): Promise<ChargingSessionJson> {
  return api.post<ChargingSessionJson>(`/api/batteries/${encodeURIComponent(batteryId)}/charging`, input);
}

export function useStartCharging() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ batteryId, ...input }: StartChargingInput & { id: string; batteryId: string }) => startCharging(batteryId, input),
    // Awaited: the bay keeps its spinner until the list shows the battery on it.
    onSuccess: (session) => invalidateCharging(queryClient, session.batteryId),
  });
}

/** A battery went on or off a charger: its status, the bays and the plan all change. */
export function invalidateCharging(queryClient: ReturnType<typeof useQueryClient>, batteryId: string) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: ['batteries'] }),
    queryClient.invalidateQueries({ queryKey: ['battery', batteryId] }),
    queryClient.invalidateQueries({ queryKey: ['battery-plan'] }),
  ]);
}
