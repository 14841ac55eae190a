import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BatterySettings } from '@shared/schemas/batteries';
import { api } from '../../../lib/api-client';

export function getBatterySettings(signal?: AbortSignal): Promise<BatterySettings> {
  return api.get<BatterySettings>('/api/team/battery-settings', signal);
}

export const batterySettingsQueryOptions = () =>
  queryOptions({
    queryKey: ['battery-settings'],
    queryFn: ({ signal }) => getBatterySettings(signal),
  });

/** The team's thresholds and charging figures (defaults until a manager changes them). */
export function useBatterySettings() {
  return useQuery(batterySettingsQueryOptions());
}
