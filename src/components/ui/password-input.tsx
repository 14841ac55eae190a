import { useState } from 'react';
import { Field, controlClass } from './field';

interface PasswordInputProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  autoComplete: 'current-password' | 'new-password';
  error?: string;
  hint?: string;
}

/**
 * A password box with a Show toggle: typing on a tablet keyboard with cold hands goes wrong,
 * and seeing it beats a second "repeat password" box. The toggle's name is only "Show"/"Hide"
 * so that finding the field by its label stays unambiguous.
 */
export function PasswordInput({ label, value, onChange, autoComplete, error, hint }: PasswordInputProps) {
  const [visible, setVisible] = useState(false);
  return (
    <Field label={label} error={error} hint={hint}>
      {(control) => (
        <div className="flex gap-2">
          <input
            {...control}
            type={visible ? 'text' : 'password'}
            autoComplete={autoComplete}
            autoCapitalize="none"
            spellCheck={false}
            className={`${controlClass} min-h-14 flex-1`}
            value={value}
            onChange={(event) => onChange(event.target.value)}
          />
          <button
            type="button"
            aria-controls={control.id}
            onClick={() => setVisible((shown) => !shown)}
            className="min-h-14 min-w-20 rounded-xl border-2 border-line-strong px-3 font-semibold text-ink hover:bg-sunken"
          >
            {visible ? 'Hide' : 'Show'}
          </button>
        </div>
      )}
    </Field>
  );
}
