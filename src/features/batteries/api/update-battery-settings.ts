import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BatterySettings } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';
import { batterySettingsQueryOptions } from './get-battery-settings';

/** Sends only the settings that changed; the answer is the whole set. */
export function updateBatterySettings(changes: Partial<BatterySettings>): Promise<BatterySettings> {
  return api.patch<BatterySettings>('/api/team/battery-settings', changes);
}

export function useUpdateBatterySettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateBatterySettings,
    onSuccess: (settings) => {
      queryClient.setQueryData(batterySettingsQueryOptions().queryKey, settings);
      // Health, state of charge and the plan are all computed with these settings.
      return Promise.all(
        [['batteries'], ['battery'], ['battery-plan'], ['readiness']].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
    },
  });
}
