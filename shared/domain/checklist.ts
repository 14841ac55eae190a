/**
 * Checklist items and their marks: what a value means for an item (done, failed) and whether a
 * value fits the item at all. Pure, shared by the server (which stores and answers) and the
 * client (which shows a tick at once, before the server confirms it).
 */
import type { Role } from '../roles';

export const CHECKLIST_PHASES = ['pre_match', 'post_match', 'inspection', 'load_in', 'pack_out'] as const;
export type ChecklistPhase = (typeof CHECKLIST_PHASES)[number];

export const PHASE_LABELS: Record<ChecklistPhase, string> = {
  pre_match: 'Before a match',
  post_match: 'After a match',
  inspection: 'Inspection',
  load_in: 'Load-in',
  pack_out: 'Pack-out',
};

export const ITEM_KINDS = ['tick', 'number', 'choice', 'text'] as const;
export type ItemKind = (typeof ITEM_KINDS)[number];

/**
 * What readiness reads an item for, beyond done or not. `bumper_colour`: a choice between red
 * and blue that must match the alliance of the run's match.
 */
export const ITEM_PURPOSES = ['bumper_colour'] as const;
export type ItemPurpose = (typeof ITEM_PURPOSES)[number];

/** One item of a template version, as stored in the version's snapshot. */
export interface ChecklistItem {
  /** Stable across versions while the item stays in the list. */
  id: string;
  label: string;
  help: string | null;
  kind: ItemKind;
  required: boolean;
  min: number | null;
  max: number | null;
  unit: string | null;
  /** The choices of a `choice` item, in order; empty for other kinds. */
  options: string[];
  /** Who usually does it: a hint shown as a tag, never a permission. */
  role: Role | null;
  purpose: ItemPurpose | null;
}

/** A tick is `true`; a number a finite number; a choice one of the options; text a string. */
export type MarkValue = boolean | number | string;

/** Why a value does not fit an item, or null when it does. */
export function valueProblem(item: ChecklistItem, value: unknown): string | null {
  switch (item.kind) {
    case 'tick':
      return value === true ? null : 'A tick is marked with true (un-mark it to clear)';
    case 'number':
      return typeof value === 'number' && Number.isFinite(value) ? null : 'Give a number';
    case 'choice':
      return typeof value === 'string' && item.options.includes(value) ? null : `Pick one of: ${item.options.join(', ')}`;
    case 'text':
      if (typeof value !== 'string' || value.trim() === '') return 'Write something, or un-mark the item';
      return value.length > TEXT_VALUE_MAX ? `At most ${TEXT_VALUE_MAX} characters` : null;
  }
}

export const TEXT_VALUE_MAX = 500;

/** True when a number lies outside the item's limits (a limit left empty does not bind). */
export function isOutOfLimits(item: Pick<ChecklistItem, 'kind' | 'min' | 'max'>, value: MarkValue | null): boolean {
  if (item.kind !== 'number' || typeof value !== 'number') return false;
  return (item.min !== null && value < item.min) || (item.max !== null && value > item.max);
}

/** A marked item is done unless its number is out of limits; then it is failed, and not done. */
export function evaluateMark(item: ChecklistItem, value: MarkValue | null): { done: boolean; failed: boolean } {
  if (value === null) return { done: false, failed: false };
  const failed = isOutOfLimits(item, value);
  return { done: !failed, failed };
}

/** "120 psi", "min 11.8 V", "10 – 14 V": an item's limits as the crew reads them. */
export function describeLimits(item: Pick<ChecklistItem, 'min' | 'max' | 'unit'>): string | null {
  const unit = item.unit ? ` ${item.unit}` : '';
  if (item.min !== null && item.max !== null) return `${item.min} – ${item.max}${unit}`;
  if (item.min !== null) return `at least ${item.min}${unit}`;
  if (item.max !== null) return `at most ${item.max}${unit}`;
  return null;
}

/** The state of one item in a run, as every run answer lists it. */
export interface RunItemState {
  value: MarkValue | null;
  done: boolean;
  failed: boolean;
}

/** Done / required counts of a run: what the progress bar and readiness read. */
export function progressOf(items: readonly (Pick<ChecklistItem, 'required'> & RunItemState)[]) {
  const required = items.filter((item) => item.required);
  return {
    total: items.length,
    done: items.filter((item) => item.done).length,
    required: required.length,
    requiredDone: required.filter((item) => item.done).length,
    failed: items.filter((item) => item.failed).length,
  };
}

/** Every required item done and no number out of limits: what a lead signs off without a reason. */
export const isComplete = ({ required, requiredDone, failed }: ReturnType<typeof progressOf>) => requiredDone === required && failed === 0;
