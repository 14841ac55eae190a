import { PHASE_LABELS } from '@shared/domain/checklist';
import type { RunJson, RunMatchJson } from '@shared/schemas/checks';
import { AllianceTag } from '../../../components/ui/alliance';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { Loading } from '../../../components/ui/loading';
import { useCan } from '../../../lib/authorization';
import { matchName } from '../../../lib/match-labels';
import { useServerNow } from '../../../lib/server-clock';
import { useRun } from '../api/get-run';
import { ItemRow } from './item-row';
import { RunProgress } from './run-progress';
import { SignOff } from './sign-off';

export function MatchLabel({ match }: { match: RunMatchJson }) {
  return (
    <span className="inline-flex items-center gap-2">
      {matchName(match.level, match.number)}
      {match.alliance && <AllianceTag alliance={match.alliance} />}
    </span>
  );
}

function RunBody({ run, title, showMatch }: { run: RunJson; title: 'h1' | 'h3'; showMatch: boolean }) {
  const canMark = useCan('checks:mark');
  // One clock for every "2 min ago" of the run, on the server's time like the marks.
  const now = useServerNow(15_000);
  const Title = title;
  return (
    <article aria-labelledby={`run-${run.id}`} className="flex flex-col gap-4">
      <header className="flex flex-col gap-2">
        <Title id={`run-${run.id}`} className={`${title === 'h1' ? 'text-3xl' : 'text-2xl'} font-bold tracking-tight break-words`}>
          {run.name}
        </Title>
        <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-ink-muted">
          <span>{PHASE_LABELS[run.phase]}</span>
          {showMatch && run.match && (
            <span className="font-semibold text-ink">
              <MatchLabel match={run.match} />
            </span>
          )}
          <span>
            Version {run.templateVersion} · started by {run.createdBy.name}
          </span>
        </p>
        <RunProgress run={run} />
        {!canMark && <p className="text-ink-muted">Read only: pit crew and leads mark the items.</p>}
      </header>
      <ol className="flex flex-col gap-3" aria-label={`Items of ${run.name}`}>
        {run.items.map((item) => (
          <ItemRow key={item.id} runId={run.id} item={item} now={now} canMark={canMark} />
        ))}
      </ol>
      <SignOff run={run} now={now} />
    </article>
  );
}

/**
 * A run in full: progress, every item to mark, the lead's sign-off. `showMatch` off where the
 * match is the heading already (the next-match section).
 */
export function RunPanel({ runId, title = 'h3', showMatch = true }: { runId: string; title?: 'h1' | 'h3'; showMatch?: boolean }) {
  const run = useRun(runId);
  if (run.isPending) return <Loading label="Loading the checklist" />;
  if (run.isError) {
    return <ErrorNotice title="Could not load the checklist" error={run.error} onRetry={() => run.refetch()} retrying={run.isFetching} />;
  }
  return <RunBody run={run.data} title={title} showMatch={showMatch} />;
}
