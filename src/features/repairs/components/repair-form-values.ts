import type { RepairSeverity } from '@shared/domain/repair-urgency';
import { createRepairSchema, updateRepairSchema, type RepairJson } from '@shared/schemas/repairs';
import { isApiError } from '../../../lib/api-client';
import { parseForm, type FieldErrors } from '../../../lib/form-errors';
import type { CreateRepairBody } from '../api/create-repair';
import type { RepairChanges } from '../api/update-repair';

/** Minutes as typed: empty is "none", anything else must read as a whole number (the schema says so if not). */
function readMinutes(text: string): number | null {
  const trimmed = text.trim();
  return trimmed === '' ? null : Number(trimmed.replace(',', '.'));
}

// ---- Reporting a problem ----

export interface ReportValues {
  title: string;
  subsystem: string;
  severity: RepairSeverity | '';
  foundInMatchId: string;
  assigneeId: string;
  estimate: string;
  description: string;
}

export const emptyReport = (foundInMatchId: string | null): ReportValues => ({
  title: '',
  subsystem: '',
  severity: '',
  foundInMatchId: foundInMatchId ?? '',
  assigneeId: '',
  estimate: '',
  description: '',
});

/** The create body, checked by the schema the server uses. */
export function readReport(values: ReportValues, id: string): { ok: true; data: CreateRepairBody } | { ok: false; errors: FieldErrors } {
  const parsed = parseForm(createRepairSchema, {
    id,
    title: values.title,
    subsystem: values.subsystem || undefined,
    severity: values.severity || undefined,
    description: values.description,
    foundInMatchId: values.foundInMatchId || null,
    assigneeId: values.assigneeId || null,
    estimateMinutes: readMinutes(values.estimate),
  });
  if (parsed.ok) return { ok: true, data: { ...parsed.data, id } };
  // The choices are buttons: say what to tap rather than "Required".
  const errors = { ...parsed.errors };
  if (errors.subsystem === 'Required') errors.subsystem = 'Tap the subsystem';
  if (errors.severity === 'Required') errors.severity = 'Tap how bad it is';
  return { ok: false, errors };
}

// ---- Editing a ticket ----

export interface EditValues {
  title: string;
  description: string;
  severity: RepairSeverity;
  subsystem: string;
  assigneeId: string;
  foundInMatchId: string;
  estimate: string;
  timeSpent: string;
  partsUsed: string;
  resolutionNote: string;
}

export function editValuesOf(ticket: RepairJson): EditValues {
  return {
    title: ticket.title,
    description: ticket.description ?? '',
    severity: ticket.severity,
    subsystem: ticket.subsystem,
    assigneeId: ticket.assignee?.id ?? '',
    foundInMatchId: ticket.foundInMatchId ?? '',
    estimate: ticket.estimateMinutes === null ? '' : String(ticket.estimateMinutes),
    timeSpent: String(ticket.timeSpentMinutes),
    partsUsed: ticket.partsUsed.join('\n'),
    resolutionNote: ticket.resolutionNote ?? '',
  };
}

/** The fields a ticket's edit form writes, as the server stores them. */
export type EditBody = Required<Pick<RepairChanges, 'title' | 'description' | 'severity' | 'subsystem' | 'assigneeId' | 'foundInMatchId' | 'estimateMinutes' | 'timeSpentMinutes' | 'partsUsed' | 'resolutionNote'>>;
export type EditField = keyof EditBody;

export function readEdit(values: EditValues): { ok: true; data: EditBody } | { ok: false; errors: FieldErrors } {
  const timeSpent = readMinutes(values.timeSpent);
  const parsed = parseForm(updateRepairSchema, {
    version: 0,
    title: values.title,
    description: values.description,
    severity: values.severity,
    subsystem: values.subsystem,
    assigneeId: values.assigneeId || null,
    foundInMatchId: values.foundInMatchId || null,
    estimateMinutes: readMinutes(values.estimate),
    timeSpentMinutes: timeSpent ?? 0,
    partsUsed: values.partsUsed.split('\n'),
    resolutionNote: values.resolutionNote,
  });
  if (!parsed.ok) return parsed;
  const { version: _version, ...data } = parsed.data;
  return { ok: true, data: data as EditBody };
}

/** A ticket's value of each edited field, in the body's terms. */
export function bodyOf(ticket: RepairJson): EditBody {
  return {
    title: ticket.title,
    description: ticket.description,
    severity: ticket.severity,
    subsystem: ticket.subsystem,
    assigneeId: ticket.assignee?.id ?? null,
    foundInMatchId: ticket.foundInMatchId,
    estimateMinutes: ticket.estimateMinutes,
    timeSpentMinutes: ticket.timeSpentMinutes,
    partsUsed: ticket.partsUsed,
    resolutionNote: ticket.resolutionNote,
  };
}

export const EDIT_FIELDS: readonly EditField[] = [
  'title',
  'description',
  'severity',
  'subsystem',
  'assigneeId',
  'foundInMatchId',
  'estimateMinutes',
  'timeSpentMinutes',
  'partsUsed',
  'resolutionNote',
];

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** Only what the user changed against the version they started from: another person's edits to the other fields survive. */
export function editChanges(base: RepairJson, body: EditBody): Partial<EditBody> {
  const before = bodyOf(base);
  return Object.fromEntries(EDIT_FIELDS.filter((field) => !same(before[field], body[field])).map((field) => [field, body[field]]));
}

/** The fields two versions of a ticket differ in (what another person changed). */
export function changedFields(base: RepairJson, theirs: RepairJson): EditField[] {
  const before = bodyOf(base);
  const after = bodyOf(theirs);
  return EDIT_FIELDS.filter((field) => !same(before[field], after[field]));
}

/** The browser's findings overlaid with the server's, by field (`partsUsed.3` is shown beside the parts). */
export function fieldErrorsOf(client: FieldErrors, error: unknown): FieldErrors {
  const server: FieldErrors = {};
  if (isApiError(error)) for (const [path, message] of Object.entries(error.fields)) server[path.split('.')[0]] ??= message;
  return { ...client, ...server };
}
