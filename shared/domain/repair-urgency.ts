/**
 * Repair urgency (DESIGN §4.5). Every open ticket is needed by the next queue call of ours; its
 * card shows the minutes left. A column is kept in order of urgency — severity first, then the
 * least slack (minutes left less the work still estimated) — except where a lead has placed a
 * card by hand. A blocking ticket that cannot make the queue call is late.
 *
 * Urgency only changes relative to other cards when a ticket's own severity or estimate changes:
 * all open tickets share one needed-by, so time passing moves every card alike. Placing a card
 * where urgency puts it when it is written therefore keeps the column in order, and a move
 * writes one row (its fractional order key).
 */

export const REPAIR_SEVERITIES = ['blocks_match', 'degraded', 'cosmetic'] as const;
export type RepairSeverity = (typeof REPAIR_SEVERITIES)[number];

export const REPAIR_STATUSES = ['reported', 'in_progress', 'needs_test', 'done'] as const;
export type RepairStatus = (typeof REPAIR_STATUSES)[number];

const SEVERITY_RANK: Record<RepairSeverity, number> = { blocks_match: 0, degraded: 1, cosmetic: 2 };

/** What urgency reads of a ticket; a ticket answer fits as it is. */
export interface UrgencyTicket {
  id: string;
  severity: RepairSeverity;
  status: RepairStatus;
  /** Whole minutes the fix is expected to take in all; null when nobody has guessed. */
  estimateMinutes: number | null;
  timeSpentMinutes: number;
  reportedAt: string;
}

export interface RepairUrgency {
  /** The next queue call (ISO instant); null when done or when no match of ours is ahead. */
  neededBy: string | null;
  /** Whole minutes to `neededBy`, rounded down; negative once it has passed. */
  minutesLeft: number | null;
  /** Minutes of work still estimated (estimate less time spent, never below 0); null with no estimate. */
  remainingMinutes: number | null;
  /** A blocking ticket that cannot make the queue call: it has passed, or the work left is longer. */
  late: boolean;
}

/** Urgency of one ticket at `now`, with `nextQueueAt` the next queue call of ours (or null). */
export function urgencyOf(ticket: UrgencyTicket, nextQueueAt: string | null, now: Date): RepairUrgency {
  const remainingMinutes = ticket.estimateMinutes === null ? null : Math.max(0, ticket.estimateMinutes - ticket.timeSpentMinutes);
  if (ticket.status === 'done' || nextQueueAt === null) return { neededBy: null, minutesLeft: null, remainingMinutes, late: false };
  const minutesLeft = Math.floor((Date.parse(nextQueueAt) - now.getTime()) / 60_000);
  const late = ticket.severity === 'blocks_match' && (minutesLeft <= 0 || (remainingMinutes !== null && remainingMinutes > minutesLeft));
  return { neededBy: nextQueueAt, minutesLeft, remainingMinutes, late };
}

/**
 * Negative when `a` is more urgent than `b`: severity, then more work left (less slack, as both
 * share the needed-by), then reported earlier, then id so that the order is total.
 */
export function compareUrgency(a: UrgencyTicket, b: UrgencyTicket): number {
  const remaining = (ticket: UrgencyTicket) => Math.max(0, (ticket.estimateMinutes ?? 0) - ticket.timeSpentMinutes);
  return (
    SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] ||
    remaining(b) - remaining(a) ||
    Date.parse(a.reportedAt) - Date.parse(b.reportedAt) ||
    (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)
  );
}

/** A card's neighbours in its column: place it after `afterId` and before `beforeId` (null at an end). */
export interface ColumnPlace {
  afterId: string | null;
  beforeId: string | null;
}

/**
 * Where urgency puts `ticket` in a column (listed in its current order, without the ticket):
 * before the first card that was not placed by hand and is less urgent. Cards a lead placed are
 * passed over, so they keep their place.
 */
export function placeByUrgency<T extends UrgencyTicket & { placedByHand: boolean }>(column: readonly T[], ticket: UrgencyTicket): ColumnPlace {
  const others = column.filter((card) => card.id !== ticket.id);
  const index = others.findIndex((card) => !card.placedByHand && compareUrgency(ticket, card) < 0);
  if (index === -1) return { afterId: others.at(-1)?.id ?? null, beforeId: null };
  return { afterId: others[index - 1]?.id ?? null, beforeId: others[index].id };
}
