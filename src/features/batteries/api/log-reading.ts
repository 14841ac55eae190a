import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BatteryDetailJson, BatteryJson, CreatedReadingJson, ReadingInput, ReadingJson } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';
import { batteriesQueryOptions } from './get-batteries';
import { batteryQueryKey } from './get-battery';

export interface LogReadingVariables {
  batteryId: string;
  /** `id` is made by the form and kept across resends, so a retried reading is stored once. */
  input: ReadingInput & { id: string };
}

export function logReading({ batteryId, input }: LogReadingVariables): Promise<CreatedReadingJson> {
  return api.post<CreatedReadingJson>(`/api/batteries/${encodeURIComponent(batteryId)}/readings`, input);
}

/**
 * Logs a reading. The answer carries the reading's charge and the battery's health after it, so
 * the fleet table and the battery page take them at once, before their refetch comes back.
 */
export function useLogReading() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logReading,
    onSuccess: ({ health, ...reading }: CreatedReadingJson) => {
      const latest: ReadingJson = reading;
      // The newest reading sets the estimated charge too (nothing has happened since it).
      const fresh = { latestReading: latest, estimatedChargePercent: latest.stateOfChargePercent, health };
      queryClient.setQueryData<BatteryJson[]>(batteriesQueryOptions().queryKey, (list) =>
        list?.map((battery) => (battery.id === latest.batteryId ? { ...battery, ...fresh } : battery)),
      );
      queryClient.setQueryData<BatteryDetailJson>(batteryQueryKey(latest.batteryId), (battery) =>
        battery && { ...battery, ...fresh, readings: [...battery.readings.filter((old) => old.id !== latest.id), latest] },
      );
      // Not awaited: the form shows the answer at once; the lists catch up in the background.
      for (const queryKey of [['batteries'], ['battery', latest.batteryId], ['battery-plan'], ['readiness']]) {
        void queryClient.invalidateQueries({ queryKey });
      }
    },
  });
}
