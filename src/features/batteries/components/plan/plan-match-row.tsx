import type { OurMatchJson } from '@shared/domain/timeline';
import type { PlanAssignment, PlanWarning } from '@shared/domain/battery-plan';
import type { BatteryJson } from '@shared/schemas/batteries';
import { BatteryIcon, CheckIcon } from '../../../../components/ui/icons';
import { StatusTag } from '../../../../components/ui/status-tag';
import { formatZonedTime } from '../../../../lib/dates';
import { matchName, matchShortName } from '../../../../lib/match-labels';
import { formatPercent } from '../battery-format';
import { InstallForMatch } from './install-for-match';
import { isFault, shortfallText, WARNING_WORDS, WarningIcon } from './plan-warnings';

interface PlanMatchRowProps {
  match: OurMatchJson;
  assignment: PlanAssignment | undefined;
  battery: BatteryJson | undefined;
  warnings: PlanWarning[];
  /** The battery in the robot for this match, if one is. */
  installedLabel: string | undefined;
  /** Our next match, for batteries:swap holders: offers "Install for this match". */
  install: { batteries: readonly BatteryJson[] } | null;
  timeZone: string;
}

/** One of our remaining matches: its battery and the charge it should have, by the queue call. */
export function PlanMatchRow({ match, assignment, battery, warnings, installedLabel, install, timeZone }: PlanMatchRowProps) {
  const name = matchName(match.level, match.number);
  return (
    <li data-match-id={match.matchId} className="flex flex-col gap-3 py-4">
      <div className="flex flex-wrap items-center justify-between gap-x-6 gap-y-2">
        <div className="flex min-w-0 flex-wrap items-baseline gap-x-4 gap-y-1">
          <p className="w-16 text-2xl font-extrabold tabular-nums">
            <span aria-hidden="true">{matchShortName(match.level, match.number)}</span>
            <span className="sr-only">{name}</span>
          </p>
          {assignment && battery ? (
            <p className="flex flex-wrap items-baseline gap-x-3">
              <span className="flex items-center gap-1.5 self-center text-2xl font-extrabold">
                <BatteryIcon className="size-6 text-accent-ink" />
                <span className="sr-only">Battery </span>
                {battery.label}
              </span>
              <span className="text-lg font-semibold whitespace-nowrap tabular-nums">{formatPercent(assignment.expectedChargePercent)} expected</span>
            </p>
          ) : (
            <p className="text-lg font-bold text-danger">No battery planned</p>
          )}
        </div>
        <p className="text-lg whitespace-nowrap tabular-nums">
          <span className="text-sm font-semibold text-ink-muted">Queue </span>
          {formatZonedTime(new Date(match.queueAt), timeZone, false)}
        </p>
      </div>
      {(installedLabel || warnings.length > 0) && (
        <div className="flex flex-wrap gap-2">
          {installedLabel && (
            <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>
              {installedLabel} in the robot
            </StatusTag>
          )}
          {warnings.map((warning) => (
            <StatusTag key={warning.code} tone={isFault(warning) ? 'danger' : 'warning'} icon={<WarningIcon warning={warning} className="size-4" />}>
              {WARNING_WORDS[warning.code]}
              {warning.shortfallMinutes > 0 && ` · ${shortfallText(warning.shortfallMinutes)}`}
            </StatusTag>
          ))}
        </div>
      )}
      {install && !installedLabel && <InstallForMatch matchId={match.matchId} matchLabel={name} plannedId={assignment?.batteryId} batteries={install.batteries} />}
    </li>
  );
}
