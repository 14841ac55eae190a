import { LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { ChecksIcon } from '../../../components/ui/icons';
import { Spinner } from '../../../components/ui/loading';
import { ReadinessLight } from '../../../components/ui/readiness-light';
import { useReadiness } from '../api/get-readiness';
import { useRuns } from '../api/get-runs';
import { RunProgress } from './run-progress';

/** The readiness light of one of our matches, fetched (the light itself is presentational). */
export function MatchReadiness({ eventId, matchId }: { eventId: string; matchId: string }) {
  const readiness = useReadiness(eventId, matchId);
  // Small: it sits inside a card, among the countdowns.
  if (readiness.isPending) {
    return (
      <p role="status" className="flex min-h-12 items-center gap-2 text-ink-muted">
        <Spinner /> Checking readiness…
      </p>
    );
  }
  if (readiness.isError) {
    return <ErrorNotice title="Could not tell whether the robot is ready" error={readiness.error} onRetry={() => readiness.refetch()} retrying={readiness.isFetching} />;
  }
  return <ReadinessLight readiness={readiness.data} />;
}

/**
 * For the board's next-match card: the readiness light, the progress of the match's pre-match
 * checks, and the way into them. The board route passes it in (the board must not import checks).
 */
export function NextMatchReadiness({ eventId, matchId }: { eventId: string; matchId: string }) {
  const runs = useRuns(eventId);
  const preMatch = (runs.data ?? []).filter((run) => run.phase === 'pre_match' && run.match?.id === matchId);
  return (
    <div className="flex flex-col gap-3">
      <MatchReadiness eventId={eventId} matchId={matchId} />
      <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
        {preMatch.length > 0 && (
          <ul className="flex min-w-0 flex-1 basis-64 flex-col gap-3" aria-label="Pre-match checks">
            {preMatch.map((run) => (
              <li key={run.id} className="flex flex-col gap-1">
                <p className="font-semibold text-ink-muted">{run.name}</p>
                <RunProgress run={run} compact />
              </li>
            ))}
          </ul>
        )}
        <LinkButton to="/checks" variant="secondary" size="lg" icon={<ChecksIcon />}>
          Open the checks
        </LinkButton>
      </div>
    </div>
  );
}
