import { useId, useState, type KeyboardEvent } from 'react';
import { ITEM_OPTIONS_MAX } from '@shared/schemas/checks';
import { Button } from '../../../../components/ui/button';
import { controlClass } from '../../../../components/ui/field';
import { PlusIcon } from '../../../../components/ui/icons';

interface OptionChipsProps {
  options: string[];
  /** A bumper colour item's options are Red and Blue, nothing else. */
  locked: boolean;
  error?: string;
  onChange: (options: string[]) => void;
}

/** The options of a choice item: a chip per option, removable, and a box to add one. */
export function OptionChips({ options, locked, error, onChange }: OptionChipsProps) {
  const [typed, setTyped] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const inputId = useId();
  const errorId = useId();
  const full = options.length >= ITEM_OPTIONS_MAX;

  function add() {
    const option = typed.trim();
    if (option === '') return setProblem('Type the option first');
    if (options.some((known) => known.toLowerCase() === option.toLowerCase())) return setProblem(`“${option}” is listed already`);
    onChange([...options, option]);
    setTyped('');
    setProblem(null);
  }

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    // Enter adds the option instead of sending the whole form.
    if (event.key !== 'Enter') return;
    event.preventDefault();
    add();
  }

  const message = problem ?? error;
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={message ? errorId : undefined}>
      <legend className="mb-1.5 font-semibold">Options</legend>
      {options.length > 0 ? (
        <ul className="flex flex-wrap gap-2">
          {options.map((option) => (
            <li key={option} className="inline-flex min-h-12 items-center rounded-full border-2 border-line-strong bg-sunken pl-4 font-semibold">
              <span className={locked ? 'pr-4' : ''}>{option}</span>
              {!locked && (
                <button
                  type="button"
                  aria-label={`Remove the option ${option}`}
                  className="flex size-12 items-center justify-center rounded-full text-ink-muted hover:bg-line active:bg-line"
                  onClick={() => onChange(options.filter((other) => other !== option))}
                >
                  <PlusIcon className="size-5 rotate-45" />
                </button>
              )}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-ink-muted">No options yet: a choice needs at least two.</p>
      )}
      {!locked && !full && (
        <div className="flex flex-wrap gap-2">
          <label htmlFor={inputId} className="sr-only">
            New option
          </label>
          <input
            id={inputId}
            className={`${controlClass} min-w-0 flex-1 basis-40`}
            placeholder="e.g. Low, OK, High"
            maxLength={40}
            value={typed}
            aria-invalid={message ? true : undefined}
            onChange={(event) => setTyped(event.target.value)}
            onKeyDown={onKeyDown}
          />
          <Button variant="secondary" icon={<PlusIcon className="size-5" />} onClick={add}>
            Add option
          </Button>
        </div>
      )}
      {message && (
        <p id={errorId} className="font-semibold text-danger">
          {message}
        </p>
      )}
    </fieldset>
  );
}
