import { LinkButton } from '../../components/ui/button';
import { ErrorNotice } from '../../components/ui/error-notice';
import { Loading } from '../../components/ui/loading';
import { useCurrentEvent } from '../../features/events/api/get-events';
import { SchedulePage } from '../../features/schedule/components/schedule-page';

/** Feeds the current event (events feature) into the schedule, which must not import another feature. */
export function ScheduleRoute() {
  const currentEvent = useCurrentEvent();
  if (currentEvent.isPending) return <Loading label="Loading the schedule" />;
  if (currentEvent.isError) {
    return (
      <ErrorNotice
        title="Could not load the current event"
        error={currentEvent.error}
        onRetry={() => currentEvent.refetch()}
        retrying={currentEvent.isFetching}
      />
    );
  }
  if (!currentEvent.data) {
    return (
      <div className="flex flex-col items-start gap-4">
        <h1 className="text-3xl font-bold">Schedule</h1>
        <p className="text-lg text-ink-muted">There is no current event, so there is no schedule to show.</p>
        <LinkButton to="/">Back to the board</LinkButton>
      </div>
    );
  }
  // Keyed by event: switching events starts the page afresh (scroll position, field messages).
  return <SchedulePage key={currentEvent.data.id} event={currentEvent.data} />;
}
