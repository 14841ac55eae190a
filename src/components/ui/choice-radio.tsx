import { useId, type InputHTMLAttributes, type ReactNode } from 'react';
import { CheckIcon } from './icons';

interface ChoiceGroupProps {
  legend: ReactNode;
  error?: string;
  hint?: ReactNode;
  className?: string;
  children: ReactNode;
}

/** A set of ChoiceRadio tiles under a legend, with its hint and error read with it. */
export function ChoiceGroup({ legend, error, hint, className = 'flex flex-wrap gap-2', children }: ChoiceGroupProps) {
  const id = useId();
  const describedBy = [error ? `${id}-error` : '', hint ? `${id}-hint` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <fieldset aria-describedby={describedBy} aria-invalid={error ? true : undefined} className="flex min-w-0 flex-col gap-1.5">
      <legend className="mb-1.5 font-semibold">{legend}</legend>
      <div className={className}>{children}</div>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="font-semibold text-danger">
          {error}
        </p>
      )}
    </fieldset>
  );
}

interface ChoiceRadioProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> {
  children: ReactNode;
}

/**
 * A native radio drawn as a big tile (at least 56 px): the whole tile is the target, arrow keys
 * move between tiles, and the chosen one shows a tick besides its border and tint.
 */
export function ChoiceRadio({ children, className = '', ...props }: ChoiceRadioProps) {
  return (
    <label
      className={`flex min-h-14 cursor-pointer items-center justify-center gap-2 rounded-xl border-[3px] border-line-strong bg-surface px-4 text-lg font-bold select-none has-checked:border-accent has-checked:bg-accent-soft has-checked:text-accent-ink has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-focus has-disabled:cursor-not-allowed has-disabled:opacity-60 ${className}`}
    >
      <input type="radio" className="peer sr-only" {...props} />
      <CheckIcon className="hidden size-5 peer-checked:block" strokeWidth={3} />
      {children}
    </label>
  );
}
