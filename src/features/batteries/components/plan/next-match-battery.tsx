import { LinkButton } from '../../../../components/ui/button';
import { BoltIcon } from '../battery-icons';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { BatteryIcon, CheckIcon } from '../../../../components/ui/icons';
import { Spinner } from '../../../../components/ui/loading';
import { StatusTag } from '../../../../components/ui/status-tag';
import { formatZonedTime } from '../../../../lib/dates';
import { useBatteries } from '../../api/get-batteries';
import { useBatteryPlan } from '../../api/get-battery-plan';
import { formatPercent } from '../battery-format';
import { useInstalled } from './installed';
import { isFault, WARNING_WORDS, WarningIcon, warningNumbers } from './plan-warnings';

/**
 * For the board's next-match card: the battery the plan gives the match and the charge it should
 * have, whether it is in the robot, and any warning. Says nothing for a team that does not track
 * batteries (none in service), as readiness does.
 */
export function NextMatchBattery({ eventId, matchId, timeZone }: { eventId: string; matchId: string; timeZone: string }) {
  const plan = useBatteryPlan(eventId);
  const batteries = useBatteries();
  const installed = useInstalled(batteries.data).find((entry) => entry.use.matchId === matchId);

  if (batteries.isSuccess && !batteries.data.some((battery) => battery.status !== 'retired')) return null;
  if (plan.isError || batteries.isError) {
    const failed = plan.isError ? plan : batteries;
    return <ErrorNotice title="Could not load the battery plan" error={failed.error} onRetry={() => failed.refetch()} retrying={failed.isFetching} />;
  }
  if (plan.isPending || batteries.isPending) {
    return (
      <p role="status" className="flex min-h-12 items-center gap-2 text-ink-muted">
        <Spinner /> Looking up the battery…
      </p>
    );
  }

  const assignment = plan.data.assignments.find((entry) => entry.matchId === matchId);
  // What is in the robot wins over the plan: the crew may have put in another one.
  const batteryId = installed?.battery.id ?? assignment?.batteryId;
  const battery = batteries.data.find((candidate) => candidate.id === batteryId);
  const expected = assignment && assignment.batteryId === batteryId ? assignment.expectedChargePercent : null;
  // On a charger now (the plan's later charges, after this match, are not news for this card).
  const fullAt = battery?.status === 'charging' ? battery.charging?.expectedEndAt : undefined;
  const warnings = plan.data.warnings.filter((warning) => warning.matchId === matchId);

  return (
    <section aria-label="Battery for this match" className="flex flex-col gap-3 rounded-2xl border-2 border-line p-4">
      <div className="flex flex-wrap items-center justify-between gap-x-6 gap-y-3">
        <div className="flex min-w-0 flex-col gap-1">
          {battery ? (
            <p className="flex items-start gap-3 text-2xl font-extrabold sm:text-3xl">
              <BatteryIcon className="mt-0.5 size-8 text-accent-ink" />
              <span>
                Battery {battery.label}
                {expected !== null && (
                  <span className="tabular-nums">
                    {' '}
                    — <span className="whitespace-nowrap">{formatPercent(expected)}</span> expected
                  </span>
                )}
              </span>
            </p>
          ) : (
            <p className="flex items-center gap-3 text-2xl font-extrabold text-danger">
              <BatteryIcon className="size-8" /> No battery planned
            </p>
          )}
          <div className="flex flex-wrap items-center gap-2">
            {installed ? (
              <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>
                In the robot
              </StatusTag>
            ) : (
              battery && <StatusTag tone="neutral">Not in the robot yet</StatusTag>
            )}
            {battery?.status === 'charging' && (
              <StatusTag tone="accent" icon={<BoltIcon className="size-4" />}>
                On the charger{fullAt && `, full at ${formatZonedTime(new Date(fullAt), timeZone, false)}`}
              </StatusTag>
            )}
          </div>
        </div>
        <LinkButton to="/batteries" variant="secondary" size="lg" icon={<BatteryIcon />} className="shrink-0">
          Open the batteries
        </LinkButton>
      </div>
      {warnings.map((warning) => (
        <div
          key={warning.code}
          data-code={warning.code}
          className={`flex items-start gap-2 rounded-xl border-2 p-3 ${isFault(warning) ? 'border-danger bg-danger text-on-danger' : 'border-warning bg-warning-soft'}`}
        >
          <WarningIcon warning={warning} className="mt-0.5 size-6" />
          <p className="text-lg">
            <span className="font-extrabold">
              {WARNING_WORDS[warning.code]}
              {warningNumbers(warning, timeZone) && ` · ${warningNumbers(warning, timeZone)}`}:
            </span>{' '}
            {warning.message}
          </p>
        </div>
      ))}
    </section>
  );
}
