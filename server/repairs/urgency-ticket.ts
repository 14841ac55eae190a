import type { UrgencyTicket } from '../../shared/domain/repair-urgency';
import type { Repair } from '../models';

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
