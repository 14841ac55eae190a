import { useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import type { EventJson, EventSettingsJson } from '@shared/schemas/events';
import { Card } from '../../../components/ui/card';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useEvent } from '../api/get-event';
import { staleEvent, useUpdateEvent } from '../api/update-event';
import { EventForm, formValuesOf, type EventFields, type EventFormValues } from './event-form';
import { StaleEventNotice } from './stale-event-notice';
import { timingChanges, timingValuesOf } from './timing-settings-values';

/** Only the fields the user changed from the version they started with, so a save overwrites nothing else. */
function changesFrom(base: EventJson, fields: EventFields): Partial<EventFields> {
  return Object.fromEntries(
    (Object.keys(fields) as (keyof EventFields)[])
      .filter((key) => fields[key] !== base[key])
      .map((key) => [key, fields[key]]),
  );
}

function EditEventForm({ event }: { event: EventJson }) {
  const navigate = useNavigate();
  const update = useUpdateEvent();
  const [base, setBase] = useState(event);
  const [formKey, setFormKey] = useState(0);
  const [mine, setMine] = useState<{ fields: EventFields; values: EventFormValues; settings?: EventSettingsJson } | null>(null);
  const theirs = staleEvent(update.error);

  function save(fields: EventFields, version: number, settings?: EventSettingsJson) {
    const changes = changesFrom(base, fields);
    // Sent only when one changed: a save of the name must not rewrite timing another admin just set.
    const settingsChanges = settings && timingChanges(base.settings, settings);
    if (Object.keys(changes).length === 0 && !settingsChanges) return navigate('/events');
    const body = { id: event.id, ...changes, ...(settingsChanges && { settings: settingsChanges }), version };
    update.mutate(body, { onSuccess: () => navigate('/events') });
  }

  function takeTheirs(latest: EventJson) {
    update.reset();
    setBase(latest);
    setMine(null);
    setFormKey((key) => key + 1);
  }

  return (
    <EventForm
      key={formKey}
      initialValues={formValuesOf(base)}
      timing={timingValuesOf(base.settings)}
      submitLabel="Save changes"
      pending={update.isPending}
      saveError={theirs ? null : update.error}
      onSubmit={(fields, values, settings) => {
        setMine({ fields, values, settings });
        save(fields, base.version, settings);
      }}
      notice={
        theirs &&
        mine && (
          <StaleEventNotice
            theirs={theirs}
            mine={mine.values}
            pending={update.isPending}
            onKeepMine={() => save(mine.fields, theirs.version, mine.settings)}
            onTakeTheirs={() => takeTheirs(theirs)}
          />
        )
      }
    />
  );
}

export function EditEventPage() {
  const { eventId = '' } = useParams();
  const event = useEvent(eventId);

  return (
    <>
      <PageHeader title="Edit event" description={event.data?.name} />
      <Card className="max-w-3xl">
        {event.isPending && <Loading label="Loading the event" />}
        {event.isError && (
          <ErrorNotice
            title="Could not load the event"
            error={event.error}
            onRetry={() => event.refetch()}
            retrying={event.isFetching}
          />
        )}
        {/* Mounted once with the loaded version: later refetches must not wipe what is being typed. */}
        {event.isSuccess && <EditEventForm event={event.data} />}
      </Card>
    </>
  );
}
