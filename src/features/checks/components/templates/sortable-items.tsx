import { useRef, useState } from 'react';
import { closestCenter, DndContext, type Announcements, type DragEndEvent, type Modifier, type UniqueIdentifier } from '@dnd-kit/core';
import { arrayMove, SortableContext, verticalListSortingStrategy } from '@dnd-kit/sortable';
import { TEMPLATE_ITEMS_MAX } from '@shared/schemas/checks';
import { Button } from '../../../../components/ui/button';
import { useDragSensors } from '../../../../components/ui/drag-sensors';
import { PlusIcon, UndoIcon } from '../../../../components/ui/icons';
import type { FieldErrors } from '../../../../lib/form-errors';
import { ItemEditorRow, itemName } from './item-editor-row';
import { emptyItem, itemErrorsOf, type ItemDraft } from './template-form-values';

// The list is one column: a sideways wobble while dragging only distracts.
const alongTheList: Modifier = ({ transform }) => ({ ...transform, x: 0 });

const screenReaderInstructions = {
  draggable: 'To move an item, press Space on its handle, then the up or down arrow keys, then Space to drop it. Escape puts it back.',
};

interface SortableItemsProps {
  items: ItemDraft[];
  errors: FieldErrors;
  onChange: (items: ItemDraft[]) => void;
}

/** The ordered items: reorder by dragging a handle (finger, mouse or keyboard), add, remove with undo. */
export function SortableItems({ items, errors, onChange }: SortableItemsProps) {
  const sensors = useDragSensors();
  const [addedKey, setAddedKey] = useState<string | null>(null);
  const [removed, setRemoved] = useState<{ item: ItemDraft; index: number } | null>(null);

  const indexOf = (id: UniqueIdentifier) => items.findIndex((item) => item.key === id);
  const nameOf = (id: UniqueIdentifier) => itemName(items[indexOf(id)]);
  const at = (id: UniqueIdentifier) => `position ${indexOf(id) + 1} of ${items.length}`;
  // The item is over its own place right after it is lifted too: saying so would cut off "Picked up".
  const movedAway = useRef(false);

  // Our own words: the defaults speak of "draggable items" and "droppable areas".
  const announcements: Announcements = {
    onDragStart: ({ active }) => {
      movedAway.current = false;
      return `Picked up ${nameOf(active.id)}, at ${at(active.id)}.`;
    },
    onDragOver: ({ active, over }) => {
      if (!over) return `${nameOf(active.id)} is outside the list.`;
      if (over.id === active.id && !movedAway.current) return undefined;
      movedAway.current = true;
      return `${nameOf(active.id)} would go to ${at(over.id)}.`;
    },
    onDragEnd: ({ active, over }) =>
      over && over.id !== active.id ? `Moved ${nameOf(active.id)} to ${at(over.id)}.` : `${nameOf(active.id)} stays at ${at(active.id)}.`,
    onDragCancel: ({ active }) => `Move cancelled. ${nameOf(active.id)} stays at ${at(active.id)}.`,
  };

  function onDragEnd({ active, over }: DragEndEvent) {
    if (!over || over.id === active.id) return;
    onChange(arrayMove(items, indexOf(active.id), indexOf(over.id)));
  }

  const update = (key: string) => (patch: Partial<ItemDraft>) => onChange(items.map((item) => (item.key === key ? { ...item, ...patch } : item)));

  function add() {
    const item = emptyItem();
    setAddedKey(item.key);
    setRemoved(null);
    onChange([...items, item]);
  }

  function remove(index: number) {
    setRemoved({ item: items[index], index });
    onChange(items.filter((_, other) => other !== index));
  }

  function undo() {
    if (!removed) return;
    onChange([...items.slice(0, removed.index), removed.item, ...items.slice(removed.index)]);
    setRemoved(null);
  }

  return (
    <div className="flex flex-col gap-3">
      <DndContext
        sensors={sensors}
        collisionDetection={closestCenter}
        modifiers={[alongTheList]}
        onDragEnd={onDragEnd}
        accessibility={{ announcements, screenReaderInstructions }}
      >
        <SortableContext items={items.map((item) => item.key)} strategy={verticalListSortingStrategy}>
          <ol className="flex flex-col gap-3">
            {items.map((item, index) => (
              <ItemEditorRow
                key={item.key}
                item={item}
                position={index + 1}
                errors={itemErrorsOf(errors, item.key)}
                justAdded={item.key === addedKey}
                onChange={update(item.key)}
                onRemove={() => remove(index)}
              />
            ))}
          </ol>
        </SortableContext>
      </DndContext>
      {removed && (
        <div className="flex flex-wrap items-center gap-3 rounded-xl border-2 border-line bg-sunken px-4 py-2">
          <p role="status" className="min-w-0 flex-1 basis-48">
            Removed {itemName(removed.item)}. It goes from the checklist when you save.
          </p>
          <Button variant="secondary" icon={<UndoIcon className="size-5" />} onClick={undo} autoFocus>
            Undo
          </Button>
        </div>
      )}
      {items.length < TEMPLATE_ITEMS_MAX && (
        <Button variant="secondary" icon={<PlusIcon />} onClick={add} className="self-start">
          Add an item
        </Button>
      )}
    </div>
  );
}
