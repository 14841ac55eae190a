import { useState, type FormEvent } from 'react';
import type { BatteryJson } from '@shared/schemas/batteries';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup, ChoiceRadio } from '../../../components/ui/choice-radio';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, Field } from '../../../components/ui/field';
import { mergeFieldErrors, type FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import { useLogReading } from '../api/log-reading';
import { emptyReading, readReading, type ReadingValues } from './reading-form-values';
import { ReadingResult } from './reading-result';

function NumberField({ label, unit, value, onChange, error, hint, big = false }: {
  label: string;
  unit: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  hint?: string;
  big?: boolean;
}) {
  return (
    <Field label={label} error={error} hint={hint}>
      {(control) => (
        <div className="flex items-center gap-2">
          <input
            {...control}
            inputMode="decimal"
            enterKeyHint="next"
            autoComplete="off"
            value={value}
            onChange={(event) => onChange(event.target.value)}
            className={`${controlClass} text-right font-bold tabular-nums ${big ? 'min-h-16 text-3xl' : 'text-xl'}`}
          />
          <span className={`w-12 shrink-0 font-semibold ${big ? 'text-2xl' : 'text-lg'}`}>{unit}</span>
        </div>
      )}
    </Field>
  );
}

type LogReadingFormProps =
  /** The Batteries page: pick one of these by its label. */
  | { batteries: BatteryJson[] }
  /** A battery's own page (where its QR label leads): that battery, no picking. */
  | { battery: BatteryJson };

/**
 * "Log a reading", for one hand on a tablet: the battery by its big label, then the analyzer's
 * volts and milliohms on the decimal keypad, whether it rested, and a full-width button at the
 * bottom. The answer (charge and health) shows at once; the server's word on a field sits beside it.
 */
export function LogReadingForm(props: LogReadingFormProps) {
  const fixed = 'battery' in props ? props.battery : null;
  const choices = 'battery' in props ? [props.battery] : props.batteries;
  const log = useLogReading();
  // One id per reading, kept through failed attempts: a resend after a lost answer stores it once.
  const [id, setId] = useState(newId);
  const [values, setValues] = useState<ReadingValues>(() => emptyReading(fixed?.id));
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, log.error);
  const set = <K extends keyof ReadingValues>(field: K) => (value: ReadingValues[K]) => setValues((old) => ({ ...old, [field]: value }));
  const labelOf = (batteryId: string) => choices.find((battery) => battery.id === batteryId)?.label ?? '';
  const chosen = labelOf(values.batteryId);

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readReading(values);
    setClientErrors(read.ok ? {} : read.errors);
    if (!read.ok) return;
    log.mutate(
      { batteryId: read.batteryId, input: { ...read.input, id } },
      {
        onSuccess: () => {
          setId(newId());
          setValues(emptyReading(fixed?.id));
        },
      },
    );
  }

  return (
    <form noValidate onSubmit={submit} aria-labelledby="log-reading-title" className="flex flex-col gap-5 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-5">
      <h2 id="log-reading-title" className="text-2xl font-bold">
        {fixed ? `Log a reading for ${fixed.label}` : 'Log a reading'}
      </h2>
      {!fixed && (
        <ChoiceGroup legend="Battery" error={errors.batteryId} className="grid grid-cols-[repeat(auto-fill,minmax(5.5rem,1fr))] gap-2">
          {choices.map((battery) => (
            <ChoiceRadio
              key={battery.id}
              name="reading-battery"
              value={battery.id}
              checked={values.batteryId === battery.id}
              onChange={() => {
                // Another battery is another reading: it must not reuse the id of one that may have been stored.
                setId(newId());
                set('batteryId')(battery.id);
              }}
              className="text-2xl"
            >
              {battery.label}
            </ChoiceRadio>
          ))}
        </ChoiceGroup>
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField big label="Voltage" unit="V" value={values.voltage} onChange={set('voltage')} error={errors.voltage} />
        <NumberField big label="Internal resistance" unit="mΩ" value={values.resistance} onChange={set('resistance')} error={errors.internalResistanceMilliohm} />
      </div>
      <ChoiceGroup legend="Rested before this reading?" error={errors.rested} className="grid grid-cols-2 gap-2">
        <ChoiceRadio name="reading-rested" checked={values.rested === true} onChange={() => set('rested')(true)}>
          Rested
        </ChoiceRadio>
        <ChoiceRadio name="reading-rested" checked={values.rested === false} onChange={() => set('rested')(false)}>
          Not rested
        </ChoiceRadio>
      </ChoiceGroup>
      <div className="grid gap-4 sm:grid-cols-2">
        {values.rested && (
          <NumberField
            label="Rested for (minutes)"
            unit="min"
            value={values.restedMinutes}
            onChange={set('restedMinutes')}
            error={errors.restedMinutes}
            hint="Leave empty after 4 h or more. Under 4 h (240 min) its charge is marked not reliable."
          />
        )}
        <NumberField label="Temperature (optional)" unit="°C" value={values.temperature} onChange={set('temperature')} error={errors.temperatureC} />
      </div>
      {log.isError && <ErrorNotice title="The reading was not logged" error={log.error} />}
      {log.isSuccess && <ReadingResult reading={log.data} label={labelOf(log.data.batteryId)} />}
      <Button type="submit" size="lg" pending={log.isPending} className="w-full">
        {chosen ? `Log reading for ${chosen}` : 'Log reading'}
      </Button>
    </form>
  );
}
