import type { ButtonHTMLAttributes, Ref } from 'react';
import { GripIcon } from './icons';

interface DragHandleProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  /** What the handle moves, e.g. "Move ‘Main breaker on’". */
  label: string;
  ref?: Ref<HTMLButtonElement>;
}

/**
 * The grip a sortable row is dragged by: a full 48 px target, focusable for the keyboard.
 * `touch-action: manipulation` keeps a quick swipe over it scrolling the page; a press and hold
 * starts the drag (see useDragSensors).
 */
export function DragHandle({ label, className = '', ...props }: DragHandleProps) {
  return (
    <button
      type="button"
      aria-label={label}
      className={`flex size-12 shrink-0 cursor-grab touch-manipulation items-center justify-center rounded-xl border-2 border-line text-ink-muted select-none hover:bg-sunken active:cursor-grabbing active:bg-sunken aria-pressed:border-accent aria-pressed:text-accent-ink ${className}`}
      {...props}
    >
      <GripIcon className="size-7" />
    </button>
  );
}
