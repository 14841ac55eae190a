import type { ChecklistItem, ChecklistPhase, ItemKind } from '@shared/domain/checklist';
import type { Role } from '@shared/roles';
import { createTemplateSchema, type CreateTemplateInput, type TemplateJson } from '@shared/schemas/checks';
import { isApiError } from '../../../../lib/api-client';
import type { FieldErrors } from '../../../../lib/form-errors';
import { newId } from '../../../../lib/new-id';

/** One item as the editor holds it: strings as typed, so nothing the user entered is reformatted. */
export interface ItemDraft {
  /** Stable while the item is dragged about: its server id, or one made here for a new item. */
  key: string;
  /** The server's id; sent back so the item keeps it in the next version. A new item has none. */
  id?: string;
  label: string;
  help: string;
  kind: ItemKind;
  required: boolean;
  min: string;
  max: string;
  unit: string;
  /** Kept while another kind is picked, so switching back does not lose them; sent for a choice only. */
  options: string[];
  role: Role | '';
  bumperColour: boolean;
}

export interface TemplateFormValues {
  name: string;
  phase: ChecklistPhase;
  items: ItemDraft[];
}

export type TemplateBody = Omit<CreateTemplateInput, 'id'>;

export const BUMPER_OPTIONS = ['Red', 'Blue'];

export const emptyItem = (): ItemDraft => ({
  key: newId(),
  label: '',
  help: '',
  kind: 'tick',
  required: true,
  min: '',
  max: '',
  unit: '',
  options: [],
  role: '',
  bumperColour: false,
});

export const emptyTemplateValues = (): TemplateFormValues => ({ name: '', phase: 'pre_match', items: [emptyItem()] });

const typed = (value: number | null) => (value === null ? '' : String(value));

export function templateValuesOf(template: TemplateJson): TemplateFormValues {
  return {
    name: template.name,
    phase: template.phase,
    items: template.items.map((item) => ({
      key: item.id,
      id: item.id,
      label: item.label,
      help: item.help ?? '',
      kind: item.kind,
      required: item.required,
      min: typed(item.min),
      max: typed(item.max),
      unit: item.unit ?? '',
      options: item.options,
      role: (item.role ?? '') as Role | '',
      bumperColour: item.purpose === 'bumper_colour',
    })),
  };
}

/**
 * A limit as typed: empty is none; a decimal comma is read as a point (tablet keypads in many
 * languages offer only the comma); anything else is NaN, which the schema answers with "A number".
 * `Number()` alone would take "1e2" or "0x10".
 */
export function readDecimal(text: string): number | null {
  const value = text.trim().replace(',', '.');
  if (value === '') return null;
  return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(value) ? Number(value) : NaN;
}

/** What the server is sent for one item: the fields of its kind only. */
function itemInput(item: ItemDraft) {
  const isNumber = item.kind === 'number';
  const isChoice = item.kind === 'choice';
  return {
    ...(item.id && { id: item.id }),
    label: item.label,
    help: item.help,
    kind: item.kind,
    required: item.required,
    min: isNumber ? readDecimal(item.min) : null,
    max: isNumber ? readDecimal(item.max) : null,
    unit: isNumber ? item.unit : null,
    options: isChoice ? item.options : [],
    role: item.role || null,
    purpose: isChoice && item.bumperColour ? ('bumper_colour' as const) : null,
  };
}

const TOP_FIELDS = new Set(['name', 'phase', 'items']);
const ITEM_FIELDS = new Set(['label', 'help', 'kind', 'required', 'min', 'max', 'unit', 'options', 'role', 'purpose']);

/**
 * Where a message about `items.2.label` goes: `<key of the item sent third>.label`, so it stays
 * beside its item after the list is reordered. Unplaceable paths go to `_`.
 */
function errorKey(path: readonly (string | number)[], keys: readonly string[]): string {
  const [head, index, field] = path;
  if (head === 'items' && path.length > 1) {
    const key = keys[Number(index)];
    return key !== undefined && typeof field === 'string' && ITEM_FIELDS.has(field) ? `${key}.${field}` : '_';
  }
  return typeof head === 'string' && TOP_FIELDS.has(head) ? head : '_';
}

/** Checks the form with the server's own schema; item messages are keyed by item (see errorKey). */
export function readTemplateForm(values: TemplateFormValues): { ok: true; data: TemplateBody } | { ok: false; errors: FieldErrors } {
  const result = createTemplateSchema.safeParse({ name: values.name, phase: values.phase, items: values.items.map(itemInput) });
  if (result.success) {
    const { name, phase, items } = result.data;
    return { ok: true, data: { name, phase, items } };
  }
  const keys = values.items.map((item) => item.key);
  const errors: FieldErrors = {};
  for (const issue of result.error.issues) {
    errors[errorKey(issue.path as (string | number)[], keys)] ??= issue.message;
  }
  return { ok: false, errors };
}

/** The server's field messages (`items.2.label`), placed by the order of the items as they were sent. */
export function serverTemplateErrors(error: unknown, sentKeys: readonly string[]): FieldErrors {
  if (!isApiError(error)) return {};
  const errors: FieldErrors = {};
  for (const [path, message] of Object.entries(error.fields)) {
    const key = errorKey(path.split('.').map((part) => (/^\d+$/.test(part) ? Number(part) : part)), sentKeys);
    errors[key] ??= key === '_' ? `${path}: ${message}` : message;
  }
  return errors;
}

/** The messages about one item, by field. */
export function itemErrorsOf(errors: FieldErrors, key: string): FieldErrors {
  const prefix = `${key}.`;
  return Object.fromEntries(Object.entries(errors).flatMap(([path, message]) => (path.startsWith(prefix) ? [[path.slice(prefix.length), message]] : [])));
}

type ComparableItem = Pick<ChecklistItem, 'label' | 'help' | 'kind' | 'required' | 'min' | 'max' | 'unit' | 'options' | 'role' | 'purpose'> & { id?: string };

const comparable = (item: ComparableItem) =>
  JSON.stringify([item.id ?? null, item.label, item.help, item.kind, item.required, item.min, item.max, item.unit, item.options, item.role, item.purpose]);

/** Only what differs from the version the edit started with: a rename must not resend (and so replace) the items. */
export function templateChanges(base: TemplateJson, body: TemplateBody): Partial<TemplateBody> {
  const changes: Partial<TemplateBody> = {};
  if (body.name !== base.name) changes.name = body.name;
  if (body.phase !== base.phase) changes.phase = body.phase;
  if (body.items.map(comparable).join('\n') !== base.items.map(comparable).join('\n')) changes.items = body.items;
  return changes;
}
