import type { RepairStatus } from '@shared/domain/repair-urgency';
import { REPAIR_STATUSES } from '@shared/domain/repair-urgency';

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

/** Which place among `cards` (in their column, without the moving one) a dragged card whose middle is at `y` points to. */
export function indexAtY(cards: readonly { id: string }[], y: number, rectOf: (id: string) => DOMRect | undefined): number {
  let index = 0;
  for (const card of cards) {
    const rect = rectOf(card.id);
    if (rect && rect.top + rect.height / 2 < y) index += 1;
  }
  return index;
}
