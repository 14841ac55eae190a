import type { RepairSeverity, RepairStatus } from '@shared/domain/repair-urgency';
import { formatZonedDay, formatZonedTime } from '../../../lib/dates';
import { formatMinutes } from '../../../lib/match-labels';
import type { EditField } from './repair-form-values';
import { SEVERITY_WORDS, STATUS_LABELS } from './repair-words';

/** Turns the ids a ticket stores into what people call them. */
export interface Namers {
  subsystem: (key: string) => string;
  match: (matchId: string) => string | null;
  person: (userId: string) => string | null;
}

export type TicketField = EditField | 'status';

export const FIELD_LABELS: Record<TicketField, string> = {
  title: 'Title',
  description: 'Description',
  severity: 'Severity',
  subsystem: 'Subsystem',
  assigneeId: 'Assigned to',
  foundInMatchId: 'Found in',
  estimateMinutes: 'Estimate',
  timeSpentMinutes: 'Time spent',
  partsUsed: 'Parts used',
  resolutionNote: 'Resolution note',
  status: 'Column',
};

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A stored value of a field in words: "Blocks match", "20 min", "Sam R.", "none". */
export function formatValue(field: TicketField, value: unknown, names: Namers): string {
  if (value === null || value === undefined || value === '' || (Array.isArray(value) && value.length === 0)) {
    return field === 'assigneeId' ? 'nobody' : 'none';
  }
  switch (field) {
    case 'severity':
      return SEVERITY_WORDS[value as RepairSeverity] ?? String(value);
    case 'status':
      return STATUS_LABELS[value as RepairStatus] ?? String(value);
    case 'subsystem':
      return names.subsystem(String(value));
    case 'foundInMatchId':
      return names.match(String(value)) ?? 'a match no longer in the schedule';
    case 'assigneeId': {
      // History may carry ids or, from an older answer, names.
      const text = String(value);
      return names.person(text) ?? (UUID.test(text) ? 'a former member' : text);
    }
    case 'estimateMinutes':
    case 'timeSpentMinutes':
      return typeof value === 'number' ? formatMinutes(value) : String(value);
    case 'partsUsed':
      return Array.isArray(value) ? value.join(', ') : String(value);
    default:
      return String(value);
  }
}

/** "10:42" today, "Sat 5 Dec, 10:42" on another day, in the event's zone. */
export function formatWhen(at: string, timeZone: string, now: Date): string {
  const instant = new Date(at);
  const time = formatZonedTime(instant, timeZone, false);
  const day = formatZonedDay(instant, timeZone);
  return day === formatZonedDay(now, timeZone) ? time : `${day}, ${time}`;
}
