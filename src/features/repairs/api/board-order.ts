import { generateKeyBetween } from 'fractional-indexing';
import { placeByUrgency, REPAIR_STATUSES, type ColumnPlace, type RepairStatus } from '@shared/domain/repair-urgency';
import type { RepairJson, RepairSummaryJson } from '@shared/schemas/repairs';

type Placed = Pick<RepairSummaryJson, 'id' | 'status' | 'orderKey'>;

const COLUMN_RANK: Record<RepairStatus, number> = { reported: 0, in_progress: 1, needs_test: 2, done: 3 };

// Fractional keys are case-sensitive ("a0" < "aV" < "a_" < "ab"): they must be compared by code
// unit, as the server's binary collation does. localeCompare would put "aV" after "a_".
const byCode = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Board order: column, then order key, then id (the same order the server answers in). */
export function compareBoard(a: Placed, b: Placed): number {
  return COLUMN_RANK[a.status] - COLUMN_RANK[b.status] || byCode(a.orderKey, b.orderKey) || byCode(a.id, b.id);
}

/** The tickets of one column, in board order. */
export function columnOf<T extends Placed>(tickets: readonly T[], status: RepairStatus): T[] {
  return tickets.filter((ticket) => ticket.status === status).sort(compareBoard);
}

/** Every column, each in board order. */
export function columnsOf<T extends Placed>(tickets: readonly T[]): Record<RepairStatus, T[]> {
  return Object.fromEntries(REPAIR_STATUSES.map((status) => [status, columnOf(tickets, status)])) as Record<RepairStatus, T[]>;
}

/** The order key for a card put between two neighbours (ids in `column`); null when the keys do not allow one. */
export function keyBetween(column: readonly Placed[], place: ColumnPlace): string | null {
  const after = place.afterId === null ? null : (column.find((card) => card.id === place.afterId)?.orderKey ?? undefined);
  const before = place.beforeId === null ? null : (column.find((card) => card.id === place.beforeId)?.orderKey ?? undefined);
  if (after === undefined || before === undefined) return null;
  try {
    return generateKeyBetween(after, before);
  } catch {
    // Keys out of order in a stale cache: the server's answer will place it.
    return null;
  }
}

/** Where a card will sit: by hand when `byHand` is given, else where urgency puts it (as the server does). */
export function placeIn(tickets: readonly RepairJson[], ticket: RepairJson, status: RepairStatus, byHand: ColumnPlace | null): ColumnPlace {
  if (byHand) return byHand;
  const column = columnOf(tickets, status).filter((card) => card.id !== ticket.id);
  return placeByUrgency(column, { ...ticket, status });
}

/**
 * The ticket as the server will answer a move, before it does: in its new column, with an order
 * key between its neighbours. Same placement rule as the server, so the card does not jump when
 * the answer comes.
 */
export function movedTicket(tickets: readonly RepairJson[], ticket: RepairJson, status: RepairStatus, byHand: ColumnPlace | null): RepairJson {
  const place = placeIn(tickets, ticket, status, byHand);
  const column = columnOf(tickets, status).filter((card) => card.id !== ticket.id);
  const orderKey = keyBetween(column, place) ?? ticket.orderKey;
  const leavingDone = ticket.status === 'done' && status !== 'done';
  return {
    ...ticket,
    status,
    orderKey,
    placedByHand: byHand !== null,
    doneAt: status === 'done' ? (ticket.doneAt ?? new Date().toISOString()) : leavingDone ? null : ticket.doneAt,
  };
}

/** 1-based position of a card in its column and the column's length, for announcements. */
export function positionIn(column: readonly Placed[], id: string): { position: number; of: number } {
  return { position: column.findIndex((card) => card.id === id) + 1, of: column.length };
}
