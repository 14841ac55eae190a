import { useParams } from 'react-router';
import type { TimelineJson } from '@shared/domain/timeline';
import type { EventJson } from '@shared/schemas/events';
import { LinkButton } from '../../components/ui/button';
import { ErrorNotice } from '../../components/ui/error-notice';
import { Loading } from '../../components/ui/loading';
import type { CheckMatch } from '../../features/checks/components/check-match';
import { ChecksPage } from '../../features/checks/components/checks-page';
import { RunPage } from '../../features/checks/components/run-page';
import { useCurrentEvent } from '../../features/events/api/get-events';
import { useTimeline } from '../../features/schedule/api/get-timeline';

/** Our matches from the schedule's timeline, as the checks feature (which must not import the schedule) takes them. */
function ourMatchesOf(timeline: TimelineJson): { next: CheckMatch | null; ours: CheckMatch[] } {
  const queueAt = new Map(timeline.ourMatches.map((match) => [match.matchId, match.queueAt]));
  const ours = timeline.matches
    .filter((match) => match.ours)
    .map((match) => ({
      id: match.id,
      level: match.level,
      number: match.number,
      alliance: match.alliance,
      started: match.startedAt !== null,
      queueAt: queueAt.get(match.id) ?? null,
    }));
  const nextId = timeline.ourMatches[0]?.matchId;
  return { next: ours.find((match) => match.id === nextId) ?? null, ours };
}

function EventChecks({ event }: { event: EventJson }) {
  const timeline = useTimeline(event.id);
  if (timeline.isPending) return <Loading label="Loading the checks" />;
  const { next, ours } = timeline.isSuccess ? ourMatchesOf(timeline.data) : { next: null, ours: [] };
  const notice = timeline.isError ? (
    <ErrorNotice title="Could not load the schedule: the next match is unknown" error={timeline.error} onRetry={() => timeline.refetch()} retrying={timeline.isFetching} />
  ) : (
    !next && <p className="text-lg text-ink-muted">{ours.length > 0 ? 'All our matches are played.' : 'No match of ours is in the schedule yet.'}</p>
  );
  return <ChecksPage eventId={event.id} timeZone={event.timeZone} nextMatch={next} ourMatches={ours} scheduleNotice={notice} />;
}

/** The Checks area: feeds the current event (events feature) and our matches (schedule feature) into the checks. */
export function ChecksRoute() {
  const currentEvent = useCurrentEvent();
  if (currentEvent.isPending) return <Loading label="Loading the checks" />;
  if (currentEvent.isError) {
    return <ErrorNotice title="Could not load the current event" error={currentEvent.error} onRetry={() => currentEvent.refetch()} retrying={currentEvent.isFetching} />;
  }
  if (!currentEvent.data) {
    return (
      <div className="flex flex-col items-start gap-4">
        <h1 className="text-3xl font-bold">Checks</h1>
        <p className="text-lg text-ink-muted">There is no current event, so there are no checks to run. The checklists themselves can be written already.</p>
        <LinkButton to="/checks/templates">Checklists</LinkButton>
      </div>
    );
  }
  // Keyed by event: switching events starts the page afresh.
  return <EventChecks key={currentEvent.data.id} event={currentEvent.data} />;
}

/** One run, full page. */
export function RunRoute() {
  const { runId = '' } = useParams();
  return <RunPage key={runId} runId={runId} />;
}
