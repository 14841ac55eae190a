import { useEffect, useMemo, useRef, useState } from 'react';
import { localDate, zoneAbbreviation } from '@shared/domain/event-clock';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { ClockIcon, ScheduleIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCan } from '../../../lib/authorization';
import { readableZone } from '../../../lib/dates';
import { describeDelay, formatCycle } from '../../../lib/match-labels';
import { useMatches } from '../api/get-matches';
import { useTimeline } from '../api/get-timeline';
import { useMarkFieldProgress } from '../api/mark-field-progress';
import { useUndoFieldProgress } from '../api/undo-field-progress';
import { FieldControls } from './field-controls';
import { EditMatchButton, EditMatchForm } from './match-editor';
import { nextOnField } from './next-on-field';
import { ScheduleRow } from './schedule-row';
import { ScheduleTools } from './schedule-tools';

/** What the schedule needs of the current event (the route passes it in). */
export interface ScheduleEvent {
  id: string;
  timeZone: string;
  teamNumber: number;
  /** The first day (YYYY-MM-DD): where "Add a match" starts before any match exists. */
  startDate?: string;
}

export function SchedulePage({ event }: { event: ScheduleEvent }) {
  const timeline = useTimeline(event.id);
  const matches = useMatches(event.id);
  const canMarkField = useCan('field:progress');
  const canEdit = useCan('schedule:edit');
  // One match open for editing at a time: a second form would only invite losing the first.
  const [editingId, setEditingId] = useState<string | null>(null);
  const mark = useMarkFieldProgress(event.id);
  const undo = useUndoFieldProgress(event.id);

  const teamsById = useMemo(() => new Map((matches.data ?? []).map((match) => [match.id, match])), [matches.data]);
  const ourById = useMemo(
    () => new Map((timeline.data?.ourMatches ?? []).map((ours) => [ours.matchId, ours])),
    [timeline.data],
  );
  const next = timeline.data ? nextOnField(timeline.data.matches) : null;

  // Mid-event the interesting rows are far down the list: open at the next match, once per visit.
  const scrolled = useRef(false);
  const anyStarted = timeline.data?.matches.some((match) => match.startedAt !== null) ?? false;
  useEffect(() => {
    if (scrolled.current || !next || !anyStarted) return;
    scrolled.current = true;
    document.getElementById(`match-${next.id}`)?.scrollIntoView({ block: 'start' });
  }, [next, anyStarted]);

  if (timeline.isPending) return <Loading label="Loading the schedule" />;
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

  const { cycleSeconds, delaySeconds } = timeline.data;
  const rows = timeline.data.matches;
  const headerZone = zoneAbbreviation(rows[0]?.scheduledStart ?? new Date(), event.timeZone);
  // New matches are mostly added at the end of the schedule (a late playoff): start on that day.
  const lastStart = rows.at(-1)?.scheduledStart;
  const defaultDate = lastStart ? localDate(lastStart, event.timeZone) : (event.startDate ?? localDate(new Date(), event.timeZone));
  const tools = (startOpen: boolean) =>
    canEdit && <ScheduleTools eventId={event.id} timeZone={event.timeZone} zoneLabel={headerZone} defaultDate={defaultDate} startOpen={startOpen} />;

  if (rows.length === 0) {
    return (
      <>
        <PageHeader title="Schedule" />
        <section className="flex flex-col items-center gap-3 rounded-3xl border-2 border-dashed border-line-strong bg-surface px-6 py-12 text-center">
          <ScheduleIcon className="size-12 text-accent-ink" />
          <h2 className="text-2xl font-bold">No matches yet — a lead imports the schedule</h2>
          <p className="max-w-prose text-lg text-ink-muted">Once it is in, every match shows here with its projected start.</p>
        </section>
        <div className="mt-5">{tools(true)}</div>
      </>
    );
  }

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="Schedule"
        description={
          <span className="flex flex-wrap items-center gap-x-4 gap-y-1 text-lg">
            <span className="flex items-center gap-1.5 font-semibold text-ink">
              <ClockIcon className="size-5" />
              Field {describeDelay(delaySeconds)}
            </span>
            <span className="tabular-nums">Cycle {formatCycle(cycleSeconds)} per match</span>
            <span>
              Times in {headerZone} ({readableZone(event.timeZone)})
            </span>
          </span>
        }
      />
      {tools(false)}
      {/* With every match marked there is no next row to hold the controls; undo stays reachable. */}
      {canMarkField && !next && <FieldControls next={null} timeZone={event.timeZone} mark={mark} undo={undo} />}
      {matches.isError && (
        <ErrorNotice
          title="Could not load the teams of each match"
          error={matches.error}
          onRetry={() => matches.refetch()}
          retrying={matches.isFetching}
        />
      )}
      <ol className="flex flex-col gap-3" aria-label="Matches in schedule order">
        {rows.map((match) => (
          <ScheduleRow
            key={match.id}
            match={match}
            teams={teamsById.get(match.id)}
            ourMatch={ourById.get(match.id)}
            isNext={match.id === next?.id}
            timeZone={event.timeZone}
            headerZone={headerZone}
            teamNumber={event.teamNumber}
            action={
              canEdit && teamsById.has(match.id) && editingId !== match.id && (
                <EditMatchButton match={teamsById.get(match.id)!} onClick={() => setEditingId(match.id)} />
              )
            }
          >
            {canMarkField && match.id === next?.id && <FieldControls next={next} timeZone={event.timeZone} mark={mark} undo={undo} />}
            {editingId === match.id && teamsById.has(match.id) && (
              <EditMatchForm eventId={event.id} match={teamsById.get(match.id)!} timeZone={event.timeZone} zoneLabel={headerZone} onDone={() => setEditingId(null)} />
            )}
          </ScheduleRow>
        ))}
      </ol>
    </div>
  );
}
