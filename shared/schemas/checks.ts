import { z } from 'zod';
import {
  CHECKLIST_PHASES,
  ITEM_KINDS,
  ITEM_PURPOSES,
  TEXT_VALUE_MAX,
  type ChecklistItem,
  type ChecklistPhase,
  type MarkValue,
} from '../domain/checklist';
import type { Alliance, MatchLevel } from '../domain/timeline';
import { ROLES } from '../roles';
import { clientId, requiredOr, versionField } from './common';

export const TEMPLATE_NAME_MAX = 80;
export const ITEM_LABEL_MAX = 120;
export const ITEM_HELP_MAX = 400;
export const TEMPLATE_ITEMS_MAX = 100;
export const ITEM_OPTIONS_MAX = 12;
export const SIGN_OFF_REASON_MIN = 5;

const uuid = z.uuid(requiredOr('Must be a UUID'));
const text = (max: number, empty: string) =>
  z
    .string({ message: empty })
    .trim()
    .min(1, { message: empty })
    .max(max, { message: `At most ${max} characters` });
// An empty optional text field from a form means "none".
const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, { message: `At most ${max} characters` })
    .nullish()
    .transform((value) => (value ? value : null));
const limit = z.number({ message: 'A number' }).refine(Number.isFinite, { message: 'A number' }).nullish().transform((v) => v ?? null);

const itemSchema = z
  .object({
    /** The id of an item of the current version this one continues; omitted for a new item. */
    id: z.string().min(1).max(40).optional(),
    label: text(ITEM_LABEL_MAX, 'Give the item a label'),
    help: optionalText(ITEM_HELP_MAX),
    kind: z.enum(ITEM_KINDS, requiredOr('Use tick, number, choice or text')),
    required: z.boolean(requiredOr('true or false')),
    min: limit,
    max: limit,
    unit: optionalText(12),
    options: z
      .array(text(40, 'An option needs words'), { message: 'A list of options' })
      .max(ITEM_OPTIONS_MAX, { message: `At most ${ITEM_OPTIONS_MAX} options` })
      .optional()
      .transform((value) => value ?? []),
    role: z.enum(ROLES, { message: `One of: ${ROLES.join(', ')}` }).nullish().transform((value) => value ?? null),
    purpose: z.enum(ITEM_PURPOSES, { message: `One of: ${ITEM_PURPOSES.join(', ')}` }).nullish().transform((value) => value ?? null),
  })
  .strict()
  .superRefine((item, ctx) => {
    if (item.kind === 'choice' && item.options.length < 2) ctx.addIssue({ code: 'custom', path: ['options'], message: 'A choice needs at least two options' });
    if (item.kind !== 'choice' && item.options.length > 0) ctx.addIssue({ code: 'custom', path: ['options'], message: 'Only a choice has options' });
    if (new Set(item.options.map((option) => option.toLowerCase())).size !== item.options.length) {
      ctx.addIssue({ code: 'custom', path: ['options'], message: 'Each option once' });
    }
    if (item.kind !== 'number') {
      for (const key of ['min', 'max', 'unit'] as const) {
        if (item[key] !== null) ctx.addIssue({ code: 'custom', path: [key], message: 'Only a number item has limits and a unit' });
      }
    }
    if (item.min !== null && item.max !== null && item.min > item.max) ctx.addIssue({ code: 'custom', path: ['max'], message: 'Must not be below the minimum' });
    if (item.purpose === 'bumper_colour') {
      const options = item.options.map((option) => option.toLowerCase());
      if (item.kind !== 'choice' || !options.includes('red') || !options.includes('blue')) {
        ctx.addIssue({ code: 'custom', path: ['purpose'], message: 'A bumper colour item is a choice with the options Red and Blue' });
      }
    }
  });
export type ItemInput = z.output<typeof itemSchema>;

