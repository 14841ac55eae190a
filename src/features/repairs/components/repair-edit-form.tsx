import { useState, type FormEvent } from 'react';
import { PARTS_LINES_MAX, REPAIR_DESCRIPTION_MAX, REPAIR_NOTE_MAX, REPAIR_TITLE_MAX, type RepairJson, type SubsystemJson } from '@shared/schemas/repairs';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, Field, TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import type { FieldErrors } from '../../../lib/form-errors';
import { staleRepair } from '../api/repairs-cache';
import { useUpdateRepair } from '../api/update-repair';
import type { RepairAssignee, RepairMatch } from './repair-context';
import { AssigneeSelect, FoundInSelect, MinutesField, SeverityChoices, SubsystemChoices } from './repair-fields';
import type { Namers } from './repair-format';
import { changedFields, editChanges, editValuesOf, fieldErrorsOf, readEdit, type EditBody, type EditValues } from './repair-form-values';
import { StaleRepairNotice } from './stale-repair-notice';

interface RepairEditFormProps {
  /** The ticket as it was when the form opened. */
  ticket: RepairJson;
  /** The ticket as the cache has it now (refetched after other tablets' changes). */
  latest: RepairJson;
  subsystems: SubsystemJson[];
  matches: RepairMatch[];
  assignees: RepairAssignee[] | undefined;
  names: Namers;
  onDone: () => void;
}

/**
 * Every field of a ticket. Mounted with the version loaded: a refetch must not wipe what is being
 * typed. Saving sends only the fields changed, with the version they were based on.
 */
export function RepairEditForm({ ticket, latest, subsystems, matches, assignees, names, onDone }: RepairEditFormProps) {
  const update = useUpdateRepair(ticket);
  const [base, setBase] = useState(ticket);
  const [values, setValues] = useState<EditValues>(() => editValuesOf(ticket));
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const theirs = staleRepair(update.error);
  const errors = fieldErrorsOf(clientErrors, theirs ? null : update.error);
  const read = readEdit(values);
  const mine: EditBody | null = read.ok ? read.data : null;
  const set = <K extends keyof EditValues>(field: K) => (value: EditValues[K]) => setValues((old) => ({ ...old, [field]: value }));
  const done = latest.status === 'done';

  function save(version: number) {
    setClientErrors(read.ok ? {} : read.errors);
    if (!read.ok) return;
    const changes = editChanges(base, read.data);
    if (Object.keys(changes).length === 0) return onDone();
    // A newer version that changed none of these fields (a move, often made on this very page)
    // cannot conflict with them: save on it rather than ask.
    const basedOn = latest.version > version && changedFields(base, latest).length === 0 ? latest.version : version;
    update.mutate({ ...changes, version: basedOn }, { onSuccess: onDone });
  }

  function takeTheirs(saved: RepairJson) {
    update.reset();
    setBase(saved);
    setValues(editValuesOf(saved));
    setClientErrors({});
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    save(base.version);
  }

  const problem = update.error && !theirs && !(isApiError(update.error, 'invalid') && Object.keys(errors).length > 0) ? update.error : null;
  return (
    <form noValidate onSubmit={submit} aria-label="Edit the ticket" className="flex flex-col gap-5">
      <TextField label="What is wrong?" maxLength={REPAIR_TITLE_MAX} value={values.title} onChange={(event) => set('title')(event.target.value)} error={errors.title} />
      <SeverityChoices value={values.severity} onChange={set('severity')} error={errors.severity} />
      <SubsystemChoices subsystems={subsystems} value={values.subsystem} onChange={set('subsystem')} error={errors.subsystem} />
      <div className="grid gap-5 sm:grid-cols-2">
        <AssigneeSelect assignees={assignees} value={values.assigneeId} onChange={set('assigneeId')} error={errors.assigneeId} currentName={base.assignee?.displayName} />
        <FoundInSelect matches={matches} value={values.foundInMatchId} onChange={set('foundInMatchId')} error={errors.foundInMatchId} />
        <MinutesField label="Estimate in minutes" value={values.estimate} onChange={set('estimate')} error={errors.estimateMinutes} hint="The whole fix; empty when nobody knows." />
        <MinutesField label="Time spent in minutes" value={values.timeSpent} onChange={set('timeSpent')} error={errors.timeSpentMinutes} />
      </div>
      <Field label="Description" error={errors.description}>
        {(control) => <textarea rows={3} maxLength={REPAIR_DESCRIPTION_MAX} className={controlClass} value={values.description} onChange={(event) => set('description')(event.target.value)} {...control} />}
      </Field>
      <Field label="Parts used" hint={`One part a line, up to ${PARTS_LINES_MAX} lines.`} error={errors.partsUsed}>
        {(control) => <textarea rows={3} className={controlClass} value={values.partsUsed} onChange={(event) => set('partsUsed')(event.target.value)} {...control} />}
      </Field>
      {(done || values.resolutionNote) && (
        <Field label="How was it fixed?" hint="The resolution note: what was wrong and what was done." error={errors.resolutionNote}>
          {(control) => (
            <textarea rows={3} maxLength={REPAIR_NOTE_MAX} className={controlClass} value={values.resolutionNote} onChange={(event) => set('resolutionNote')(event.target.value)} {...control} />
          )}
        </Field>
      )}
      {theirs && (
        <StaleRepairNotice base={base} theirs={theirs} mine={mine} names={names} pending={update.isPending} onKeepMine={() => save(theirs.version)} onTakeTheirs={() => takeTheirs(theirs)} />
      )}
      {problem && <ErrorNotice title="Not saved" error={problem} />}
      {!theirs && (
        <div className="flex flex-wrap gap-3">
          <Button type="submit" size="lg" pending={update.isPending}>
            Save changes
          </Button>
          <Button variant="secondary" size="lg" onClick={onDone}>
            Cancel
          </Button>
        </div>
      )}
    </form>
  );
}
