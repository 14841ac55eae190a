import { useState, type FormEvent, type ReactNode } from 'react';
import { CHEMISTRIES } from '@shared/domain/battery-state';
import { BATTERY_LABEL_MAX } from '@shared/schemas/batteries';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, Field, SelectField, TextField } from '../../../components/ui/field';
import { mergeFieldErrors, type FieldErrors } from '../../../lib/form-errors';
import { CHEMISTRY_WORDS } from './battery-format';
import { readBatteryForm, type BatteryFields, type BatteryFormValues } from './battery-form-values';

interface BatteryFormProps {
  title: string;
  initialValues: BatteryFormValues;
  submitLabel: string;
  pending: boolean;
  /** The failed save, for its message and its field messages; null while `notice` explains it. */
  saveError: unknown;
  onSubmit: (fields: BatteryFields) => void;
  onCancel: () => void;
  cancelLabel?: string;
  notice?: ReactNode;
}

/** A battery's facts: the label painted on it, its year, rated capacity, chemistry and notes. Adds and edits. */
export function BatteryForm({ title, initialValues, submitLabel, pending, saveError, onSubmit, onCancel, cancelLabel = 'Cancel', notice }: BatteryFormProps) {
  const [values, setValues] = useState(initialValues);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, saveError);
  const set = (field: keyof BatteryFormValues) => (event: { target: { value: string } }) => setValues((old) => ({ ...old, [field]: event.target.value }));

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readBatteryForm(values);
    setClientErrors(read.ok ? {} : read.errors);
    if (read.ok) onSubmit(read.data);
  }

  return (
    <form noValidate onSubmit={submit} aria-label={title} className="flex flex-col gap-4">
      <h2 className="text-2xl font-bold">{title}</h2>
      {notice}
      {saveError != null && <ErrorNotice error={saveError} title="Not saved" />}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Label"
          hint="As painted on the battery, e.g. A or 2027-3."
          autoComplete="off"
          autoCapitalize="characters"
          maxLength={BATTERY_LABEL_MAX}
          value={values.label}
          onChange={set('label')}
          error={errors.label}
        />
        <TextField label="Year in service" inputMode="numeric" pattern="[0-9]*" className="tabular-nums" value={values.yearInService} onChange={set('yearInService')} error={errors.yearInService} />
        <TextField
          label="Rated capacity (Ah)"
          hint="At the 20-hour rate, as printed on it; robot batteries are usually 18 Ah."
          inputMode="decimal"
          className="tabular-nums"
          value={values.nominalCapacityAh}
          onChange={set('nominalCapacityAh')}
          error={errors.nominalCapacityAh}
        />
        <SelectField label="Chemistry" value={values.chemistry} onChange={set('chemistry')} error={errors.chemistry}>
          {CHEMISTRIES.map((chemistry) => (
            <option key={chemistry} value={chemistry}>
              {CHEMISTRY_WORDS[chemistry]}
            </option>
          ))}
        </SelectField>
      </div>
      <Field label="Notes (optional)" error={errors.notes}>
        {(control) => <textarea rows={2} maxLength={500} className={controlClass} value={values.notes} onChange={set('notes')} {...control} />}
      </Field>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="lg" pending={pending}>
          {submitLabel}
        </Button>
        <Button variant="secondary" size="lg" onClick={onCancel}>
          {cancelLabel}
        </Button>
      </div>
    </form>
  );
}
