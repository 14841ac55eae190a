import { useEffect, useRef, useState } from 'react';
import { INVOLVED_MAX, INVOLVED_ROLE_LABELS, INVOLVED_ROLES, type InvolvedRole } from '@shared/schemas/incidents';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { PlusIcon } from '../../../components/ui/icons';
import { TrashIcon } from '../../../components/ui/action-icons';
import type { FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import type { PersonRow } from './report-form-values';

interface InvolvedRowsProps {
  rows: PersonRow[];
  onChange: (rows: PersonRow[]) => void;
  /** Keyed `involved.<row>.initials` and `involved.<row>.role`, as the server keys them. */
  errors: FieldErrors;
}

/** People involved, one row each: initials and who they were, never a name (members include minors). */
export function InvolvedRows({ rows, onChange, errors }: InvolvedRowsProps) {
  // A row just added takes the focus (its initials are typed next); a row removed hands it to "Add a person".
  const [added, setAdded] = useState<string | null>(null);
  const [removed, setRemoved] = useState(0);
  const addButton = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (removed > 0) addButton.current?.querySelector('button')?.focus();
  }, [removed]);
  const update = (index: number, change: Partial<PersonRow>) => onChange(rows.map((row, at) => (at === index ? { ...row, ...change } : row)));
  function add() {
    const key = newId();
    setAdded(key);
    onChange([...rows, { key, initials: '', role: '' }]);
  }
  function remove(index: number) {
    onChange(rows.filter((_, at) => at !== index));
    setRemoved((count) => count + 1);
  }
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1.5 font-semibold">People involved</legend>
      <p className="text-sm text-ink-muted">Initials only, never names. Add nobody for a near miss with nobody near.</p>
      {rows.map((row, index) => (
        <div key={row.key} className="grid items-start gap-3 rounded-xl border-2 border-line p-3 sm:grid-cols-[8rem_1fr_auto]">
          <TextField
            label={`Person ${index + 1}: initials`}
            autoFocus={row.key === added}
            value={row.initials}
            maxLength={8}
            autoComplete="off"
            autoCapitalize="characters"
            className="uppercase"
            onChange={(event) => update(index, { initials: event.target.value })}
            error={errors[`involved.${index}.initials`]}
          />
          <SelectField
            label={`Person ${index + 1}: who`}
            value={row.role}
            onChange={(event) => update(index, { role: event.target.value as InvolvedRole })}
            error={errors[`involved.${index}.role`]}
          >
            <option value="" disabled>
              Choose…
            </option>
            {INVOLVED_ROLES.map((role) => (
              <option key={role} value={role}>
                {INVOLVED_ROLE_LABELS[role]}
              </option>
            ))}
          </SelectField>
          <Button variant="quiet" className="sm:mt-8" icon={<TrashIcon className="size-5" />} onClick={() => remove(index)}>
            Remove<span className="sr-only"> person {index + 1}</span>
          </Button>
        </div>
      ))}
      {errors.involved && <p className="font-semibold text-danger">{errors.involved}</p>}
      <div ref={addButton} className="contents">
        {rows.length < INVOLVED_MAX && (
          <Button variant="secondary" className="self-start" icon={<PlusIcon className="size-5" />} onClick={add}>
            Add a person
          </Button>
        )}
      </div>
    </fieldset>
  );
}
