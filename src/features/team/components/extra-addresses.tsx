import { useState } from 'react';
import { EXTRA_ADDRESSES_MAX } from '@shared/schemas/mail';
import { emailField } from '@shared/schemas/session';
import { Button } from '../../../components/ui/button';
import { Field, controlClass } from '../../../components/ui/field';
import type { FieldErrors } from '../../../lib/form-errors';

/** The address typed into the box, checked like the server will; an error message or the address as stored. */
export function readAddress(typed: string, list: string[]): { ok: true; address: string } | { ok: false; error: string } {
  const parsed = emailField.safeParse(typed);
  if (!parsed.success) return { ok: false, error: parsed.error.issues[0]?.message ?? 'Enter a valid e-mail address' };
  if (list.includes(parsed.data)) return { ok: false, error: 'Already in the list' };
  if (list.length >= EXTRA_ADDRESSES_MAX) return { ok: false, error: `At most ${EXTRA_ADDRESSES_MAX} addresses` };
  return { ok: true, address: parsed.data };
}

interface ExtraAddressesProps {
  addresses: string[];
  onChange: (addresses: string[]) => void;
  /** What is in the box but not yet added; saving the rule takes it too. */
  typed: string;
  onTypedChange: (typed: string) => void;
  /** `extraAddresses` for the list, `extraAddresses.<n>` per address (the server's keys), `typed` for the box. */
  errors: FieldErrors;
}

/** Addresses outside the team (a parent on call, the school's office) that hear of these incidents too. */
export function ExtraAddresses({ addresses, onChange, typed, onTypedChange, errors }: ExtraAddressesProps) {
  const [typedError, setTypedError] = useState<string | undefined>();

  function add() {
    const read = readAddress(typed, addresses);
    setTypedError(read.ok ? undefined : read.error);
    if (!read.ok) return;
    onChange([...addresses, read.address]);
    onTypedChange('');
  }

  return (
    <div className="flex flex-col gap-2">
      <p className="font-semibold">Other addresses</p>
      {addresses.length === 0 ? (
        <p className="text-ink-muted">None.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {addresses.map((address, index) => (
            <li key={address} className="flex flex-col gap-1">
              <div className="flex items-center justify-between gap-3 rounded-xl bg-sunken py-1 pr-1 pl-4">
                <span className="min-w-0 break-all">{address}</span>
                <Button variant="secondary" aria-label={`Remove ${address}`} onClick={() => onChange(addresses.filter((each) => each !== address))}>
                  Remove
                </Button>
              </div>
              {errors[`extraAddresses.${index}`] && <p className="font-semibold text-danger">{errors[`extraAddresses.${index}`]}</p>}
            </li>
          ))}
        </ul>
      )}
      {errors.extraAddresses && <p className="font-semibold text-danger">{errors.extraAddresses}</p>}
      <Field label="Add an address" error={typedError ?? errors.typed}>
        {(control) => (
          <div className="flex gap-2">
            <input
              {...control}
              type="email"
              inputMode="email"
              autoComplete="off"
              autoCapitalize="none"
              spellCheck={false}
              className={`${controlClass} min-w-0 flex-1`}
              value={typed}
              onChange={(event) => {
                setTypedError(undefined);
                onTypedChange(event.target.value);
              }}
              onKeyDown={(event) => {
                // Enter adds the address rather than saving the whole rule.
                if (event.key !== 'Enter') return;
                event.preventDefault();
                add();
              }}
            />
            <Button variant="secondary" onClick={add}>
              Add
            </Button>
          </div>
        )}
      </Field>
    </div>
  );
}
