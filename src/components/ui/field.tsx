import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

export const controlClass =
  'block w-full min-h-12 rounded-xl border-2 border-line-strong bg-surface px-4 py-2 text-lg text-ink ' +
  'placeholder:text-ink-muted aria-invalid:border-danger disabled:opacity-60';

interface ControlProps {
  id: string;
  'aria-invalid': boolean | undefined;
  'aria-describedby': string | undefined;
}

interface FieldProps {
  label: string;
  error?: string;
  hint?: ReactNode;
  children: (control: ControlProps) => ReactNode;
}

/** Label, control, hint and error wired together so a screen reader reads them as one. */
export function Field({ label, error, hint, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {hint && (
        <p id={hintId} className="text-sm text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="font-semibold text-danger">
          {error}
        </p>
      )}
    </div>
  );
}

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: string;
  error?: string;
  hint?: ReactNode;
}

export function TextField({ label, error, hint, className = '', ...props }: TextFieldProps) {
  return (
    <Field label={label} error={error} hint={hint}>
      {(control) => <input className={`${controlClass} ${className}`} {...control} {...props} />}
    </Field>
  );
}

interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: string;
  error?: string;
  hint?: ReactNode;
}

export function SelectField({ label, error, hint, className = '', children, ...props }: SelectFieldProps) {
  return (
    <Field label={label} error={error} hint={hint}>
      {(control) => (
        <select className={`${controlClass} ${className}`} {...control} {...props}>
          {children}
        </select>
      )}
    </Field>
  );
}
