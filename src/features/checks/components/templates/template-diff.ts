import type { ChecklistItem } from '@shared/domain/checklist';
import type { TemplateJson } from '@shared/schemas/checks';

export interface TemplateDiff {
  name: string | null;
  phase: TemplateJson['phase'] | null;
  added: string[];
  removed: string[];
  changed: string[];
  reordered: boolean;
}

const sameItem = (a: ChecklistItem, b: ChecklistItem) => JSON.stringify({ ...a, id: '' }) === JSON.stringify({ ...b, id: '' });

/** What `theirs` changed against `base`, the version an editor started from: labels of items added, removed, changed. */
export function templateDiff(base: TemplateJson, theirs: TemplateJson): TemplateDiff {
  const before = new Map(base.items.map((item) => [item.id, item]));
  const after = new Set(theirs.items.map((item) => item.id));
  const kept = theirs.items.filter((item) => before.has(item.id));
  const keptBefore = base.items.filter((item) => after.has(item.id));
  return {
    name: theirs.name !== base.name ? theirs.name : null,
    phase: theirs.phase !== base.phase ? theirs.phase : null,
    added: theirs.items.filter((item) => !before.has(item.id)).map((item) => item.label),
    removed: base.items.filter((item) => !after.has(item.id)).map((item) => item.label),
    changed: kept.filter((item) => !sameItem(item, before.get(item.id)!)).map((item) => item.label),
    reordered: kept.some((item, index) => item.id !== keptBefore[index].id),
  };
}
