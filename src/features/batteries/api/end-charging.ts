import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChargingSessionJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';
import { serverNow } from '../../../lib/server-clock';
import { invalidateCharging } from './start-charging';

export function endCharging(sessionId: string, endedAt: string): Promise<ChargingSessionJson> {
  return api.patch<ChargingSessionJson>(`/api/charging-sessions/${encodeURIComponent(sessionId)}`, { endedAt });
}

/** Takes a battery off its bay (it becomes ready), at the moment of the tap on the server's clock. */
export function useEndCharging() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (sessionId: string) => endCharging(sessionId, serverNow().toISOString()),
    onSuccess: (session) => invalidateCharging(queryClient, session.batteryId),
  });
}
