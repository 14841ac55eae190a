import { useState, type FormEvent, type ReactNode } from 'react';
import { createEventSchema, type EventJson, type EventSettingsJson } from '@shared/schemas/events';
import { Button, LinkButton } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { TextField } from '../../../components/ui/field';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { TimeZoneSelect } from './time-zone-select';
import { TimingSettingsFields } from './timing-settings-fields';
import { readTiming, serverTimingErrors, type TimingValues } from './timing-settings-values';

/** What the inputs hold: strings, as typed, so that nothing the user entered is lost or reformatted. */
export interface EventFormValues {
  name: string;
  venue: string;
  timeZone: string;
  startDate: string;
  endDate: string;
  teamNumber: string;
}

export type EventFields = Pick<EventJson, 'name' | 'venue' | 'timeZone' | 'startDate' | 'endDate' | 'teamNumber'>;

export function formValuesOf(event: EventFields): EventFormValues {
  return { ...event, teamNumber: String(event.teamNumber) };
}

interface EventFormProps {
  initialValues: EventFormValues;
  /** Shown only when creating: the create call can make the new event current in the same step. */
  makeCurrent?: { checked: boolean; onChange: (checked: boolean) => void };
  submitLabel: string;
  pending: boolean;
  /** The failed save, for the server's message and its per-field messages; null while `notice` explains it. */
  saveError: unknown;
  /** Shown only when editing: the timing settings, saved in the same request as the rest. */
  timing?: TimingValues;
  /** `settings` is the whole checked set when `timing` is given; the caller picks what changed. */
  onSubmit: (fields: EventFields, values: EventFormValues, settings?: EventSettingsJson) => void;
  /** Rendered above the fields, e.g. the notice that someone else saved first. */
  notice?: ReactNode;
}

export function EventForm({ initialValues, makeCurrent, timing, submitLabel, pending, saveError, onSubmit, notice }: EventFormProps) {
  const [values, setValues] = useState(initialValues);
  const [timingValues, setTimingValues] = useState(timing);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [timingErrors, setTimingErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, saveError);

  const set = (field: keyof EventFormValues) => (value: string) => setValues((old) => ({ ...old, [field]: value }));

  function submit(event: FormEvent) {
    event.preventDefault();
    const typedNumber = values.teamNumber.trim() === '' ? undefined : Number(values.teamNumber);
    const parsed = parseForm(createEventSchema, { ...values, teamNumber: typedNumber });
    // Both parts are checked on every submit, so all the messages show at once.
    const settings = timingValues && readTiming(timingValues);
    setTimingErrors(settings && !settings.ok ? settings.errors : {});
    if (!parsed.ok) {
      // The schema's "YYYY-MM-DD" hint is for API callers; a date picker left empty needs plainer words.
      if (!values.startDate) parsed.errors.startDate = 'Choose the first day';
      if (!values.endDate) parsed.errors.endDate = 'Choose the last day';
      setClientErrors(parsed.errors);
      return;
    }
    setClientErrors({});
    if (settings && !settings.ok) return;
    const { name, venue, timeZone, startDate, endDate, teamNumber } = parsed.data;
    onSubmit({ name, venue, timeZone, startDate, endDate, teamNumber }, values, settings?.data);
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-5">
      {notice}
      {saveError != null && <ErrorNotice error={saveError} title="Not saved" />}
      <TextField
        label="Event name"
        value={values.name}
        onChange={(event) => set('name')(event.target.value)}
        error={errors.name}
      />
      <TextField
        label="Venue"
        hint="Arena or school, and the city."
        value={values.venue}
        onChange={(event) => set('venue')(event.target.value)}
        error={errors.venue}
      />
      <TimeZoneSelect value={values.timeZone} onChange={set('timeZone')} error={errors.timeZone} />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField
          label="First day"
          type="date"
          value={values.startDate}
          onChange={(event) => set('startDate')(event.target.value)}
          error={errors.startDate}
        />
        <TextField
          label="Last day"
          type="date"
          min={values.startDate || undefined}
          value={values.endDate}
          onChange={(event) => set('endDate')(event.target.value)}
          error={errors.endDate}
        />
      </div>
      <TextField
        label="Our team number at this event"
        inputMode="numeric"
        pattern="[0-9]*"
        className="max-w-48 tabular-nums"
        value={values.teamNumber}
        onChange={(event) => set('teamNumber')(event.target.value)}
        error={errors.teamNumber}
      />
      {timingValues && (
        <TimingSettingsFields values={timingValues} errors={{ ...timingErrors, ...serverTimingErrors(saveError) }} onChange={setTimingValues} />
      )}
      {makeCurrent && (
        <Checkbox
          label="Make it our current event (the board shows it)"
          checked={makeCurrent.checked}
          onChange={(event) => makeCurrent.onChange(event.target.checked)}
        />
      )}
      <div className="flex flex-wrap gap-3 pt-2">
        <Button type="submit" pending={pending}>
          {submitLabel}
        </Button>
        <LinkButton to="/events" variant="secondary">
          Cancel
        </LinkButton>
      </div>
    </form>
  );
}