const itemsField = z
  .array(itemSchema, requiredOr('A list of items'))
  .min(1, { message: 'A checklist needs at least one item' })
  .max(TEMPLATE_ITEMS_MAX, { message: `At most ${TEMPLATE_ITEMS_MAX} items` })
  .superRefine((items, ctx) => {
    const ids = items.map((item) => item.id).filter((id) => id !== undefined);
    if (new Set(ids).size !== ids.length) ctx.addIssue({ code: 'custom', message: 'An item id is listed twice' });
  });

const templateFields = z.object({
  name: text(TEMPLATE_NAME_MAX, 'Give the checklist a name'),
  phase: z.enum(CHECKLIST_PHASES, requiredOr(`One of: ${CHECKLIST_PHASES.join(', ')}`)),
  items: itemsField,
});

export const createTemplateSchema = templateFields.extend({ id: clientId.optional() }).strict();
export type CreateTemplateInput = z.output<typeof createTemplateSchema>;

/** Any field; `items` replaces the list. Every change makes a new version; `version` guards against a stale editor. */
export const updateTemplateSchema = templateFields.partial().extend({ version: versionField.optional() }).strict();
export type UpdateTemplateInput = z.output<typeof updateTemplateSchema>;

export const templateParams = z.object({ id: uuid });

export const createRunSchema = z
  .object({
    id: clientId.optional(),
    templateId: uuid,
    matchId: uuid.nullish().transform((value) => value ?? null),
  })
  .strict();
export type CreateRunInput = z.output<typeof createRunSchema>;

export const runParams = z.object({ runId: uuid });
export const runItemParams = z.object({ runId: uuid, itemId: z.string().min(1).max(40) });
export const runListQuery = z.object({ matchId: uuid.optional() });
export const eventRunsParams = z.object({ eventId: uuid });
export const readinessParams = z.object({ eventId: uuid, matchId: uuid });

/** The value is checked against the item's kind by the server, which knows the item. */
export const markSchema = z
  .object({
    value: z.union([z.boolean(), z.number(), z.string().max(TEXT_VALUE_MAX, { message: `At most ${TEXT_VALUE_MAX} characters` })], {
      message: 'true, a number or a text',
    }),
    note: optionalText(200),
  })
  .strict();
export type MarkInput = z.output<typeof markSchema>;

export const signOffSchema = z
  .object({
    /** Required (at least a few words) when required items are open or a number is out of limits. */
    reason: optionalText(500),
  })
  .strict();
export type SignOffInput = z.output<typeof signOffSchema>;

/** Who did something, as answers show it. */
export interface PersonJson {
  id: string;
  name: string;
}

/** A template with its current version. */
export interface TemplateJson {
  id: string;
  name: string;
  phase: ChecklistPhase;
  /** The current version's number: 1 at creation, +1 per change. Also the optimistic-locking token. */
  version: number;
  items: ChecklistItem[];
  updatedAt: string;
  updatedBy: PersonJson | null;
}

/** One item of a run: the item of the run's template version and its current mark. */
export interface RunItemJson extends ChecklistItem {
  value: MarkValue | null;
  note: string | null;
  done: boolean;
  failed: boolean;
  markedBy: PersonJson | null;
  markedAt: string | null;
}

export interface RunMatchJson {
  id: string;
  level: MatchLevel;
  number: number;
  alliance: Alliance | null;
}

export interface RunJson {
  id: string;
  eventId: string;
  templateId: string;
  /** The template version the run began with; later edits of the template never change it. */
  templateVersion: number;
  name: string;
  phase: ChecklistPhase;
  match: RunMatchJson | null;
  items: RunItemJson[];
  progress: { total: number; done: number; required: number; requiredDone: number; failed: number };
  /** Every required item done and no number out of limits. */
  complete: boolean;
  signOff: { by: PersonJson; at: string; reason: string | null } | null;
  createdAt: string;
  createdBy: PersonJson;
}

/** A run in lists: everything but the items. */
export type RunSummaryJson = Omit<RunJson, 'items'>;
