import { INCIDENT_DESCRIPTION_MAX, INCIDENT_NOTE_MAX } from '@shared/schemas/incidents';
import { controlClass, Field, TextField } from '../../../components/ui/field';
import type { FieldErrors } from '../../../lib/form-errors';
import { InvolvedRows } from './involved-rows';
import { BatteryChoices, KindChoices, LocationChoices, type IncidentBattery } from './report-choices';
import type { ReportValues } from './report-form-values';
import { TreatmentChoices } from './treatment-choices';

export const areaClass = 'flex flex-col gap-5 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-6';

interface ReportFieldsProps {
  values: ReportValues;
  onChange: <K extends keyof ReportValues>(field: K) => (value: ReportValues[K]) => void;
  errors: FieldErrors;
  batteries: IncidentBattery[] | undefined;
  timeHint?: string;
}

/** What a report says, in three boxes: what and where, who, what care; the report form and the edit share them. */
export function ReportFields({ values, onChange: set, errors, batteries, timeHint }: ReportFieldsProps) {
  return (
    <>
      <div className={areaClass}>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Day" type="date" value={values.date} onChange={(event) => set('date')(event.target.value)} error={errors.date} />
          <TextField label="Time" type="time" className="tabular-nums" value={values.time} onChange={(event) => set('time')(event.target.value)} error={errors.time} hint={timeHint} />
        </div>
        <LocationChoices value={values.location} onChange={set('location')} error={errors.location} />
        <KindChoices value={values.kind} onChange={set('kind')} error={errors.kind} />
        {values.kind === 'battery_or_chemical' && <BatteryChoices batteries={batteries} value={values.batteryId} onChange={set('batteryId')} error={errors.batteryId} />}
        <Field label="What happened?" error={errors.description}>
          {(control) => (
            <textarea rows={4} maxLength={INCIDENT_DESCRIPTION_MAX} className={controlClass} value={values.description} onChange={(event) => set('description')(event.target.value)} {...control} />
          )}
        </Field>
      </div>
      <div className={areaClass}>
        <InvolvedRows rows={values.involved} onChange={set('involved')} errors={errors} />
      </div>
      <div className={areaClass}>
        <TreatmentChoices value={values.treatments} onChange={set('treatments')} error={errors.treatments} />
        <Field label="What was done straight away? (optional)" error={errors.immediateActions} hint="e.g. Battery bagged and taken outside; area cleared.">
          {(control) => (
            <textarea rows={3} maxLength={INCIDENT_NOTE_MAX} className={controlClass} value={values.immediateActions} onChange={(event) => set('immediateActions')(event.target.value)} {...control} />
          )}
        </Field>
      </div>
    </>
  );
}
