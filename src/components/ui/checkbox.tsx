import { useId, type InputHTMLAttributes, type ReactNode } from 'react';

interface CheckboxProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> {
  label: ReactNode;
}

/** The whole row is the target, not just the small box. */
export function Checkbox({ label, className = '', ...props }: CheckboxProps) {
  return (
    <label
      className={`flex min-h-12 cursor-pointer items-center gap-3 rounded-xl border-2 border-line px-3 py-2 has-checked:border-accent has-checked:bg-accent-soft ${className}`}
    >
      <input type="checkbox" className="size-6 shrink-0 accent-accent" {...props} />
      <span>{label}</span>
    </label>
  );
}

interface CheckboxGroupProps {
  legend: string;
  error?: string;
  children: ReactNode;
}

export function CheckboxGroup({ legend, error, children }: CheckboxGroupProps) {
  const errorId = useId();
  return (
    <fieldset aria-describedby={error ? errorId : undefined} className="flex flex-col gap-1.5">
      <legend className="mb-1.5 font-semibold">{legend}</legend>
      <div className="grid grid-cols-1 gap-2 sm:grid-cols-2">{children}</div>
      {error && (
        <p id={errorId} className="font-semibold text-danger">
          {error}
        </p>
      )}
    </fieldset>
  );
}
