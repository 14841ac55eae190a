import { useState, type FormEvent } from 'react';
import { TEXT_VALUE_MAX, type MarkValue } from '@shared/domain/checklist';
import type { RunItemJson } from '@shared/schemas/checks';
import { allianceSoftClass } from '../../../components/ui/alliance';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { CheckIcon, UndoIcon } from '../../../components/ui/icons';

interface ControlProps {
  item: RunItemJson;
  disabled: boolean;
  /** Sends a mark; the row applies it at once and shows the server's verdict. */
  onMark: (value: MarkValue) => void;
  /** Ids of the label and help, for the control's accessible name and description. */
  labelId: string;
  describedBy: string | undefined;
  /** Un-marks; given when the item holds a value and may be changed. */
  onClear?: () => void;
}

/** The item's label after a button's word, for screen readers: a run lists many Saves and Clears. */
export const ForItem = ({ label }: { label: string }) => <span className="sr-only"> {label}</span>;

/** Beside Save: takes the value back (the run's history keeps it). */
function ClearButton({ label, onClear }: { label: string; onClear: (() => void) | undefined }) {
  if (!onClear) return null;
  return (
    <Button variant="quiet" size="lg" icon={<UndoIcon className="size-5" />} onClick={onClear}>
      Clear
      <ForItem label={label} />
    </Button>
  );
}

/**
 * A tick: the box and the label form one target at least 56 px tall. Tapping a ticked item
 * un-ticks it (the row records who did).
 */
export function TickControl({ item, disabled, onToggle, label, describedBy }: {
  item: RunItemJson;
  disabled: boolean;
  onToggle: () => void;
  label: string;
  describedBy: string | undefined;
}) {
  const ticked = item.value === true;
  return (
    <button
      type="button"
      role="checkbox"
      aria-checked={ticked}
      aria-describedby={describedBy}
      disabled={disabled}
      onClick={onToggle}
      className="flex min-h-16 w-full items-center gap-4 rounded-xl text-left disabled:cursor-not-allowed"
    >
      <span
        className={`flex size-14 shrink-0 items-center justify-center rounded-xl border-[3px] ${
          ticked ? 'border-ok bg-ok text-surface' : 'border-line-strong bg-surface'
        }`}
      >
        {ticked && <CheckIcon className="size-10" strokeWidth={3.5} />}
      </span>
      <span className="min-w-0 text-xl font-bold break-words">{label}</span>
    </button>
  );
}

const numberText = (value: MarkValue | null) => (typeof value === 'number' ? String(value) : '');

/** "12,6" as typed on a tablet set to a comma locale reads as 12.6. */
function parseNumber(text: string): number | null {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

/**
 * A number, typed on the numeric keypad (inputMode decimal). Enter, leaving the field or Save
 * sends it; an emptied field goes back to the stored value (Clear un-marks).
 */
export function NumberControl({ item, disabled, onMark, labelId, describedBy, onClear }: ControlProps) {
  // null while not editing: the field then follows the stored value, which other tablets may change.
  const [draft, setDraft] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  function commit() {
    if (draft === null) return;
    if (draft.trim() === '') {
      setDraft(null);
      setProblem(null);
      return;
    }
    const value = parseNumber(draft);
    if (value === null) {
      setProblem('Type a number, e.g. 12.6');
      return;
    }
    setDraft(null);
    setProblem(null);
    if (value !== item.value) onMark(value);
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    commit();
  }

  const problemId = `${labelId}-problem`;
  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-center gap-3">
        <div className="flex items-center gap-2">
          <input
            inputMode="decimal"
            enterKeyHint="done"
            autoComplete="off"
            aria-labelledby={labelId}
            aria-describedby={[problem ? problemId : undefined, describedBy].filter(Boolean).join(' ') || undefined}
            aria-invalid={problem ? true : undefined}
            disabled={disabled}
            value={draft ?? numberText(item.value)}
            onChange={(event) => setDraft(event.target.value)}
            onBlur={commit}
            className={`${controlClass} min-h-14 w-28! text-right text-2xl font-bold tabular-nums sm:w-36!`}
          />
          {item.unit && <span className="text-xl font-semibold">{item.unit}</span>}
        </div>
        <Button type="submit" size="lg" variant={draft === null ? 'secondary' : 'primary'} disabled={disabled}>
          Save
          <ForItem label={item.label} />
        </Button>
        <ClearButton label={item.label} onClear={onClear} />
      </div>
      {problem && (
        <p id={problemId} className="font-semibold text-danger">
          {problem}
        </p>
      )}
    </form>
  );
}

/** Choices as big segmented buttons; the chosen one is pressed. Bumper colours wear their alliance's colour, with the word. */
export function ChoiceControl({ item, disabled, onMark, labelId, describedBy }: ControlProps) {
  return (
    <div role="group" aria-labelledby={labelId} aria-describedby={describedBy} className="flex flex-wrap gap-2">
      {item.options.map((option) => {
        const chosen = item.value === option;
        const alliance = option.toLowerCase() === 'red' ? 'red' : option.toLowerCase() === 'blue' ? 'blue' : null;
        const look = chosen ? (alliance ? `border-current ${allianceSoftClass(alliance)}` : 'border-accent bg-accent-soft text-accent-ink') : 'border-line-strong bg-surface';
        return (
          <button
            key={option}
            type="button"
            aria-pressed={chosen}
            disabled={disabled}
            onClick={() => !chosen && onMark(option)}
            className={`flex min-h-14 min-w-24 flex-1 items-center justify-center gap-2 rounded-xl border-[3px] px-4 text-lg font-bold disabled:cursor-not-allowed ${look}`}
          >
            {chosen && <CheckIcon className="size-6" strokeWidth={3} />}
            {option}
          </button>
        );
      })}
    </div>
  );
}

/** A short text (a code version, a note), sent with Enter or Save. */
export function TextControl({ item, disabled, onMark, labelId, describedBy, onClear }: ControlProps) {
  const stored = typeof item.value === 'string' ? item.value : '';
  const [draft, setDraft] = useState<string | null>(null);

  function submit(event: FormEvent) {
    event.preventDefault();
    if (draft === null) return;
    const text = draft.trim();
    setDraft(null);
    // Emptying the field is not an un-mark by accident: Clear does that.
    if (text !== '' && text !== stored) onMark(text);
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-wrap items-center gap-3">
      <input
        autoComplete="off"
        enterKeyHint="done"
        maxLength={TEXT_VALUE_MAX}
        aria-labelledby={labelId}
        aria-describedby={describedBy}
        disabled={disabled}
        value={draft ?? stored}
        onChange={(event) => setDraft(event.target.value)}
        className={`${controlClass} min-h-14 min-w-0 flex-1 basis-56 text-xl`}
      />
      <div className="flex gap-3">
        <Button type="submit" size="lg" variant={draft === null ? 'secondary' : 'primary'} disabled={disabled}>
          Save
          <ForItem label={item.label} />
        </Button>
        <ClearButton label={item.label} onClear={onClear} />
      </div>
    </form>
  );
}
