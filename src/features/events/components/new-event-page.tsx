import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Card } from '../../../components/ui/card';
import { PageHeader } from '../../../components/ui/page-header';
import { useViewer } from '../../../lib/authorization';
import { newId } from '../../../lib/new-id';
import { useCreateEvent } from '../api/create-event';
import { useCurrentEvent } from '../api/get-events';
import { EventForm, type EventFormValues } from './event-form';
import { browserTimeZone } from './time-zone-select';

export function NewEventPage() {
  const navigate = useNavigate();
  const { membership } = useViewer();
  const currentEvent = useCurrentEvent();
  const createEvent = useCreateEvent();
  // Kept through failed attempts: a resend after a lost answer must not make a second event.
  const [id] = useState(newId);
  const [makeCurrent, setMakeCurrent] = useState<boolean | null>(null);
  const [initialValues] = useState<EventFormValues>(() => ({
    name: '',
    venue: '',
    timeZone: browserTimeZone(),
    startDate: '',
    endDate: '',
    teamNumber: String(membership.teamNumber),
  }));

  // Until the user decides, a team with no current event gets this one as current.
  const current = makeCurrent ?? (currentEvent.isSuccess && currentEvent.data === null);

  return (
    <>
      <PageHeader title="New event" description="Where the team competes next. Dates are the venue's calendar days." />
      <Card className="max-w-3xl">
        <EventForm
          initialValues={initialValues}
          makeCurrent={{ checked: current, onChange: setMakeCurrent }}
          submitLabel="Create event"
          pending={createEvent.isPending}
          saveError={createEvent.error}
          onSubmit={(fields) =>
            createEvent.mutate({ ...fields, id, current }, { onSuccess: () => navigate('/events') })
          }
        />
      </Card>
    </>
  );
}
