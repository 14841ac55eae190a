import { format, parseISO } from 'date-fns';
import type { AlertReason, IncidentClass, IncidentClassification, TreatmentCode } from '@shared/domain/incident-classification';
import { TREATMENT_LABELS } from '@shared/domain/incident-classification';
import { INVOLVED_ROLE_LABELS, type IncidentStatus, type InvolvedPersonJson } from '@shared/schemas/incidents';
import { formatZonedDay, formatZonedTime } from '../../../lib/dates';

export const CLASS_LABELS: Record<IncidentClass, string> = {
  near_miss: 'Near miss',
  first_aid_only: 'First aid only',
  beyond_first_aid: 'Beyond first aid',
};

export const REASON_LABELS: Record<AlertReason, string> = {
  beyond_first_aid: 'care beyond first aid',
  loss_of_consciousness: 'someone lost consciousness',
  battery_or_chemical: 'battery acid or a chemical',
};

export const STATUS_LABELS: Record<IncidentStatus, string> = { open: 'Open', closed: 'Closed' };

/** "Sat 5 Dec, 14:05" on the event's clock. */
export const formatWhen = (instant: string, timeZone: string) => `${formatZonedDay(new Date(instant), timeZone)}, ${formatZonedTime(new Date(instant), timeZone, false)}`;

/** A due date (a calendar day) as "Mon 7 Dec"; no zone arithmetic. */
export const formatDay = (day: string) => format(parseISO(day), 'EEE d MMM');

/** "AB (Student on the team)" */
export const personLabel = (person: InvolvedPersonJson) => `${person.initials} (${INVOLVED_ROLE_LABELS[person.role]})`;

export const treatmentsText = (codes: readonly TreatmentCode[]) => codes.map((code) => TREATMENT_LABELS[code]).join('; ');

/** "a, b and c" */
export function listWords(words: string[]): string {
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
}

/** What decided the class, in plain words. */
export const basisText = ({ basis }: IncidentClassification) => (basis.length > 0 ? `Because of: ${treatmentsText(basis)}.` : 'No care was needed.');
