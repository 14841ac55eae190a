import { useState, type FormEvent } from 'react';
import { localDate } from '@shared/domain/event-clock';
import { dateOnlyField, FOLLOW_UP_TEXT_MAX, FOLLOW_UPS_MAX, type FollowUpJson, type IncidentJson } from '@shared/schemas/incidents';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { SelectField, TextField } from '../../../components/ui/field';
import { PlusIcon } from '../../../components/ui/icons';
import { TrashIcon } from '../../../components/ui/action-icons';
import { isApiError } from '../../../lib/api-client';
import type { FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import { useServerNow } from '../../../lib/server-clock';
import { formatDay } from './incident-words';
import type { IncidentWriter } from './use-incident-write';

/** A member who can own a follow-up (membership id, from the team feature through the route). */
export interface FollowUpOwner {
  id: string;
  name: string;
}

const asInput = ({ id, text, ownerId, dueOn, done }: FollowUpJson) => ({ id, text, ownerId, dueOn, done });
const ADD_FORM = 'follow-up-add';

function AddFollowUp({ writer, owners }: { writer: IncidentWriter; owners: FollowUpOwner[] | undefined }) {
  // Kept through failed sends, like a report's id: a resend after a lost answer finds the first.
  const [id, setId] = useState(newId);
  const [text, setText] = useState('');
  const [ownerId, setOwnerId] = useState('');
  const [dueOn, setDueOn] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const error = writer.errorFor(ADD_FORM);
  // The server keys a new row's fields `followUps.<n>.ownerId`: shown beside this form's inputs.
  const server: FieldErrors = {};
  if (isApiError(error)) for (const [path, message] of Object.entries(error.fields)) server[path.split('.').at(-1) ?? path] ??= message;
  const errors = { ...clientErrors, ...server };

  function submit(event: FormEvent) {
    event.preventDefault();
    const found: FieldErrors = {};
    if (!text.trim()) found.text = 'Say what is to be done';
    if (!ownerId) found.ownerId = 'Choose who does it';
    if (!dateOnlyField.safeParse(dueOn).success) found.dueOn = 'Choose the day it is due';
    setClientErrors(found);
    if (Object.keys(found).length > 0) return;
    const added = { id, text: text.trim(), ownerId, dueOn, done: false };
    writer.write({
      form: ADD_FORM,
      what: `add the follow-up ‘${added.text}’`,
      apply: (incident) => ({ followUps: [...incident.followUps.map(asInput), added] }),
      isIn: (incident) => incident.followUps.some((item) => item.id === id),
      onSaved: () => {
        setId(newId());
        setText('');
        setOwnerId('');
        setDueOn('');
      },
    });
  }

  return (
    <form noValidate onSubmit={submit} aria-label="Add a follow-up" className="flex flex-col gap-4 rounded-2xl border-2 border-dashed border-line-strong p-4">
      <TextField label="Follow-up to do" maxLength={FOLLOW_UP_TEXT_MAX} autoComplete="off" value={text} onChange={(event) => setText(event.target.value)} error={errors.text} />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Who does it" value={ownerId} onChange={(event) => setOwnerId(event.target.value)} error={errors.ownerId} disabled={!owners}>
          <option value="">{owners ? 'Choose…' : 'Loading the members…'}</option>
          {owners?.map((owner) => (
            <option key={owner.id} value={owner.id}>
              {owner.name}
            </option>
          ))}
        </SelectField>
        <TextField label="Due by" type="date" value={dueOn} onChange={(event) => setDueOn(event.target.value)} error={errors.dueOn} />
      </div>
      {error && !isApiError(error, 'invalid') && <ErrorNotice title="The follow-up was not added" error={error} />}
      <Button type="submit" variant="secondary" className="self-start" icon={<PlusIcon className="size-5" />} pending={writer.pendingFor(ADD_FORM)} disabled={writer.pending}>
        Add the follow-up
      </Button>
    </form>
  );
}

function FollowUpRow({ item, writer, today }: { item: FollowUpJson; writer: IncidentWriter; today: string }) {
  const form = `follow-up-${item.id}`;
  // The tick shows at once, before the answer: a box that stays empty for a second gets tapped again.
  const [asked, setAsked] = useState<boolean | null>(null);
  const done = asked ?? item.done;
  const late = !done && item.dueOn < today;
  const tick = (on: boolean) => {
    setAsked(on);
    writer.write({
      form,
      what: `${on ? 'tick' : 'untick'} ‘${item.text}’`,
      apply: (incident) => ({ followUps: incident.followUps.map((other) => (other.id === item.id ? { ...asInput(other), done: on } : asInput(other))) }),
      isIn: (incident) => incident.followUps.some((other) => other.id === item.id && other.done === on),
      onSettled: () => setAsked(null),
    });
  };
  const remove = () =>
    writer.write({
      form,
      what: `remove ‘${item.text}’`,
      apply: (incident) => ({ followUps: incident.followUps.filter((other) => other.id !== item.id).map(asInput) }),
      isIn: (incident) => !incident.followUps.some((other) => other.id === item.id),
    });
  const error = writer.errorFor(form);
  return (
    <li className="flex flex-col gap-2 rounded-xl border-2 border-line p-3 has-checked:border-ok">
      <div className="flex flex-wrap items-center gap-3">
        <label className="flex min-h-12 min-w-0 flex-1 basis-64 cursor-pointer items-center gap-3">
          <input type="checkbox" className="size-7 shrink-0 accent-accent" checked={done} disabled={writer.pending} onChange={(event) => tick(event.target.checked)} />
          <span className="min-w-0">
            <span className="block text-lg font-semibold break-words">{item.text}</span>
            <span className="block text-ink-muted">
              {item.ownerName} · due {formatDay(item.dueOn)}
              {done ? <strong className="text-ok"> · done</strong> : late ? <strong className="text-danger"> · overdue</strong> : ''}
            </span>
          </span>
        </label>
        <Button variant="quiet" icon={<TrashIcon className="size-5" />} onClick={remove} disabled={writer.pending}>
          Remove<span className="sr-only"> ‘{item.text}’</span>
        </Button>
      </div>
      {error && <ErrorNotice title="Not saved" error={error} />}
    </li>
  );
}

/** The actions that follow from a report, each with an owner and a due day, ticked when done. */
export function FollowUps({ incident, writer, owners, timeZone }: { incident: IncidentJson; writer: IncidentWriter; owners: FollowUpOwner[] | undefined; timeZone: string }) {
  const today = localDate(useServerNow(60_000), timeZone);
  const open = incident.followUps.filter((item) => !item.done).length;
  return (
    <section aria-labelledby="follow-ups-title" className="flex flex-col gap-3">
      <h2 id="follow-ups-title" className="text-2xl font-bold">
        Follow-ups{' '}
        {incident.followUps.length > 0 && (
          <span className="text-lg font-semibold text-ink-muted tabular-nums">
            {open} of {incident.followUps.length} to do
          </span>
        )}
      </h2>
      {incident.followUps.length === 0 ? (
        <p className="text-ink-muted">None yet. Add what must happen so it does not happen again.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {incident.followUps.map((item) => (
            <FollowUpRow key={item.id} item={item} writer={writer} today={today} />
          ))}
        </ul>
      )}
      {incident.followUps.length < FOLLOW_UPS_MAX && <AddFollowUp writer={writer} owners={owners} />}
    </section>
  );
}
