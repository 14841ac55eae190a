import type { ReactNode } from 'react';
import type { UseQueryResult } from '@tanstack/react-query';
import type { TimelineJson } from '@shared/domain/timeline';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CheckIcon, ScheduleIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { NextMatchCard, type MatchTeams } from './next-match-card';
import { OurMatchesList } from './our-matches-list';

interface NextMatchPanelProps {
  timeline: UseQueryResult<TimelineJson>;
  matches: UseQueryResult<readonly MatchTeams[]>;
  teamNumber: number;
  timeZone: string;
  /** Readiness of the next match, given its id (the route builds it from the checks feature). */
  readinessOf?: (matchId: string) => ReactNode;
  /** The battery planned for the next match, given its id (the route builds it from the batteries feature). */
  batteryOf?: (matchId: string) => ReactNode;
  /** Open repairs that block the next match, given its id (the route builds it from the repairs feature). */
  repairsOf?: (matchId: string) => ReactNode;
}

function Empty({ icon, title, children }: { icon: ReactNode; title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col items-center gap-3 rounded-3xl border-2 border-dashed border-line-strong bg-surface px-6 py-10 text-center">
      {icon}
      <h2 className="text-2xl font-bold sm:text-3xl">{title}</h2>
      <p className="max-w-prose text-lg text-ink-muted">{children}</p>
    </section>
  );
}

/** The top of the board: our next match, loudly, then the rest of ours. */
export function NextMatchPanel({ timeline, matches, teamNumber, timeZone, readinessOf, batteryOf, repairsOf }: NextMatchPanelProps) {
  if (timeline.isPending) return <Loading label="Loading our next match" />;
  if (timeline.isError) {
    return (
      <ErrorNotice
        title="Could not load the schedule"
        error={timeline.error}
        onRetry={() => timeline.refetch()}
        retrying={timeline.isFetching}
      />
    );
  }
  const { matches: schedule, ourMatches } = timeline.data;
  if (schedule.length === 0) {
    return (
      <Empty icon={<ScheduleIcon className="size-12 text-accent-ink" />} title="No matches yet — a lead imports the schedule">
        The next match, its alliance and the queue call appear here as soon as the schedule is in.
      </Empty>
    );
  }
  if (ourMatches.length === 0) {
    const inSchedule = schedule.some((match) => match.ours);
    return inSchedule ? (
      <Empty icon={<CheckIcon className="size-12 text-ok" />} title="All our matches are played">
        Nothing left to queue for in this schedule. Playoff matches show here once they are added.
      </Empty>
    ) : (
      <Empty icon={<ScheduleIcon className="size-12 text-accent-ink" />} title={`Team ${teamNumber} is not in this schedule`}>
        If that is wrong, check the team number in the event's settings.
      </Empty>
    );
  }

  const [next, ...later] = ourMatches;
  const teams = matches.data?.find((match) => match.id === next.matchId);
  return (
    <div className="flex flex-col gap-4">
      <NextMatchCard
        match={next}
        teams={teams}
        teamNumber={teamNumber}
        timeZone={timeZone}
        readiness={readinessOf?.(next.matchId)}
        battery={batteryOf?.(next.matchId)}
        repairs={repairsOf?.(next.matchId)}
      />
      {matches.isError && (
        <ErrorNotice
          title="Could not load partners and opponents"
          error={matches.error}
          onRetry={() => matches.refetch()}
          retrying={matches.isFetching}
        />
      )}
      {later.length > 0 && <OurMatchesList matches={later} timeZone={timeZone} />}
    </div>
  );
}
