import type { z } from 'zod';
import { localDate, formatClock, localTimeToInstant } from '@shared/domain/event-clock';
import type { IncidentKind, IncidentLocation, TreatmentCode } from '@shared/domain/incident-classification';
import { createIncidentSchema, type IncidentJson, type InvolvedRole } from '@shared/schemas/incidents';
import { isApiError } from '../../../lib/api-client';
import type { FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import type { CreateIncidentBody } from '../api/create-incident';
import type { IncidentChanges } from '../api/update-incident';

export interface PersonRow {
  /** Keeps a row's inputs in place when one above it is removed. */
  key: string;
  initials: string;
  role: InvolvedRole | '';
}

/** What the report form's inputs hold: strings as typed. */
export interface ReportValues {
  /** `yyyy-MM-dd` and `HH:mm` on the event's clock. */
  date: string;
  time: string;
  location: IncidentLocation | '';
  kind: IncidentKind | '';
  description: string;
  involved: PersonRow[];
  treatments: TreatmentCode[];
  immediateActions: string;
  batteryId: string;
}

export const emptyReport = (now: Date, timeZone: string): ReportValues => ({
  date: localDate(now, timeZone),
  time: formatClock(now, timeZone),
  location: '',
  kind: '',
  description: '',
  involved: [],
  treatments: [],
  immediateActions: '',
  batteryId: '',
});

/**
 * Issues keyed by their whole path as the server keys them (`involved.1.initials`), so a row's
 * message sits beside that row.
 */
function pathErrors(error: z.ZodError): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of error.issues) errors[issue.path.join('.')] ??= issue.message;
  return errors;
}

function readWhen(values: ReportValues, timeZone: string): { instant?: string; errors: FieldErrors } {
  if (!values.date || !values.time) return { errors: values.date ? { time: 'Choose the time' } : { date: 'Choose the day' } };
  try {
    return { instant: localTimeToInstant(values.date, values.time, timeZone).toISOString(), errors: {} };
  } catch {
    return { errors: { time: 'That time does not exist on that day (the clocks change)' } };
  }
}

/** The create body, checked by the schema the server uses; errors keyed by input. */
export function readReport(values: ReportValues, id: string, timeZone: string): { ok: true; data: CreateIncidentBody } | { ok: false; errors: FieldErrors } {
  const when = readWhen(values, timeZone);
  const parsed = createIncidentSchema.safeParse({
    id,
    // A stand-in keeps the schema from repeating the day and time messages in API words.
    occurredAt: when.instant ?? new Date(0).toISOString(),
    location: values.location || undefined,
    kind: values.kind || undefined,
    description: values.description,
    involved: values.involved.map((row) => ({ initials: row.initials, role: row.role || undefined })),
    treatments: values.treatments,
    immediateActions: values.immediateActions,
    batteryId: values.kind === 'battery_or_chemical' && values.batteryId ? values.batteryId : null,
  });
  const errors = { ...when.errors, ...(parsed.success ? {} : pathErrors(parsed.error)) };
  // The choices are tiles: say what to tap rather than "Required".
  if (errors.location === 'Required') errors.location = 'Tap where it happened';
  if (errors.kind === 'Required') errors.kind = 'Tap what kind of incident it was';
  for (const key of Object.keys(errors)) if (key.endsWith('.role') && errors[key] === 'Required') errors[key] = 'Choose who they were';
  if (!parsed.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, data: { ...parsed.data, id } };
}

/** The browser's findings overlaid with the server's; the server's `occurredAt` is shown beside the time. */
export function reportErrorsOf(client: FieldErrors, error: unknown): FieldErrors {
  const server = isApiError(error) ? { ...error.fields } : {};
  if (server.occurredAt) server.time = server.occurredAt;
  return { ...client, ...server };
}

// ---- Editing a report (safety and admin) ----

/** A report as the form shows it, on the event's clock. */
export const reportValuesOf = (incident: IncidentJson, timeZone: string): ReportValues => ({
  date: localDate(incident.occurredAt, timeZone),
  time: formatClock(incident.occurredAt, timeZone),
  location: incident.location,
  kind: incident.kind,
  description: incident.description,
  involved: incident.involved.map((person) => ({ key: newId(), ...person })),
  treatments: [...incident.treatments],
  immediateActions: incident.immediateActions ?? '',
  batteryId: incident.batteryId ?? '',
});

const EDITED = ['occurredAt', 'location', 'kind', 'description', 'involved', 'treatments', 'immediateActions', 'batteryId'] as const;
type Edited = (typeof EDITED)[number];
// Compared as content: the people in order with their two fields, the treatments as a set.
const comparable = (field: Edited, value: unknown) => {
  if (field === 'involved') return JSON.stringify((value as { initials: string; role: string }[]).map(({ initials, role }) => [initials, role]));
  if (field === 'treatments') return JSON.stringify([...(value as string[])].sort());
  return JSON.stringify(value);
};

/**
 * Only the fields the form changed against the report it was opened on, so another person's
 * changes to the other fields survive a save. A time shown to the minute that was not touched
 * keeps its seconds.
 */
export function reportChanges(base: IncidentJson, body: CreateIncidentBody, timeZone: string): Pick<IncidentChanges, Edited> {
  const shown = reportValuesOf(base, timeZone);
  const before: Record<Edited, unknown> = { ...base, occurredAt: localTimeToInstant(shown.date, shown.time, timeZone).toISOString() };
  return Object.fromEntries(EDITED.filter((field) => comparable(field, before[field]) !== comparable(field, body[field])).map((field) => [field, body[field]]));
}

/** The report's fields two versions differ in (what another person changed). */
export const editedBetween = (base: IncidentJson, theirs: IncidentJson): Edited[] =>
  EDITED.filter((field) => comparable(field, base[field]) !== comparable(field, theirs[field]));
