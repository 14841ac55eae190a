import { randomUUID } from 'node:crypto';
import type { ChecklistItem } from '../../shared/domain/checklist';
import type { ItemInput } from '../../shared/schemas/checks';

// Every field of an item but its id, in one order: what "the same item" compares, and the
// order the stored snapshot keeps.
const contentOf = (item: ItemInput | ChecklistItem): Omit<ChecklistItem, 'id'> => ({
  label: item.label,
  help: item.help,
  kind: item.kind,
  required: item.required,
  min: item.min,
  max: item.max,
  unit: item.unit,
  options: [...item.options],
  role: item.role,
  purpose: item.purpose,
});

const sameContent = (a: ItemInput | ChecklistItem, b: ItemInput | ChecklistItem) =>
  JSON.stringify(contentOf(a)) === JSON.stringify(contentOf(b));

/**
 * The items of a new version, with ids: an item sent with the id of a current item keeps it
 * (an edited label stays the same item); an item sent without one that is identical to a
 * current item no other item claimed keeps that item's id (an editor that drops ids still
 * keeps them stable); every other item, also one sent with an unknown id, is new.
 */
export function itemsWithIds(sent: readonly ItemInput[], current: readonly ChecklistItem[]): ChecklistItem[] {
  const currentIds = new Set(current.map((item) => item.id));
  const claimed = new Set(sent.map((item) => item.id).filter((id) => id !== undefined && currentIds.has(id)));
  return sent.map((item) => {
    if (item.id !== undefined && currentIds.has(item.id)) return { id: item.id, ...contentOf(item) };
    const twin = item.id === undefined ? current.find((candidate) => !claimed.has(candidate.id) && sameContent(candidate, item)) : undefined;
    if (twin) claimed.add(twin.id);
    return { id: twin?.id ?? randomUUID(), ...contentOf(item) };
  });
}

/** True when two item lists are the same items, in the same order, with the same content. */
export const sameItems = (a: readonly ChecklistItem[], b: readonly ChecklistItem[]) =>
  a.length === b.length && a.every((item, index) => item.id === b[index].id && sameContent(item, b[index]));
