import { useState, type ReactNode } from 'react';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { ChecksIcon, PencilIcon, PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCan } from '../../../lib/authorization';
import { useServerNow } from '../../../lib/server-clock';
import { useRuns } from '../api/get-runs';
import type { CheckMatch } from './check-match';
import { NextMatchChecks } from './next-match-checks';
import { RunList } from './run-list';
import { StartRunForm } from './start-run-form';

interface ChecksPageProps {
  eventId: string;
  timeZone: string;
  /** Our next match to play; null when none is left (or the schedule could not be read). */
  nextMatch: CheckMatch | null;
  /** All of ours, in schedule order, for "Start a checklist". */
  ourMatches: CheckMatch[];
  /** What the route has to say about the schedule (it failed to load, there is none yet). */
  scheduleNotice?: ReactNode;
}

/** The Checks area: the next match's checks first, then "Start a checklist", then every other run by phase. */
export function ChecksPage({ eventId, timeZone, nextMatch, ourMatches, scheduleNotice }: ChecksPageProps) {
  const runs = useRuns(eventId);
  const canMark = useCan('checks:mark');
  const canEditTemplates = useCan('templates:edit');
  const [starting, setStarting] = useState(false);
  const now = useServerNow(30_000);

  const others = (runs.data ?? []).filter((run) => !nextMatch || run.match?.id !== nextMatch.id);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Checks"
        actions={
          <LinkButton to="/checks/templates" variant="secondary" icon={canEditTemplates ? <PencilIcon /> : <ChecksIcon />}>
            {canEditTemplates ? 'Edit checklists' : 'Checklists'}
          </LinkButton>
        }
      />
      {scheduleNotice}
      {runs.isPending && <Loading label="Loading the checks" />}
      {runs.isError && <ErrorNotice title="Could not load the checks" error={runs.error} onRetry={() => runs.refetch()} retrying={runs.isFetching} />}
      {runs.isSuccess && nextMatch && <NextMatchChecks eventId={eventId} timeZone={timeZone} match={nextMatch} runs={runs.data} />}

      {canMark &&
        (starting ? (
          <StartRunForm eventId={eventId} nextMatch={nextMatch} ourMatches={ourMatches} onCancel={() => setStarting(false)} />
        ) : (
          <div>
            <Button variant="secondary" size="lg" icon={<PlusIcon />} onClick={() => setStarting(true)}>
              Start a checklist
            </Button>
          </div>
        ))}

      {runs.isSuccess && (
        <section aria-labelledby="other-runs-title" className="flex flex-col gap-4">
          <h2 id="other-runs-title" className="text-2xl font-bold">
            {nextMatch ? 'Other checklists' : 'Checklists of this event'}
          </h2>
          {others.length > 0 ? <RunList runs={others} now={now} /> : <p className="text-lg text-ink-muted">None started yet.</p>}
        </section>
      )}
    </div>
  );
}
