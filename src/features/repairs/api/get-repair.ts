import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RepairDetailJson, RepairSummaryJson } from '@shared/schemas/repairs';
import { api } from '../../../lib/api-client';
import { repairQueryKey } from './repairs-cache';

/** A viewer gets the summary only (title and status). */
export type RepairAnswer = RepairDetailJson | RepairSummaryJson;

export const hasDetail = (repair: RepairAnswer): repair is RepairDetailJson => 'history' in repair;

export function getRepair(id: string, signal?: AbortSignal): Promise<RepairAnswer> {
  return api.get<RepairAnswer>(`/api/repairs/${encodeURIComponent(id)}`, signal);
}

export const repairQueryOptions = (id: string) =>
  queryOptions({
    // Starts with 'repair': a change announced by another tablet refetches the open ticket.
    queryKey: repairQueryKey(id),
    queryFn: ({ signal }) => getRepair(id, signal),
  });

/** One ticket with its photos and history (oldest photo first, newest change first). */
export function useRepair(id: string) {
  return useQuery(repairQueryOptions(id));
}
