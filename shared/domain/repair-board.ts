/**
 * The repair board's order and placement, one copy for both sides: the server answers and writes
 * in this order, and a tablet shows a move where the server will put it, so that a card does not
 * jump when the answer comes.
 *
 * Board order is by column (the statuses in order), then by the fractional order key, then by id.
 * Order keys are case-sensitive ("a0" < "aV" < "a_" < "ab"): they are compared by code unit, as
 * the column's binary collation sorts them. localeCompare would put "aV" after "a_" and "ab".
 */
import { generateKeyBetween } from 'fractional-indexing';
import { placeByUrgency, REPAIR_STATUSES, type ColumnPlace, type RepairStatus, type UrgencyTicket } from './repair-urgency';

/** What board order reads of a card: a ticket answer, a viewer's summary and the server's model all fit. */
export interface BoardCard {
  id: string;
  status: RepairStatus;
  orderKey: string;
}

/** What placing a card reads of it: its place, what urgency reads, and the fields a move changes. */
export interface BoardTicket extends BoardCard, UrgencyTicket {
  placedByHand: boolean;
  doneAt: string | null;
}

const COLUMN_RANK = Object.fromEntries(REPAIR_STATUSES.map((status, rank) => [status, rank])) as Record<RepairStatus, number>;

const byCodeUnit = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Board order: column, then order key by code unit, then id. */
export function compareBoardOrder(a: BoardCard, b: BoardCard): number {
  return COLUMN_RANK[a.status] - COLUMN_RANK[b.status] || byCodeUnit(a.orderKey, b.orderKey) || byCodeUnit(a.id, b.id);
}

/** The cards of one column, in board order. */
export function columnOf<T extends BoardCard>(cards: readonly T[], status: RepairStatus): T[] {
  return cards.filter((card) => card.status === status).sort(compareBoardOrder);
}

/** Every column, each in board order. */
export function columnsOf<T extends BoardCard>(cards: readonly T[]): Record<RepairStatus, T[]> {
  return Object.fromEntries(REPAIR_STATUSES.map((status) => [status, columnOf(cards, status)])) as Record<RepairStatus, T[]>;
}

/** A column without the card that moves: its places are counted and named among the others. */
const othersIn = <T extends BoardCard>(cards: readonly T[], status: RepairStatus, movingId: string) =>
  columnOf(cards, status).filter((card) => card.id !== movingId);

/** The order key for a card put between two neighbours (ids in `column`); null when the keys do not allow one. */
export function keyBetween(column: readonly BoardCard[], place: ColumnPlace): string | null {
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

/** Where a card will sit in `status`: by hand when `byHand` is given, else where urgency puts it (as the server does). */
export function placeIn<T extends BoardTicket>(tickets: readonly T[], ticket: T, status: RepairStatus, byHand: ColumnPlace | null): ColumnPlace {
  if (byHand) return byHand;
  return placeByUrgency(othersIn(tickets, status, ticket.id), { ...ticket, status });
}

/**
 * The ticket as the server will answer a move, before it does: in its new column, with an order
 * key between its neighbours (its old key when none can be made: the answer will place it), and
 * with `doneAt` set on reaching done and cleared on leaving it.
 */
export function movedTicket<T extends BoardTicket>(tickets: readonly T[], ticket: T, status: RepairStatus, byHand: ColumnPlace | null, now = new Date()): T {
  const place = placeIn(tickets, ticket, status, byHand);
  const orderKey = keyBetween(othersIn(tickets, status, ticket.id), place) ?? ticket.orderKey;
  const leavingDone = ticket.status === 'done' && status !== 'done';
  return {
    ...ticket,
    status,
    orderKey,
    placedByHand: byHand !== null,
    doneAt: status === 'done' ? (ticket.doneAt ?? now.toISOString()) : leavingDone ? null : ticket.doneAt,
  };
}

/** 1-based position of a card in its column and the column's length, for announcements. */
export function positionIn(column: readonly BoardCard[], id: string): { position: number; of: number } {
  return { position: column.findIndex((card) => card.id === id) + 1, of: column.length };
}

/** Where a dragged card is over: a column, and a place among the cards shown there (without the card itself). */
export interface DropTarget {
  status: RepairStatus;
  index: number;
}

/** What a drop there would do. */
export interface Landing {
  status: RepairStatus;
  /** Place among the column's shown cards, without the moving one. */
  index: number;
  /** Neighbours to send; null when urgency places it (the crew's moves, and a lead's drop where urgency would put it anyway). */
  byHand: ColumnPlace | null;
  /** Dropped where it already is: nothing to send. */
  unchanged: boolean;
  /** 1-based place and column length after the move, for what is announced. */
  position: number;
  of: number;
}

/** Where a place in the whole column (filters ignored) falls among the cards shown. */
function shownIndexOf(all: readonly BoardCard[], shown: readonly BoardCard[], place: ColumnPlace): number {
  const insertAt = place.beforeId === null ? all.length : all.findIndex((card) => card.id === place.beforeId);
  const shownIds = new Set(shown.map((card) => card.id));
  return all.slice(0, insertAt === -1 ? all.length : insertAt).filter((card) => shownIds.has(card.id)).length;
}

/**
 * The outcome of dropping `ticket` at `target`, with `shown` the cards each column shows (filters
 * applied, board order). The crew's cards go where urgency puts them, the same rule the server
 * applies; a lead places by hand, except that a move to another column dropped where urgency
 * would put it anyway stays ordered by urgency.
 */
export function landingOf<T extends BoardTicket>({ tickets, shown, ticket, target, byHandAllowed }: {
  tickets: readonly T[];
  shown: Record<RepairStatus, readonly T[]>;
  ticket: T;
  target: DropTarget;
  byHandAllowed: boolean;
}): Landing {
  const column = shown[target.status].filter((card) => card.id !== ticket.id);
  const urgencyIndex = shownIndexOf(othersIn(tickets, target.status, ticket.id), column, placeIn(tickets, ticket, target.status, null));
  const sameColumn = target.status === ticket.status;
  const originalIndex = Math.max(0, shown[ticket.status].findIndex((card) => card.id === ticket.id));

  let index: number;
  let byHand: ColumnPlace | null = null;
  if (!byHandAllowed) {
    index = sameColumn ? originalIndex : urgencyIndex;
  } else {
    index = Math.max(0, Math.min(target.index, column.length));
    if (sameColumn || index !== urgencyIndex) byHand = { afterId: column[index - 1]?.id ?? null, beforeId: column[index]?.id ?? null };
  }
  const unchanged = sameColumn && index === originalIndex;
  return { status: target.status, index, byHand: unchanged ? null : byHand, unchanged, position: index + 1, of: column.length + 1 };
}
