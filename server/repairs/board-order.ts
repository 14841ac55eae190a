import { REPAIR_STATUSES, type UrgencyTicket } from '../../shared/domain/repair-urgency';
import type { Repair } from '../models';

// Code-unit order, as the column's ascii_bin collation sorts: never localeCompare for order keys.
const binary = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Board order: by column (the status order), then order key, then id. */
export const compareBoardOrder = (a: Repair, b: Repair) =>
  REPAIR_STATUSES.indexOf(a.status) - REPAIR_STATUSES.indexOf(b.status) || binary(a.orderKey, b.orderKey) || binary(a.id, b.id);

/** What urgency reads of a ticket, with whether a lead placed it. */
export const urgencyTicketOf = (repair: Repair): UrgencyTicket & { placedByHand: boolean } => ({
  id: repair.id,
  severity: repair.severity,
  status: repair.status,
  estimateMinutes: repair.estimateMinutes,
  timeSpentMinutes: repair.timeSpentMinutes,
  reportedAt: repair.createdAt.toISOString(),
  placedByHand: repair.placedByHand,
});
