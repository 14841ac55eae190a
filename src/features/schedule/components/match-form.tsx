import { useState, type FormEvent, type ReactNode } from 'react';
import { MATCH_LEVELS, type Alliance } from '@shared/domain/timeline';
import { AllianceTag } from '../../../components/ui/alliance';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, SelectField, TextField } from '../../../components/ui/field';
import type { FieldErrors } from '../../../lib/form-errors';
import { allianceWord } from '../../../lib/match-labels';
import { readMatchForm, serverMatchErrors, type MatchFields, type MatchFormValues } from './match-form-values';

interface MatchFormProps {
  initialValues: MatchFormValues;
  timeZone: string;
  /** Names the zone beside the time input, e.g. "CDT": the tablet's own zone may differ. */
  zoneLabel: string;
  submitLabel: string;
  pending: boolean;
  /** The failed save, for its message and field messages; null while `notice` explains it. */
  saveError: unknown;
  onSubmit: (fields: MatchFields, values: MatchFormValues) => void;
  onCancel: () => void;
  notice?: ReactNode;
}

const LEVEL_LABELS: Record<MatchFormValues['level'], string> = { practice: 'Practice', qualification: 'Qualification', playoff: 'Playoff' };

function SeatInputs({ alliance, values, error, onChange }: { alliance: Alliance; values: readonly string[]; error?: string; onChange: (seat: number, value: string) => void }) {
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="mb-1.5 flex items-center gap-2 font-semibold">
        <AllianceTag alliance={alliance} /> alliance teams
      </legend>
      <div className="grid grid-cols-3 gap-1.5 sm:gap-2">
        {values.map((value, seat) => (
          <input
            key={seat}
            aria-label={`${allianceWord(alliance)} ${seat + 1}`}
            aria-invalid={error ? true : undefined}
            inputMode="numeric"
            pattern="[0-9]*"
            className={`${controlClass} px-1 text-center text-base tabular-nums sm:text-lg`}
            value={value}
            onChange={(event) => onChange(seat, event.target.value)}
          />
        ))}
      </div>
      {error && <p className="font-semibold text-danger">{error}</p>}
    </fieldset>
  );
}

/** One match's level, number, start on the venue's clock and six teams; used to add and to edit. */
export function MatchForm({ initialValues, timeZone, zoneLabel, submitLabel, pending, saveError, onSubmit, onCancel, notice }: MatchFormProps) {
  const [values, setValues] = useState(initialValues);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = { ...clientErrors, ...serverMatchErrors(saveError) };

  const set = <K extends keyof MatchFormValues>(field: K, value: MatchFormValues[K]) => setValues((old) => ({ ...old, [field]: value }));
  const setSeat = (alliance: Alliance) => (seat: number, value: string) =>
    setValues((old) => ({ ...old, [alliance]: old[alliance].map((team, index) => (index === seat ? value : team)) }));

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readMatchForm(values, timeZone);
    if (!read.ok) return setClientErrors(read.errors);
    setClientErrors({});
    onSubmit(read.data, values);
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      {notice}
      {saveError != null && <ErrorNotice error={saveError} title="Not saved" />}
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Level" value={values.level} onChange={(event) => set('level', event.target.value as MatchFormValues['level'])} error={errors.level}>
          {MATCH_LEVELS.map((level) => (
            <option key={level} value={level}>
              {LEVEL_LABELS[level]}
            </option>
          ))}
        </SelectField>
        <TextField label="Number" inputMode="numeric" pattern="[0-9]*" className="tabular-nums" value={values.number} onChange={(event) => set('number', event.target.value)} error={errors.number} />
        <TextField label="Day" type="date" value={values.date} onChange={(event) => set('date', event.target.value)} error={errors.date} />
        <TextField label={`Scheduled start (${zoneLabel})`} type="time" className="tabular-nums" value={values.time} onChange={(event) => set('time', event.target.value)} error={errors.time} hint="On the venue's clock." />
      </div>
      <SeatInputs alliance="red" values={values.red} error={errors.red} onChange={setSeat('red')} />
      <SeatInputs alliance="blue" values={values.blue} error={errors.blue} onChange={setSeat('blue')} />
      <div className="flex flex-wrap gap-3 pt-1">
        <Button type="submit" pending={pending}>
          {submitLabel}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
