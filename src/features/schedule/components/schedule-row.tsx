import type { ReactNode } from 'react';
import type { OurMatchJson, TimelineMatchJson } from '@shared/domain/timeline';
import type { MatchJson } from '@shared/schemas/schedule';
import { AlertIcon, CheckIcon, FieldIcon, StarIcon } from '../../../components/ui/icons';
import { StatusTag } from '../../../components/ui/status-tag';
import { formatMinutes, matchName } from '../../../lib/match-labels';
import { AllianceTeams } from './alliance-teams';
import { ZonedTime } from './zoned-time';

interface ScheduleRowProps {
  match: TimelineMatchJson;
  /** The same match from the matches list, for its alliances; missing while that list loads. */
  teams: MatchJson | undefined;
  ourMatch: OurMatchJson | undefined;
  isNext: boolean;
  timeZone: string;
  headerZone: string;
  teamNumber: number;
  /** Beside the match's name: "Edit" for those who may change the schedule. */
  action?: ReactNode;
  /** The field controls, on the next match's row for those who may mark it; the open edit form. */
  children?: ReactNode;
}

function Time({ label, children, strong = false }: { label: string; children: ReactNode; strong?: boolean }) {
  return (
    <div className="flex flex-col">
      <span className="text-sm font-semibold text-ink-muted">{label}</span>
      <span className={strong ? 'text-xl font-bold' : 'text-lg'}>{children}</span>
    </div>
  );
}

export function ScheduleRow({ match, teams, ourMatch, isNext, timeZone, headerZone, teamNumber, action, children }: ScheduleRowProps) {
  const started = match.startedAt !== null;
  const frame = match.ours ? 'border-accent bg-accent-soft' : isNext ? 'border-line-strong bg-surface' : 'border-transparent bg-surface';
  return (
    <li
      id={`match-${match.id}`}
      className={`flex scroll-mt-28 flex-col gap-3 rounded-2xl border-l-8 p-4 shadow-sm ${frame} ${started ? 'opacity-75' : ''}`}
    >
      <div className="flex flex-wrap items-start justify-between gap-x-6 gap-y-2">
        <div className="flex min-w-0 flex-col gap-1.5">
          <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <h3 className="text-xl font-bold">{matchName(match.level, match.number)}</h3>
            {action}
          </div>
          <div className="flex flex-wrap gap-2">
            {match.ours && (
              <span className="inline-flex items-center gap-1.5 rounded-full bg-accent px-3 py-1 text-sm font-bold text-on-accent">
                <StarIcon className="size-4" /> Ours
              </span>
            )}
            {started && <StatusTag tone="neutral" icon={<CheckIcon className="size-4" />}>Started</StatusTag>}
            {isNext && <StatusTag tone="warning" icon={<FieldIcon className="size-4" />}>Next on the field</StatusTag>}
            {ourMatch?.tight && ourMatch.turnaroundMinutes !== null && (
              <StatusTag tone="danger" icon={<AlertIcon className="size-4" />}>
                Tight: {formatMinutes(ourMatch.turnaroundMinutes)} to turn around
              </StatusTag>
            )}
            {ourMatch && !ourMatch.tight && ourMatch.turnaroundMinutes !== null && (
              <StatusTag tone="neutral">{formatMinutes(ourMatch.turnaroundMinutes)} to turn around</StatusTag>
            )}
          </div>
        </div>
        <div className="flex gap-6">
          <Time label="Scheduled">
            <ZonedTime instant={match.scheduledStart} timeZone={timeZone} headerZone={headerZone} />
          </Time>
          {match.startedAt ? (
            <Time label="Started" strong>
              <ZonedTime instant={match.startedAt} timeZone={timeZone} headerZone={headerZone} />
            </Time>
          ) : (
            <Time label="Projected" strong>
              <ZonedTime instant={match.projectedStart} timeZone={timeZone} headerZone={headerZone} />
            </Time>
          )}
          {ourMatch && !started && (
            <Time label="Queue">
              <ZonedTime instant={ourMatch.queueAt} timeZone={timeZone} headerZone={headerZone} />
            </Time>
          )}
        </div>
      </div>
      {teams && (
        <div className="flex flex-wrap gap-2">
          <AllianceTeams alliance="red" teams={teams.red} ourNumber={teamNumber} />
          <AllianceTeams alliance="blue" teams={teams.blue} ourNumber={teamNumber} />
        </div>
      )}
      {children}
    </li>
  );
}
