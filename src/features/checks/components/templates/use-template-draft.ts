import { useState } from 'react';
import type { FieldErrors } from '../../../../lib/form-errors';
import { readTemplateForm, serverTemplateErrors, type ItemDraft, type TemplateBody, type TemplateFormValues } from './template-form-values';

// The messages an edit of each draft field answers; a new kind makes every message of the item moot.
const ANSWERS: Record<Exclude<keyof ItemDraft, 'key' | 'id' | 'kind'>, string[]> = {
  label: ['label'],
  help: ['help'],
  required: ['required'],
  min: ['min', 'max'],
  max: ['min', 'max'],
  unit: ['unit'],
  options: ['options', 'purpose'],
  role: ['role'],
  bumperColour: ['options', 'purpose'],
};

/** Error keys (see readTemplateForm) that an edit from `before` to `after` has dealt with. */
function answered(before: TemplateFormValues, after: TemplateFormValues): string[] {
  const keys: string[] = [];
  if (before.name !== after.name) keys.push('name');
  if (before.phase !== after.phase) keys.push('phase');
  if (before.items.length !== after.items.length) keys.push('items');
  const old = new Map(before.items.map((item) => [item.key, item]));
  for (const item of after.items) {
    const was = old.get(item.key);
    if (!was || was === item) continue;
    if (was.kind !== item.kind) keys.push(`${item.key}.`);
    for (const [field, errors] of Object.entries(ANSWERS)) {
      if (was[field as keyof ItemDraft] !== item[field as keyof ItemDraft]) keys.push(...errors.map((error) => `${item.key}.${error}`));
    }
  }
  return keys;
}

/**
 * The editor's values and messages, held above the form so that "Save mine over theirs" sends
 * what is in the form now, edits made after the conflict included. A message goes once its
 * field is edited: a red note under a fixed field reads as if the fix did not take.
 */
export function useTemplateDraft(initial: () => TemplateFormValues) {
  const [values, setValuesState] = useState(initial);
  // The order of the items at the last save, to place the server's `items.<n>` messages.
  const [checked, setChecked] = useState<{ errors: FieldErrors; keys: string[] }>({ errors: {}, keys: [] });
  const [edited, setEdited] = useState<string[]>([]);

  function setValues(next: TemplateFormValues) {
    const keys = answered(values, next);
    if (keys.length > 0) setEdited((old) => [...old, ...keys]);
    setValuesState(next);
  }

  /** The body to send, or null when the form has mistakes (then shown beside their fields). */
  function read(): TemplateBody | null {
    const result = readTemplateForm(values);
    setChecked({ errors: result.ok ? {} : result.errors, keys: values.items.map((item) => item.key) });
    setEdited([]);
    return result.ok ? result.data : null;
  }

  function reset(next: TemplateFormValues) {
    setValuesState(next);
    setChecked({ errors: {}, keys: [] });
    setEdited([]);
  }

  const stillOpen = (key: string) => !edited.some((done) => key === done || (done.endsWith('.') && key.startsWith(done)));

  return {
    values,
    setValues,
    read,
    reset,
    /** The browser's own findings, overlaid with what the server said about the last save, less what was edited since. */
    errorsWith: (saveError: unknown): FieldErrors =>
      Object.fromEntries(Object.entries({ ...checked.errors, ...serverTemplateErrors(saveError, checked.keys) }).filter(([key]) => stillOpen(key))),
  };
}
