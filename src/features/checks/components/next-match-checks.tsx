import type { RunSummaryJson } from '@shared/schemas/checks';
import { AllianceTag } from '../../../components/ui/alliance';
import { LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { QueueIcon } from '../../../components/ui/icons';
import { useCan } from '../../../lib/authorization';
import { formatZonedTime } from '../../../lib/dates';
import { matchName } from '../../../lib/match-labels';
import { useTemplates } from '../api/get-templates';
import type { CheckMatch } from './check-match';
import { MatchReadiness } from './match-readiness';
import { RunPanel } from './run-panel';
import { StartPreMatch } from './start-pre-match';

/** Pre-match templates that have no run for the match yet: what "Start" offers. */
function useMissingPreMatch(runs: RunSummaryJson[]) {
  const templates = useTemplates();
  const started = new Set(runs.map((run) => run.templateId));
  return { templates, missing: (templates.data ?? []).filter((template) => template.phase === 'pre_match' && !started.has(template.id)) };
}

/**
 * The top of the Checks page: our next match, whether the robot is ready for it, and its runs in
 * full (pre-match first), with a start button for a pre-match check that has not begun.
 */
export function NextMatchChecks({ eventId, timeZone, match, runs }: { eventId: string; timeZone: string; match: CheckMatch; runs: RunSummaryJson[] }) {
  const canMark = useCan('checks:mark');
  const canEditTemplates = useCan('templates:edit');
  const ofMatch = runs
    .filter((run) => run.match?.id === match.id)
    .sort((a, b) => Number(b.phase === 'pre_match') - Number(a.phase === 'pre_match'));
  const { templates, missing } = useMissingPreMatch(ofMatch);
  const name = matchName(match.level, match.number);
  const noPreMatchTemplate = templates.isSuccess && !templates.data.some((template) => template.phase === 'pre_match');

  return (
    <section aria-labelledby="next-match-checks-title" className="flex flex-col gap-5 rounded-3xl border-2 border-accent bg-surface p-3 shadow-sm sm:p-6">
      <div className="flex flex-wrap items-end justify-between gap-x-6 gap-y-2">
        <div>
          <p className="text-sm font-bold tracking-wide text-accent-ink uppercase">Our next match</p>
          <h2 id="next-match-checks-title" className="flex flex-wrap items-center gap-3 text-3xl font-extrabold tracking-tight">
            {name}
            {match.alliance && <AllianceTag alliance={match.alliance} className="text-lg" />}
          </h2>
        </div>
        {match.queueAt && (
          <p className="flex items-center gap-2 text-lg font-semibold tabular-nums">
            <QueueIcon className="size-6" /> Queue at {formatZonedTime(new Date(match.queueAt), timeZone, false)}
          </p>
        )}
      </div>
      <MatchReadiness eventId={eventId} matchId={match.id} />
      {ofMatch.map((run) => (
        <div key={run.id} className="border-t-2 border-line pt-5">
          <RunPanel runId={run.id} showMatch={false} />
        </div>
      ))}
      {templates.isError && <ErrorNotice title="Could not load the checklists" error={templates.error} onRetry={() => templates.refetch()} retrying={templates.isFetching} />}
      {missing.length > 0 && (
        <div className="flex flex-col gap-3 border-t-2 border-line pt-5">
          <p className="text-lg">
            {ofMatch.length === 0 ? `No pre-match check has been started for ${name} yet.` : 'Not started yet for this match:'}
          </p>
          {canMark ? <StartPreMatch eventId={eventId} matchId={match.id} templates={missing} /> : <p className="text-ink-muted">Pit crew and leads can start it.</p>}
        </div>
      )}
      {noPreMatchTemplate && ofMatch.length === 0 && (
        <div className="flex flex-col items-start gap-3 border-t-2 border-line pt-5">
          <p className="text-lg">There is no pre-match checklist yet{canEditTemplates ? '' : ': a lead writes one under Checklists'}.</p>
          {canEditTemplates && <LinkButton to="/checks/templates/new">Write a pre-match checklist</LinkButton>}
        </div>
      )}
    </section>
  );
}
