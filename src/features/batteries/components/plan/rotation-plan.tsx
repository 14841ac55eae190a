import type { UseQueryResult } from '@tanstack/react-query';
import type { TimelineJson } from '@shared/domain/timeline';
import type { BatteryJson, BatteryPlanJson, ChargerJson } from '@shared/schemas/batteries';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { Loading } from '../../../../components/ui/loading';
import { useCan } from '../../../../lib/authorization';
import { matchName } from '../../../../lib/match-labels';
import { useBatteries } from '../../api/get-batteries';
import { useBatteryPlan } from '../../api/get-battery-plan';
import { useChargers } from '../../api/get-chargers';
import { ChargingSchedule } from './charging-schedule';
import { InRobot } from './in-robot';
import { useInstalled } from './installed';
import { PlanMatchRow } from './plan-match-row';
import { PlanWarningCard } from './plan-warnings';

interface PlanViewProps {
  plan: BatteryPlanJson;
  timeline: TimelineJson;
  batteries: BatteryJson[];
  chargers: ChargerJson[];
  timeZone: string;
}

function PlanView({ plan, timeline, batteries, chargers, timeZone }: PlanViewProps) {
  const canSwap = useCan('batteries:swap');
  const installed = useInstalled(batteries);
  const byId = new Map(batteries.map((battery) => [battery.id, battery]));
  const labelOf = (batteryId: string) => byId.get(batteryId)?.label ?? '?';
  const matchLabelOf = (matchId: string) => {
    const match = timeline.matches.find((candidate) => candidate.id === matchId);
    return match ? matchName(match.level, match.number) : 'a match no longer in the schedule';
  };
  const ours = timeline.ourMatches;

  return (
    <div className="flex flex-col gap-5">
      {plan.warnings.length > 0 && (
        <ul aria-label="Plan warnings" className="flex flex-col gap-3">
          {plan.warnings.map((warning) => (
            <li key={`${warning.matchId}-${warning.code}`}>
              <PlanWarningCard warning={warning} matchLabel={matchLabelOf(warning.matchId)} timeZone={timeZone} />
            </li>
          ))}
        </ul>
      )}
      <InRobot installed={installed} matchLabelOf={matchLabelOf} />
      {ours.length === 0 ? (
        <p className="text-lg text-ink-muted">No match of ours is left to plan for.</p>
      ) : (
        <ol aria-label="Battery for each of our matches" className="divide-y divide-line">
          {ours.map((match, index) => {
            const assignment = plan.assignments.find((entry) => entry.matchId === match.matchId);
            return (
              <PlanMatchRow
                key={match.matchId}
                match={match}
                assignment={assignment}
                battery={assignment && byId.get(assignment.batteryId)}
                warnings={plan.warnings.filter((warning) => warning.matchId === match.matchId)}
                installedLabel={installed.find((entry) => entry.use.matchId === match.matchId)?.battery.label}
                install={index === 0 && canSwap ? { batteries } : null}
                timeZone={timeZone}
              />
            );
          })}
        </ol>
      )}
      <ChargingSchedule charging={plan.charging} chargers={chargers} labelOf={labelOf} timeZone={timeZone} />
    </div>
  );
}

/**
 * The rotation plan (DESIGN §4.3) for our remaining matches: the battery for each and the charge
 * it should have at the queue call, the warnings first, what is in the robot, and when each
 * battery charges on which bay. The route passes the schedule's timeline in (names and queue
 * times of our matches), since this feature must not import the schedule.
 */
export function RotationPlan({ eventId, timeZone, timeline }: { eventId: string; timeZone: string; timeline: UseQueryResult<TimelineJson> }) {
  const plan = useBatteryPlan(eventId);
  const batteries = useBatteries();
  const chargers = useChargers();
  // The route owns the timeline's observer, which re-renders it only for the fields read so far:
  // read every one used below on each render, or a short-circuit leaves this on a stale answer.
  const { isPending: timelinePending, isError: timelineFailed, data: timelineData, error: timelineError, isFetching: timelineFetching } = timeline;

  let body;
  if (plan.isError) {
    body = <ErrorNotice title="Could not load the battery plan" error={plan.error} onRetry={() => plan.refetch()} retrying={plan.isFetching} />;
  } else if (timelineFailed) {
    body = <ErrorNotice title="Could not load our matches" error={timelineError} onRetry={() => timeline.refetch()} retrying={timelineFetching} />;
  } else if (batteries.isError) {
    body = <ErrorNotice title="Could not load the batteries" error={batteries.error} onRetry={() => batteries.refetch()} retrying={batteries.isFetching} />;
  } else if (plan.isPending || timelinePending || batteries.isPending || chargers.isPending) {
    body = <Loading label="Planning the batteries" />;
  } else if (!batteries.data.some((battery) => battery.status !== 'retired')) {
    body = <p className="text-lg text-ink-muted">No batteries in service: the plan starts once the fleet is logged.</p>;
  } else {
    body = <PlanView plan={plan.data} timeline={timelineData} batteries={batteries.data} chargers={chargers.data ?? []} timeZone={timeZone} />;
  }

  return (
    <section aria-labelledby="rotation-plan-title" className="flex flex-col gap-4">
      <div>
        <h2 id="rotation-plan-title" className="text-2xl font-bold">
          Rotation plan
        </h2>
        <p className="text-ink-muted">From the projected queue times; it follows the field as it runs late or early.</p>
      </div>
      {body}
    </section>
  );
}
