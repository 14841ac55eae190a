import { useMemo, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { can } from '@shared/roles';
import type { TimelineJson } from '@shared/domain/timeline';
import type { EventJson } from '@shared/schemas/events';
import type { MemberJson } from '@shared/schemas/team';
import { LinkButton } from '../../components/ui/button';
import { ErrorNotice } from '../../components/ui/error-notice';
import { Loading } from '../../components/ui/loading';
import { useCurrentEvent, useEvents } from '../../features/events/api/get-events';
import type { RepairAssignee, RepairMatch } from '../../features/repairs/components/repair-context';
import { RepairPage } from '../../features/repairs/components/repair-page';
import { RepairsPage } from '../../features/repairs/components/repairs-page';
import { ReportRepairPage } from '../../features/repairs/components/report-repair-page';
import { SubsystemsPage } from '../../features/repairs/components/subsystems-page';
import { timelineQueryOptions } from '../../features/schedule/api/get-timeline';
import { useMembers } from '../../features/team/api/get-members';
import { matchName, matchShortName } from '../../lib/match-labels';

/** The event's matches from the schedule's timeline, as the repairs feature (which must not import the schedule) names them. */
function repairMatchesOf(timeline: TimelineJson | undefined): { matches: RepairMatch[]; defaultMatchId: string | null } {
  if (!timeline) return { matches: [], defaultMatchId: null };
  const matches = timeline.matches.map((match) => ({
    id: match.id,
    name: matchName(match.level, match.number),
    short: matchShortName(match.level, match.number),
    ours: match.ours,
    started: match.startedAt !== null,
  }));
  // Something found now most likely broke in the match just played; before our first, expect the next.
  const lastPlayed = matches.filter((match) => match.ours && match.started).at(-1);
  return { matches, defaultMatchId: lastPlayed?.id ?? timeline.ourMatches[0]?.matchId ?? null };
}

function useRepairMatches(eventId: string | undefined) {
  const timeline = useQuery({ ...timelineQueryOptions(eventId ?? ''), enabled: eventId !== undefined });
  const data = timeline.data;
  return { ...useMemo(() => repairMatchesOf(data), [data]), settled: eventId === undefined || !timeline.isPending };
}

/** Members as people a ticket names, from the team feature: everyone (for history lines) and those who work on repairs. */
function useRepairPeople(): { people: RepairAssignee[] | undefined; assignees: RepairAssignee[] | undefined } {
  const members = useMembers().data;
  return useMemo(() => {
    if (!members) return { people: undefined, assignees: undefined };
    const asPerson = (member: MemberJson) => ({ id: member.userId, name: member.name });
    const works = (member: MemberJson) => member.active && can(member.roles, 'repairs:work');
    return { people: members.map(asPerson), assignees: members.filter(works).map(asPerson).sort((a, b) => a.name.localeCompare(b.name)) };
  }, [members]);
}

function NoEvent() {
  return (
    <div className="flex flex-col items-start gap-4">
      <h1 className="text-3xl font-bold">Repairs</h1>
      <p className="text-lg text-ink-muted">There is no current event. Repair tickets belong to an event: once a mentor picks one, its board shows here.</p>
      <LinkButton to="/">Back to the board</LinkButton>
    </div>
  );
}

/** The current event (events feature), or what to show instead. */
function WithCurrentEvent({ label, children }: { label: string; children: (event: EventJson) => ReactNode }) {
  const currentEvent = useCurrentEvent();
  if (currentEvent.isPending) return <Loading label={label} />;
  if (currentEvent.isError) {
    return <ErrorNotice title="Could not load the current event" error={currentEvent.error} onRetry={() => currentEvent.refetch()} retrying={currentEvent.isFetching} />;
  }
  if (!currentEvent.data) return <NoEvent />;
  return children(currentEvent.data);
}

function EventRepairs({ event }: { event: EventJson }) {
  const { matches } = useRepairMatches(event.id);
  return <RepairsPage eventId={event.id} timeZone={event.timeZone} matches={matches} />;
}

/** The repair board of the current event, its matches from the schedule feature. */
export function RepairsRoute() {
  // Keyed by event: switching events starts the board afresh.
  return <WithCurrentEvent label="Loading the repair board">{(event) => <EventRepairs key={event.id} event={event} />}</WithCurrentEvent>;
}

function ReportForEvent({ event }: { event: EventJson }) {
  const { matches, defaultMatchId, settled } = useRepairMatches(event.id);
  const { assignees } = useRepairPeople();
  // The default match is set when the form opens: wait for the schedule (a failed load just leaves it empty).
  if (!settled) return <Loading label="Opening the form" />;
  return <ReportRepairPage eventId={event.id} matches={matches} defaultMatchId={defaultMatchId} assignees={assignees} />;
}

/** "Report a problem" for the current event, with our matches (schedule) and the members who may fix it (team). */
export function NewRepairRoute() {
  return <WithCurrentEvent label="Opening the form">{(event) => <ReportForEvent key={event.id} event={event} />}</WithCurrentEvent>;
}

/** One ticket: its event's zone (events feature), the current event's matches (schedule), people (team). */
export function RepairRoute() {
  const { repairId = '' } = useParams();
  const events = useEvents();
  const current = events.data?.find((event) => event.current);
  const { matches } = useRepairMatches(current?.id);
  const { people, assignees } = useRepairPeople();
  const timeZoneOf = (eventId: string) => events.data?.find((event) => event.id === eventId)?.timeZone;
  return <RepairPage key={repairId} repairId={repairId} timeZoneOf={timeZoneOf} matches={matches} people={people} assignees={assignees} />;
}

/** The team's subsystem list (leads and mentors). */
export function SubsystemsRoute() {
  return <SubsystemsPage />;
}
