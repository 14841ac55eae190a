import { formatClock, localDate } from '../../shared/domain/event-clock';
import { TREATMENT_LABELS, type IncidentClass, type TreatmentCode } from '../../shared/domain/incident-classification';
import { INVOLVED_ROLE_LABELS, KIND_LABELS, LOCATION_LABELS, type IncidentJson } from '../../shared/schemas/incidents';

const CLASS_LABELS: Record<IncidentClass, string> = {
  near_miss: 'Near miss',
  first_aid_only: 'First aid only',
  beyond_first_aid: 'Beyond first aid',
};

const HEADER = [
  'Occurred (UTC)',
  'Occurred (local time)',
  'Time zone',
  'Location',
  'Kind',
  'Class',
  'Basis',
  'Treatments',
  'People involved',
  'What happened',
  'Immediate actions',
  'Follow-up actions',
  'Status',
  'Closing note',
  'Battery',
  'Reported by',
  'Reported at (UTC)',
];

/**
 * One cell: a text a spreadsheet would run as a formula (starting with = + - @, a tab or a
 * carriage return) gets a leading apostrophe, so it shows as text; a cell with a quote, a comma
 * or a line break is quoted (RFC 4180).
 */
export function csvCell(value: string): string {
  const guarded = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(guarded) ? `"${guarded.replace(/"/g, '""')}"` : guarded;
}

const labelsOf = (codes: readonly TreatmentCode[]) => codes.map((code) => TREATMENT_LABELS[code]).join('; ');

function rowOf(incident: IncidentJson, timeZone: string): string[] {
  const { classification } = incident;
  return [
    incident.occurredAt,
    `${localDate(incident.occurredAt, timeZone)} ${formatClock(incident.occurredAt, timeZone)}`,
    timeZone,
    LOCATION_LABELS[incident.location],
    KIND_LABELS[incident.kind],
    CLASS_LABELS[classification.class],
    classification.basis.length > 0 ? labelsOf(classification.basis) : 'No treatment given',
    labelsOf(incident.treatments),
    incident.involved.map((person) => `${person.initials} (${INVOLVED_ROLE_LABELS[person.role]})`).join('; '),
    incident.description,
    incident.immediateActions ?? '',
    incident.followUps
      .map((followUp) => `${followUp.text} (owner: ${followUp.ownerName}; due ${followUp.dueOn}; ${followUp.done ? 'done' : 'not done'})`)
      .join('\n'),
    incident.status === 'closed' ? 'Closed' : 'Open',
    incident.closingNote ?? '',
    incident.batteryName ?? '',
    incident.reporter.name,
    incident.createdAt,
  ];
}

/**
 * The safety log as a spreadsheet: one row per incident, in plain words, times in UTC and in
 * the event's zone (UTC for an incident outside an event). A byte-order mark first, so that a
 * spreadsheet opens the UTF-8 as UTF-8; lines end in CRLF.
 */
export function incidentsCsv(incidents: readonly IncidentJson[], zoneOf: (eventId: string | null) => string): string {
  const lines = [HEADER, ...incidents.map((incident) => rowOf(incident, zoneOf(incident.eventId)))];
  return `\uFEFF${lines.map((cells) => cells.map(csvCell).join(',')).join('\r\n')}\r\n`;
}

/** `incidents-<event name as a slug>.csv`, or `incidents-all.csv`: ASCII only, safe in a header. */
export function csvFileName(eventName: string | null) {
  if (eventName === null) return 'incidents-all.csv';
  const slug = eventName
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/, '');
  return `incidents-${slug || 'event'}.csv`;
}
