import type { ColumnPlace, RepairStatus } from '@shared/domain/repair-urgency';
import { REPAIR_STATUSES } from '@shared/domain/repair-urgency';
import type { RepairJson } from '@shared/schemas/repairs';
import { columnOf, placeIn } from '../api/board-order';

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

// Columns are droppable as a whole too (an empty column, the space below its last card). Their
// ids cannot be mistaken for a ticket's UUID.
const COLUMN_PREFIX = 'column:';
export const columnDropId = (status: RepairStatus) => `${COLUMN_PREFIX}${status}`;
export function statusOfColumnId(id: string | number): RepairStatus | null {
  const text = String(id);
  if (!text.startsWith(COLUMN_PREFIX)) return null;
  const status = text.slice(COLUMN_PREFIX.length);
  return (REPAIR_STATUSES as readonly string[]).includes(status) ? (status as RepairStatus) : null;
}

/** Where a place in the whole column (filters ignored) falls among the cards shown. */
function shownIndexOf(all: readonly RepairJson[], shown: readonly RepairJson[], place: ColumnPlace): number {
  const insertAt = place.beforeId === null ? all.length : all.findIndex((card) => card.id === place.beforeId);
  const shownIds = new Set(shown.map((card) => card.id));
  return all.slice(0, insertAt === -1 ? all.length : insertAt).filter((card) => shownIds.has(card.id)).length;
}

/**
 * The outcome of dropping `ticket` at `target`. The crew's cards go where urgency puts them, the
 * same rule the server applies; a lead places by hand, except that a move to another column
 * dropped where urgency would put it anyway stays ordered by urgency.
 */
export function landingOf({ tickets, shown, ticket, target, byHandAllowed }: {
  tickets: readonly RepairJson[];
  shown: Record<RepairStatus, RepairJson[]>;
  ticket: RepairJson;
  target: DropTarget;
  byHandAllowed: boolean;
}): Landing {
  const column = shown[target.status].filter((card) => card.id !== ticket.id);
  const all = columnOf(tickets, target.status).filter((card) => card.id !== ticket.id);
  const urgencyIndex = shownIndexOf(all, column, placeIn(tickets, ticket, target.status, null));
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

/** Which place among `cards` (in their column, without the moving one) a dragged card whose middle is at `y` points to. */
export function indexAtY(cards: readonly { id: string }[], y: number, rectOf: (id: string) => DOMRect | undefined): number {
  let index = 0;
  for (const card of cards) {
    const rect = rectOf(card.id);
    if (rect && rect.top + rect.height / 2 < y) index += 1;
  }
  return index;
}
