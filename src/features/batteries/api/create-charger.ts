import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChargerJson, CreateChargerInput } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

/** Adds a charger; `id` is made by the caller and kept across resends, so a retry adds nothing twice. */
export function createCharger(input: CreateChargerInput & { id: string }): Promise<ChargerJson> {
  return api.post<ChargerJson>('/api/chargers', input);
}

export function useCreateCharger() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCharger,
    // More bays change when each battery can charge.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['chargers'] }),
        queryClient.invalidateQueries({ queryKey: ['battery-plan'] }),
      ]),
  });
}
