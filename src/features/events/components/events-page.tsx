import type { EventJson } from '@shared/schemas/events';
import { LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CalendarIcon, PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCan } from '../../../lib/authorization';
import { useEvents } from '../api/get-events';
import { EventListItem } from './event-list-item';

// The current event on top, then the latest first: the one a pit needs is never below the fold.
function currentThenLatest(a: EventJson, b: EventJson): number {
  if (a.current !== b.current) return a.current ? -1 : 1;
  return b.startDate.localeCompare(a.startDate);
}

export function EventsPage() {
  const events = useEvents();
  const canManage = useCan('events:manage');

  return (
    <>
      <PageHeader
        title="Events"
        description="The competitions this team goes to. The current one is what the board shows."
        actions={
          canManage && (
            <LinkButton to="/events/new" icon={<PlusIcon />}>
              New event
            </LinkButton>
          )
        }
      />
      {events.isPending && <Loading label="Loading the events" />}
      {events.isError && (
        <ErrorNotice
          title="Could not load the events"
          error={events.error}
          onRetry={() => events.refetch()}
          retrying={events.isFetching}
        />
      )}
      {events.isSuccess && events.data.length === 0 && (
        <div className="flex flex-col items-center gap-3 rounded-2xl border-2 border-dashed border-line p-10 text-center">
          <CalendarIcon className="size-10 text-ink-muted" />
          <p className="text-lg font-semibold">No events yet</p>
          <p className="text-ink-muted">
            {canManage ? 'Create the first one to put it on the board.' : 'A mentor adds the events the team goes to.'}
          </p>
        </div>
      )}
      {events.isSuccess && events.data.length > 0 && (
        <ul className="grid gap-4 xl:grid-cols-2">
          {[...events.data].sort(currentThenLatest).map((event) => (
            <EventListItem key={event.id} event={event} canManage={canManage} />
          ))}
        </ul>
      )}
    </>
  );
}
