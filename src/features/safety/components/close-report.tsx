import { useState, type FormEvent } from 'react';
import { INCIDENT_NOTE_MAX, type IncidentJson } from '@shared/schemas/incidents';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, Field } from '../../../components/ui/field';
import { CheckIcon, UndoIcon } from '../../../components/ui/icons';
import { isApiError } from '../../../lib/api-client';
import { formatWhen } from './incident-words';
import type { IncidentWriter } from './use-incident-write';

const CLOSE_FORM = 'close';
const REOPEN_FORM = 'reopen';

function CloseForm({ incident, writer }: { incident: IncidentJson; writer: IncidentWriter }) {
  const [note, setNote] = useState(incident.closingNote ?? '');
  const [retire, setRetire] = useState(false);
  const [missing, setMissing] = useState(false);
  const error = writer.errorFor(CLOSE_FORM);
  const noteError = (missing ? 'Write what was done before closing' : undefined) ?? (isApiError(error) ? error.fields.closingNote : undefined);
  const retireError = isApiError(error) ? (error.fields.retireBattery ?? error.fields.batteryId) : undefined;
  const open = incident.followUps.filter((item) => !item.done).length;

  function submit(event: FormEvent) {
    event.preventDefault();
    setMissing(!note.trim());
    if (!note.trim()) return;
    const closingNote = note.trim();
    writer.write({
      form: CLOSE_FORM,
      what: retire ? `close the report and retire battery ${incident.batteryName}` : 'close the report',
      apply: (on) => ({ status: 'closed', closingNote, ...(retire && on.batteryId ? { retireBattery: true } : {}) }),
      // Closed with this very note: the send whose answer was lost went through (battery and all).
      isIn: (on) => on.status === 'closed' && on.closingNote === closingNote,
    });
  }

  return (
    <form noValidate onSubmit={submit} aria-label="Close the report" className="flex flex-col gap-4 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-6">
      <Field label="Closing note" error={noteError} hint="What was done, and what the team changed so it does not happen again.">
        {(control) => <textarea rows={3} maxLength={INCIDENT_NOTE_MAX} className={controlClass} value={note} onChange={(event) => setNote(event.target.value)} {...control} />}
      </Field>
      {incident.batteryId && (
        <div className="flex flex-col gap-1.5">
          <Checkbox label={`Retire battery ${incident.batteryName}: it leaves the rotation for good`} checked={retire} onChange={(event) => setRetire(event.target.checked)} />
          {retireError && <p className="font-semibold text-danger">{retireError}</p>}
        </div>
      )}
      {open > 0 && (
        <p className="font-semibold">
          {open === 1 ? '1 follow-up is' : `${open} follow-ups are`} not ticked yet. Closing keeps {open === 1 ? 'it' : 'them'} on the report.
        </p>
      )}
      {error && !isApiError(error, 'invalid') && !(noteError || retireError) && <ErrorNotice title="Not closed" error={error} />}
      <Button type="submit" size="lg" className="self-start" icon={<CheckIcon className="size-6" />} pending={writer.pendingFor(CLOSE_FORM)} disabled={writer.pending}>
        Close the report
      </Button>
    </form>
  );
}

/** Closing with a note (and, for a named battery, retiring it), or reopening a closed report. */
export function CloseReport({ incident, writer, timeZone }: { incident: IncidentJson; writer: IncidentWriter; timeZone: string }) {
  const error = writer.errorFor(REOPEN_FORM);
  return (
    <section aria-labelledby="close-title" className="flex flex-col gap-3">
      <h2 id="close-title" className="text-2xl font-bold">
        {incident.status === 'closed' ? 'Closed' : 'Close the report'}
      </h2>
      {incident.status === 'closed' ? (
        <div className="flex flex-col gap-3 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-6">
          {incident.closedAt && <p className="text-ink-muted tabular-nums">Closed {formatWhen(incident.closedAt, timeZone)}</p>}
          <p className="text-lg whitespace-pre-line">{incident.closingNote}</p>
          {error && <ErrorNotice title="Not reopened" error={error} />}
          <Button
            variant="secondary"
            className="self-start"
            icon={<UndoIcon className="size-5" />}
            pending={writer.pendingFor(REOPEN_FORM)}
            disabled={writer.pending}
            onClick={() => writer.write({ form: REOPEN_FORM, what: 'reopen the report', apply: () => ({ status: 'open' }), isIn: (on) => on.status === 'open' })}
          >
            Reopen the report
          </Button>
        </div>
      ) : (
        <CloseForm incident={incident} writer={writer} />
      )}
    </section>
  );
}
