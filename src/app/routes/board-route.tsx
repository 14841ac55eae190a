import type { EventJson } from '@shared/schemas/events';
import { ErrorNotice } from '../../components/ui/error-notice';
import { Loading } from '../../components/ui/loading';
import { NextMatchBattery } from '../../features/batteries/components/plan/next-match-battery';
import { BoardPage } from '../../features/board/components/board-page';
import { NextMatchPanel } from '../../features/board/components/next-match-panel';
import { NextMatchReadiness } from '../../features/checks/components/match-readiness';
import { useEvents } from '../../features/events/api/get-events';
import { NextMatchRepairs } from '../../features/repairs/components/next-match-repairs';
import { useMatches } from '../../features/schedule/api/get-matches';
import { useTimeline } from '../../features/schedule/api/get-timeline';

/** The schedule feature's data, the checks feature's readiness, the batteries feature's plan and the repairs feature's blocking tickets, fed into the board's next-match panel. */
function NextMatch({ event }: { event: EventJson }) {
  const timeline = useTimeline(event.id);
  const matches = useMatches(event.id);
  return (
    <NextMatchPanel
      timeline={timeline}
      matches={matches}
      teamNumber={event.teamNumber}
      timeZone={event.timeZone}
      readinessOf={(matchId) => <NextMatchReadiness key={matchId} eventId={event.id} matchId={matchId} />}
      batteryOf={(matchId) => <NextMatchBattery key={matchId} eventId={event.id} matchId={matchId} timeZone={event.timeZone} />}
      // Every open blocking ticket is needed by this match's queue call: the next one of ours.
      repairsOf={() => <NextMatchRepairs eventId={event.id} />}
    />
  );
}

/** Feeds the events, schedule, checks, batteries and repairs features' data into the board, which must not import another feature. */
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
  return (
    <BoardPage
      currentEvent={currentEvent}
      hasEvents={events.data.length > 0}
      nextMatch={currentEvent && <NextMatch key={currentEvent.id} event={currentEvent} />}
    />
  );
}
