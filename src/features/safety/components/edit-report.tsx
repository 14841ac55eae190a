import { useMemo, useState, type FormEvent } from 'react';
import type { IncidentJson } from '@shared/schemas/incidents';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { isApiError } from '../../../lib/api-client';
import { useFocusFirstInvalid } from '../../../lib/focus-invalid';
import type { FieldErrors } from '../../../lib/form-errors';
import { ClassificationPreview } from './classification';
import type { IncidentBattery } from './report-choices';
import { ReportFields } from './report-fields';
import { editedBetween, readReport, reportChanges, reportErrorsOf, reportValuesOf, type ReportValues } from './report-form-values';
import type { IncidentWriter } from './use-incident-write';

const EDIT_FORM = 'edit';

interface EditReportProps {
  /** The report as it was when the form opened: a refetch must not wipe what is being typed. */
  incident: IncidentJson;
  /** The report as the page has it now (refetched after other tablets' changes). */
  latest: IncidentJson;
  writer: IncidentWriter;
  timeZone: string;
  batteries: IncidentBattery[] | undefined;
  onDone: () => void;
}

/**
 * Corrects what was reported (a later hospital visit, the right battery). Sends only the fields
 * changed; a change that makes the report more serious alerts again, as the preview says.
 */
export function EditReport({ incident, latest, writer, timeZone, batteries, onDone }: EditReportProps) {
  const [values, setValues] = useState<ReportValues>(() => reportValuesOf(incident, timeZone));
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const error = writer.errorFor(EDIT_FORM);
  const errors = reportErrorsOf(clientErrors, error);
  const form = useFocusFirstInvalid(clientErrors, error);
  const set = <K extends keyof ReportValues>(field: K) => (value: ReportValues[K]) => setValues((old) => ({ ...old, [field]: value }));
  // A battery retired since the report still shows as its choice.
  const choices = useMemo(
    () => (batteries && incident.batteryId && !batteries.some((battery) => battery.id === incident.batteryId) ? [...batteries, { id: incident.batteryId, label: incident.batteryName ?? '?' }] : batteries),
    [batteries, incident.batteryId, incident.batteryName],
  );

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readReport(values, incident.id, timeZone);
    setClientErrors(read.ok ? {} : read.errors);
    if (!read.ok) return;
    const changes = reportChanges(incident, read.data, timeZone);
    if (Object.keys(changes).length === 0) return onDone();
    // A newer version that changed none of these fields cannot conflict with them: save on it
    // rather than ask. One that did is answered stale, and the notice shows theirs.
    const untouched = editedBetween(incident, latest).every((field) => !(field in changes));
    writer.write(
      {
        form: EDIT_FORM,
        what: 'your edits to the report',
        apply: () => changes,
        // Every field as typed already: a send whose answer was lost saved them.
        isIn: (on) => Object.keys(reportChanges(on, read.data, timeZone)).length === 0,
        onSaved: onDone,
        onDropped: onDone,
      },
      untouched ? latest : incident,
    );
  }

  return (
    <form ref={form} noValidate onSubmit={submit} aria-label="Edit the report" className="flex flex-col gap-6">
      <ReportFields values={values} onChange={set} errors={errors} batteries={choices} />
      <ClassificationPreview kind={values.kind} treatments={values.treatments} before={incident} />
      {error && !isApiError(error, 'invalid') && <ErrorNotice title="Not saved" error={error} />}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="lg" pending={writer.pendingFor(EDIT_FORM)} disabled={writer.pending}>
          Save changes
        </Button>
        <Button variant="secondary" size="lg" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
