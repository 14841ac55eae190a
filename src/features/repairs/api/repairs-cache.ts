import type { Mutation, QueryClient } from '@tanstack/react-query';
import { compareBoardOrder } from '@shared/domain/repair-board';
import type { RepairJson, RepairListJson } from '@shared/schemas/repairs';
import { isApiError } from '../../../lib/api-client';

export const repairsQueryKey = (eventId: string) => ['repairs', eventId] as const;
export const repairQueryKey = (id: string) => ['repair', id] as const;
/** Every board move of an event shares this key: the overlay below finds them by it. */
export const movesMutationKey = (eventId: string) => ['repair-moves', eventId] as const;

/** A list with full tickets (everyone but viewers). */
export type DetailedListJson = RepairListJson & { repairs: RepairJson[]; detail: true };

export const isDetailed = (list: RepairListJson | undefined): list is DetailedListJson => list?.detail === true;

/** The list with one ticket replaced (or added), kept in board order. */
export function withTicket(list: RepairListJson, ticket: RepairJson): RepairListJson {
  if (!isDetailed(list)) return list;
  const repairs = [...list.repairs.filter((other) => other.id !== ticket.id), ticket].sort(compareBoardOrder);
  return { ...list, repairs };
}

/** The ticket as someone else saved it, when a write answers 409 `stale`. */
export function staleRepair(error: unknown): RepairJson | null {
  if (!isApiError(error, 'stale')) return null;
  const current = error.details.current;
  return current && typeof current === 'object' ? (current as RepairJson) : null;
}

/** What a move's `onMutate` leaves for the overlay, the rollback and the notice. */
export interface MoveContext {
  previous: RepairJson;
  optimistic: RepairJson;
  /** The server's answer, once in (the mutation still counts as pending while its callbacks run). */
  confirmed?: RepairJson;
  /** Refused by the server (the mutation still counts as pending while its rollback and refetch run): nothing to lay over. */
  failed?: boolean;
}

type MoveMutation = Mutation<RepairJson, Error, unknown, MoveContext>;

/**
 * Lays this tablet's moves still on their way over a list from the server: a refetch caused by
 * another tablet's change must not snap a card back while its move is in flight. A ticket the
 * server already has newer than the move was based on is left as the server says.
 */
export function withPendingMoves(list: RepairListJson, client: QueryClient, eventId: string): RepairListJson {
  if (!isDetailed(list)) return list;
  const pending = client.getMutationCache().findAll({ mutationKey: movesMutationKey(eventId), status: 'pending' }) as MoveMutation[];
  let result: RepairListJson = list;
  for (const mutation of pending) {
    const context = mutation.state.context;
    if (!context || context.failed) continue;
    const onServer = list.repairs.find((ticket) => ticket.id === context.previous.id);
    if (!onServer) continue;
    if (context.confirmed) {
      if (onServer.version < context.confirmed.version) result = withTicket(result, context.confirmed);
    } else if (onServer.version === context.previous.version) {
      result = withTicket(result, context.optimistic);
    }
  }
  return result;
}
