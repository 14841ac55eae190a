import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BatteryJson, CreateBatteryInput } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';
import { batteriesQueryOptions } from './get-batteries';

/** `input.id` is made by the form and kept across resends, so a retried add makes no second battery. */
export function createBattery(input: CreateBatteryInput & { id: string }): Promise<BatteryJson> {
  return api.post<BatteryJson>('/api/batteries', input);
}

export function useCreateBattery() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBattery,
    // Awaited: the form stays busy until the table shows the new battery.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: batteriesQueryOptions().queryKey }),
        queryClient.invalidateQueries({ queryKey: ['battery-plan'] }),
      ]),
  });
}
