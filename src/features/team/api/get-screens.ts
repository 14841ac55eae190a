import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ScreenJson } from '@shared/schemas/screens';
import { api } from '../../../lib/api-client';

export function getScreens(signal?: AbortSignal): Promise<ScreenJson[]> {
  return api.get<ScreenJson[]>('/api/team/screens', signal);
}

export const screensQueryOptions = () =>
  queryOptions({
    queryKey: ['screens'],
    queryFn: ({ signal }) => getScreens(signal),
  });

export function useScreens(enabled = true) {
  return useQuery({ ...screensQueryOptions(), enabled });
}
