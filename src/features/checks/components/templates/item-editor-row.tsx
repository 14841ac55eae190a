import { useId, useState } from 'react';
import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import { describeLimits } from '@shared/domain/checklist';
import { Button } from '../../../../components/ui/button';
import { DragHandle } from '../../../../components/ui/drag-handle';
import { PencilIcon } from '../../../../components/ui/icons';
import type { FieldErrors } from '../../../../lib/form-errors';
import { ItemFields } from './item-fields';
import { ItemTags } from './item-tags';
import { readDecimal, type ItemDraft } from './template-form-values';

/** The name an item goes by in buttons and announcements. */
export const itemName = (item: Pick<ItemDraft, 'label'> | undefined) => (item?.label.trim() ? `‘${item.label.trim()}’` : 'the new item');

const limitOf = (text: string) => {
  const value = readDecimal(text);
  return value === null || Number.isNaN(value) ? null : value;
};

interface ItemEditorRowProps {
  item: ItemDraft;
  position: number;
  errors: FieldErrors;
  /** Just added with "Add an item": its label takes the focus. */
  justAdded: boolean;
  onChange: (patch: Partial<ItemDraft>) => void;
  onRemove: () => void;
}

/**
 * One item in the editor: drag handle, number and a summary; its fields fold open to edit.
 * Folded rows keep a long list short enough to reorder on a tablet.
 */
export function ItemEditorRow({ item, position, errors, justAdded, onChange, onRemove }: ItemEditorRowProps) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({ id: item.key });
  // An item not saved yet opens with its fields showing: there is nothing to summarise.
  const [open, setOpen] = useState(item.id === undefined);
  const fieldsId = useId();
  const hasErrors = Object.keys(errors).length > 0;
  // An item with a mistake opens, and stays open while it is being fixed.
  if (hasErrors && !open) setOpen(true);
  const limits = describeLimits({ min: limitOf(item.min), max: limitOf(item.max), unit: item.unit.trim() || null });

  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      className={`rounded-2xl border-2 bg-surface ${isDragging ? 'relative z-10 border-accent shadow-lg' : hasErrors ? 'border-danger' : 'border-line'}`}
    >
      {/* The group names the item by its place ("Item 3"); the li keeps the list's semantics. */}
      <div role="group" aria-label={`Item ${position}`}>
        <div className="flex items-start gap-2 p-2 sm:gap-3 sm:p-3">
          <DragHandle ref={setActivatorNodeRef} label={`Move ${itemName(item)}`} {...attributes} {...listeners} />
          <span className="mt-2.5 w-7 shrink-0 text-right text-lg font-bold tabular-nums text-ink-muted" aria-hidden="true">
            {position}
          </span>
          <div className="flex min-w-0 flex-1 flex-col gap-1.5 pt-2">
            <p className={`font-semibold break-words ${item.label.trim() ? '' : 'text-ink-muted italic'}`}>{item.label.trim() || 'New item (no label yet)'}</p>
            <ItemTags
              kind={item.kind}
              required={item.required}
              limits={limits}
              options={item.options}
              role={item.role || null}
              bumperColour={item.kind === 'choice' && item.bumperColour}
            />
          </div>
          {!hasErrors && (
            <Button
              variant="secondary"
              aria-expanded={open}
              aria-controls={fieldsId}
              icon={open ? undefined : <PencilIcon className="size-5" />}
              onClick={() => setOpen(!open)}
            >
              {/* A phone keeps the width for the label: the pencil says "Edit" there. */}
              {open ? 'Close' : <span className="max-sm:sr-only">Edit</span>}
              <span className="sr-only"> {itemName(item)}</span>
            </Button>
          )}
        </div>
        {open && (
          <div id={fieldsId} className="flex flex-col gap-4 border-t-2 border-line px-3 pt-4 pb-3 sm:px-5 sm:pb-5">
            <ItemFields item={item} errors={errors} autoFocus={justAdded} onChange={onChange} />
            <div className="flex flex-wrap justify-between gap-3 pt-1">
              <Button variant="secondary" onClick={onRemove}>
                Remove item<span className="sr-only"> {itemName(item)}</span>
              </Button>
              {!hasErrors && (
                <Button variant="secondary" onClick={() => setOpen(false)}>
                  Close<span className="sr-only"> {itemName(item)}</span>
                </Button>
              )}
            </div>
          </div>
        )}
      </div>
    </li>
  );
}
