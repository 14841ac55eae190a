import { Checkbox } from '../../../components/ui/checkbox';
import { controlClass, TextField } from '../../../components/ui/field';
import type { FieldErrors } from '../../../lib/form-errors';
import type { TimingValues } from './timing-settings-values';

interface TimingSettingsFieldsProps {
  values: TimingValues;
  errors: FieldErrors;
  onChange: (values: TimingValues) => void;
}

const numberProps = { inputMode: 'numeric' as const, pattern: '[0-9]*', className: 'max-w-40 tabular-nums' };

function UnitRadio({ unit, label, values, onChange }: { unit: TimingValues['queueLeadUnit']; label: string } & Omit<TimingSettingsFieldsProps, 'errors'>) {
  return (
    <label className="flex min-h-12 cursor-pointer items-center gap-3 rounded-xl border-2 border-line px-3 py-2 has-checked:border-accent has-checked:bg-accent-soft">
      <input
        type="radio"
        name="queue-lead-unit"
        className="size-6 accent-accent"
        checked={values.queueLeadUnit === unit}
        onChange={() => onChange({ ...values, queueLeadUnit: unit })}
      />
      {label}
    </label>
  );
}

/** The numbers the projection runs on: when to leave for queueing, and what counts as a tight turnaround. */
export function TimingSettingsFields({ values, errors, onChange }: TimingSettingsFieldsProps) {
  const set = (field: Exclude<keyof TimingValues, 'queueLeadUnit' | 'allowRunningAhead'>) => (event: { target: { value: string } }) =>
    onChange({ ...values, [field]: event.target.value });
  return (
    <fieldset className="flex flex-col gap-5 rounded-2xl border border-line p-4">
      <legend className="px-1 text-xl font-bold">Match timing</legend>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1.5 font-semibold">Go to queueing this long before our match</legend>
        <div className="flex flex-wrap items-center gap-3">
          <input
            aria-label={`Queue lead in ${values.queueLeadUnit}`}
            aria-invalid={errors.queueLead ? true : undefined}
            {...numberProps}
            className={`${controlClass} ${numberProps.className}`}
            value={values.queueLead}
            onChange={set('queueLead')}
          />
          <div className="flex gap-2">
            <UnitRadio unit="matches" label="matches" values={values} onChange={onChange} />
            <UnitRadio unit="minutes" label="minutes" values={values} onChange={onChange} />
          </div>
        </div>
        {errors.queueLead && <p className="font-semibold text-danger">{errors.queueLead}</p>}
      </fieldset>
      <TextField
        label="Match length (seconds)"
        hint="From the start signal to the field being clear."
        {...numberProps}
        value={values.matchLengthSeconds}
        onChange={set('matchLengthSeconds')}
        error={errors.matchLengthSeconds}
      />
      <TextField
        label="Back to the pit (minutes)"
        hint="From leaving the field to the robot on our bench."
        {...numberProps}
        value={values.returnToPitMinutes}
        onChange={set('returnToPitMinutes')}
        error={errors.returnToPitMinutes}
      />
      <TextField
        label="Tight turnaround under (minutes)"
        hint="Less time than this between our matches is flagged on the schedule."
        {...numberProps}
        value={values.tightTurnaroundMinutes}
        onChange={set('tightTurnaroundMinutes')}
        error={errors.tightTurnaroundMinutes}
      />
      <Checkbox
        label="The field may run ahead of schedule (when off, no match is projected before its printed time)"
        checked={values.allowRunningAhead}
        onChange={(event) => onChange({ ...values, allowRunningAhead: event.target.checked })}
      />
      {errors.allowRunningAhead && <p className="font-semibold text-danger">{errors.allowRunningAhead}</p>}
    </fieldset>
  );
}
