import { useMemo, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { ErrorNotice } from '../../components/ui/error-notice';
import { Loading } from '../../components/ui/loading';
import { batteriesQueryOptions } from '../../features/batteries/api/get-batteries';
import { useEvents } from '../../features/events/api/get-events';
import type { FollowUpOwner } from '../../features/safety/components/follow-ups';
import { IncidentPage } from '../../features/safety/components/incident-page';
import { SafetyPrintPage } from '../../features/safety/components/print-page';
import { ReportIncidentPage } from '../../features/safety/components/report-incident-page';
import type { IncidentBattery } from '../../features/safety/components/report-choices';
import { timeZoneIn, type SafetyEvent } from '../../features/safety/components/safety-event';
import { SafetyPage } from '../../features/safety/components/safety-page';
import { membersQueryOptions } from '../../features/team/api/get-members';
import { useCan } from '../../lib/authorization';
import { deviceTimeZone } from '../../lib/dates';

/**
 * The team's events (events feature) as the safety area names them, or what to show while they
 * load. Once loaded they stay: a refetch that fails on the arena Wi-Fi must not take away the
 * report being typed.
 */
function WithEvents({ label, children }: { label: string; children: (events: SafetyEvent[]) => ReactNode }) {
  const events = useEvents();
  if (events.data) return children(events.data);
  if (events.isError) return <ErrorNotice title="Could not load the events" error={events.error} onRetry={() => events.refetch()} retrying={events.isFetching} />;
  return <Loading label={label} />;
}

/** The safety log and cautions, filtered by the team's events. */
export function SafetyRoute() {
  return <WithEvents label="Opening Safety">{(events) => <SafetyPage events={events} />}</WithEvents>;
}

/** The print view of the log. */
export function SafetyPrintRoute() {
  return <WithEvents label="Opening the print view">{(events) => <SafetyPrintPage events={events} />}</WithEvents>;
}

/** The fleet (batteries feature) as a report names a battery: those in service. */
function useBatteriesInService(enabled = true): IncidentBattery[] | undefined {
  const batteries = useQuery({ ...batteriesQueryOptions(), enabled }).data;
  return useMemo(() => batteries?.filter((battery) => battery.status !== 'retired').map((battery) => ({ id: battery.id, label: battery.label })), [batteries]);
}

/** The report form, for the current event (events feature), naming a battery from the fleet. */
export function ReportIncidentRoute() {
  const inService = useBatteriesInService();
  return (
    <WithEvents label="Opening the form">
      {(events) => {
        const current = events.find((event) => event.current);
        return <ReportIncidentPage eventId={current?.id ?? null} timeZone={current?.timeZone ?? deviceTimeZone()} batteries={inService} />;
      }}
    </WithEvents>
  );
}

/** One report, on its event's clock, with the active members (team feature) who may own a follow-up, and the fleet. */
export function IncidentRoute() {
  const { incidentId = '' } = useParams();
  const events = useEvents();
  // Only those who add follow-ups and correct reports need the members and the batteries.
  const canManage = useCan('incidents:manage');
  const members = useQuery({ ...membersQueryOptions(), enabled: canManage }).data;
  const batteries = useBatteriesInService(canManage);
  const owners = useMemo<FollowUpOwner[] | undefined>(
    () => members?.filter((member) => member.active).map((member) => ({ id: member.id, name: member.name })).sort((a, b) => a.name.localeCompare(b.name)),
    [members],
  );
  return <IncidentPage key={incidentId} incidentId={incidentId} timeZoneOf={timeZoneIn(events.data)} owners={owners} batteries={batteries} />;
}
