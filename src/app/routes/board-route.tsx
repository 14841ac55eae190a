import { ErrorNotice } from '../../components/ui/error-notice';
import { Loading } from '../../components/ui/loading';
import { BoardPage } from '../../features/board/components/board-page';
import { useEvents } from '../../features/events/api/get-events';

/** Feeds the events feature's data into the board, which must not import another feature. */
export function BoardRoute() {
  const events = useEvents();
  if (events.isPending) return <Loading label="Loading the board" />;
  if (events.isError) {
    return (
      <ErrorNotice
        title="Could not load the current event"
        error={events.error}
        onRetry={() => events.refetch()}
        retrying={events.isFetching}
      />
    );
  }
  const currentEvent = events.data.find((event) => event.current) ?? null;
  return <BoardPage currentEvent={currentEvent} hasEvents={events.data.length > 0} />;
}
