import type { ReactNode } from 'react';
import type { OurMatchJson } from '@shared/domain/timeline';
import { AllianceTag } from '../../../components/ui/alliance';
import { AlertIcon } from '../../../components/ui/icons';
import { formatZonedTime } from '../../../lib/dates';
import { formatMinutes, matchName, matchShortName } from '../../../lib/match-labels';

function Cell({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-col">
      <span className="text-sm font-semibold text-ink-muted">{label}</span>
      <span className="text-lg font-semibold tabular-nums">{children}</span>
    </div>
  );
}

/** Our matches after the next one: enough to plan batteries and repairs, small enough to scan. */
export function OurMatchesList({ matches, timeZone }: { matches: OurMatchJson[]; timeZone: string }) {
  const time = (at: string) => formatZonedTime(new Date(at), timeZone, false);
  return (
    <section aria-labelledby="later-matches-title" className="rounded-3xl border border-line bg-surface p-5 shadow-sm sm:p-6">
      <h2 id="later-matches-title" className="mb-3 text-2xl font-bold">
        After that
      </h2>
      <ol className="divide-y divide-line">
        {matches.map((match) => (
          <li key={match.matchId} className="grid grid-cols-[4.5rem_auto_1fr] items-center gap-x-4 gap-y-2 py-3 sm:grid-cols-[5rem_5rem_1fr_1fr_1.4fr]">
            <p className="text-2xl font-extrabold tabular-nums">
              <span aria-hidden="true">{matchShortName(match.level, match.number)}</span>
              <span className="sr-only">{matchName(match.level, match.number)}</span>
            </p>
            <AllianceTag alliance={match.alliance} />
            <div className="col-span-3 grid grid-cols-3 gap-x-4 sm:contents">
              <Cell label="Start">{time(match.projectedStart)}</Cell>
              <Cell label="Queue">{time(match.queueAt)}</Cell>
              <Cell label="Turnaround">
                {match.turnaroundMinutes === null ? '—' : formatMinutes(match.turnaroundMinutes)}
                {match.tight && (
                  <span className="ml-2 inline-flex items-center gap-1 text-danger">
                    <AlertIcon className="size-4" />
                    Tight
                  </span>
                )}
              </Cell>
            </div>
          </li>
        ))}
      </ol>
    </section>
  );
}
