import type { ItemKind } from '@shared/domain/checklist';

export const KIND_LABELS: Record<ItemKind, string> = {
  tick: 'Tick',
  number: 'Number',
  choice: 'Choice',
  text: 'Text',
};

/** What each kind asks of the person doing the check, shown under the kind picker. */
export const KIND_HINTS: Record<ItemKind, string> = {
  tick: 'Done or not: a single tick.',
  number: 'A reading, e.g. air pressure; outside the limits it counts as failed.',
  choice: 'One of the options listed below.',
  text: 'A short note, e.g. the code version deployed.',
};
