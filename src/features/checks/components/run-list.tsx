import { Link } from 'react-router';
import { CHECKLIST_PHASES, PHASE_LABELS } from '@shared/domain/checklist';
import type { RunSummaryJson } from '@shared/schemas/checks';
import { AlertIcon, CheckIcon } from '../../../components/ui/icons';
import { RelativeTime } from '../../../components/ui/relative-time';
import { StatusTag } from '../../../components/ui/status-tag';
import { MatchLabel } from './run-panel';
import { RunProgress } from './run-progress';

function RunLink({ run, now }: { run: RunSummaryJson; now: Date }) {
  return (
    <li>
      <Link
        to={`/checks/runs/${run.id}`}
        className="flex flex-col gap-2 rounded-2xl border-2 border-line bg-surface p-4 shadow-sm hover:border-line-strong active:bg-sunken"
      >
        <span className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1">
          <span className="text-xl font-bold break-words text-accent-ink underline-offset-4">{run.name}</span>
          {run.signOff &&
            (run.complete ? (
              <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>Signed off</StatusTag>
            ) : (
              <StatusTag tone="warning" icon={<AlertIcon className="size-4" />}>Signed off with items open</StatusTag>
            ))}
        </span>
        <span className="flex flex-wrap gap-x-3 text-ink-muted">
          {run.match ? (
            <span className="font-semibold text-ink">
              <MatchLabel match={run.match} />
            </span>
          ) : (
            <span>No match</span>
          )}
          <span>
            started <RelativeTime at={run.createdAt} now={now} /> by {run.createdBy.name}
          </span>
        </span>
        <RunProgress run={run} compact />
      </Link>
    </li>
  );
}

/** Every other run, grouped by phase (in the shared phase order), newest first within each. */
export function RunList({ runs, now }: { runs: RunSummaryJson[]; now: Date }) {
  return (
    <div className="flex flex-col gap-6">
      {CHECKLIST_PHASES.map((phase) => {
        const ofPhase = runs.filter((run) => run.phase === phase);
        if (ofPhase.length === 0) return null;
        return (
          <section key={phase} aria-labelledby={`phase-${phase}`} className="flex flex-col gap-3">
            <h3 id={`phase-${phase}`} className="text-xl font-bold">
              {PHASE_LABELS[phase]} <span className="font-normal text-ink-muted tabular-nums">({ofPhase.length})</span>
            </h3>
            <ul className="grid gap-3 lg:grid-cols-2">
              {ofPhase.map((run) => (
                <RunLink key={run.id} run={run} now={now} />
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
