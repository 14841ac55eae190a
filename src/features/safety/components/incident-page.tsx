import { useState } from 'react';
import type { IncidentJson } from '@shared/schemas/incidents';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PencilIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { isApiError } from '../../../lib/api-client';
import { useCan } from '../../../lib/authorization';
import { useIncident } from '../api/get-incident';
import { CloseReport } from './close-report';
import { EditReport } from './edit-report';
import { FollowUps, type FollowUpOwner } from './follow-ups';
import { IncidentDetails, IncidentHeading } from './incident-details';
import { IncidentPhotos } from './incident-photos';
import type { IncidentBattery } from './report-choices';
import { FirstThingsFirst } from './safety-cautions';
import { StaleIncidentNotice } from './stale-incident-notice';
import { useIncidentWrite } from './use-incident-write';

// A report outside any event, or of an event the route knows no zone for: the tablet's own clock.
const here = Intl.DateTimeFormat().resolvedOptions().timeZone;

interface IncidentPageProps {
  incidentId: string;
  /** The time zone of a report's event (from the events feature), if known. */
  timeZoneOf: (eventId: string | null) => string | undefined;
  /** Active members, who may own a follow-up; undefined while they load. */
  owners: FollowUpOwner[] | undefined;
  /** The team's batteries in service, to correct the one a report names. */
  batteries: IncidentBattery[] | undefined;
}

function BackLink({ toLog }: { toLog: boolean }) {
  return (
    <LinkButton to="/safety" variant="quiet" className="-ml-4 self-start">
      ← {toLog ? 'Safety log' : 'Safety'}
    </LinkButton>
  );
}

function Refusal({ title, text }: { title: string; text: string }) {
  return (
    <div className="flex flex-col items-start gap-4">
      <h1 className="text-3xl font-bold">{title}</h1>
      <p className="text-lg text-ink-muted">{text}</p>
      <LinkButton to="/safety">Safety</LinkButton>
    </div>
  );
}

/** What a safety captain or mentor works on: everything, corrections, follow-ups, closing. */
function FullReport({ incident, timeZone, owners, batteries }: { incident: IncidentJson; timeZone: string } & Pick<IncidentPageProps, 'owners' | 'batteries'>) {
  const writer = useIncidentWrite(incident);
  const canManage = useCan('incidents:manage');
  const [editing, setEditing] = useState<IncidentJson | null>(null);
  return (
    <article aria-labelledby="incident-title" className="flex max-w-4xl flex-col gap-8">
      <header className="flex flex-col gap-3">
        <BackLink toLog />
        <IncidentHeading incident={incident} />
      </header>
      {writer.conflict && (
        <StaleIncidentNotice conflict={writer.conflict} timeZone={timeZone} pending={writer.pending} onKeepMine={writer.keepMine} onTakeTheirs={writer.takeTheirs} />
      )}
      <section aria-labelledby="incident-details-title" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="incident-details-title" className="text-2xl font-bold">
            {editing ? 'Edit the report' : 'What was reported'}
          </h2>
          {canManage && !editing && (
            <Button variant="secondary" icon={<PencilIcon className="size-5" />} onClick={() => setEditing(incident)}>
              Edit the report
            </Button>
          )}
        </div>
        {editing ? (
          <EditReport incident={editing} latest={incident} writer={writer} timeZone={timeZone} batteries={batteries} onDone={() => setEditing(null)} />
        ) : (
          <IncidentDetails incident={incident} timeZone={timeZone} />
        )}
      </section>
      {/* While editing, the form's own preview says it. */}
      {!editing && <FirstThingsFirst />}
      {canManage && <FollowUps incident={incident} writer={writer} owners={owners} timeZone={timeZone} />}
      <IncidentPhotos incident={incident} />
      {canManage && <CloseReport incident={incident} writer={writer} timeZone={timeZone} />}
    </article>
  );
}

/** What the one who reported it sees: what they sent, and where it stands. */
function ReporterView({ incident, timeZone }: { incident: IncidentJson; timeZone: string }) {
  return (
    <article aria-labelledby="incident-title" className="flex max-w-4xl flex-col gap-8">
      <header className="flex flex-col gap-3">
        <BackLink toLog={false} />
        <p className="text-lg font-semibold text-accent-ink">Your report</p>
        <IncidentHeading incident={incident} />
        <p className="text-lg">
          {incident.status === 'closed'
            ? 'The safety captain has followed it up and closed it. Thank you for reporting.'
            : 'The safety captains and mentors have it and follow it up. Thank you for reporting. Keep this page to add photos or check where it stands.'}
        </p>
      </header>
      <IncidentDetails incident={incident} timeZone={timeZone} />
      <FirstThingsFirst />
      <IncidentPhotos incident={incident} />
    </article>
  );
}

/** One report: all of it for safety and admin, what was sent and its status for its reporter. */
export function IncidentPage({ incidentId, timeZoneOf, owners, batteries }: IncidentPageProps) {
  const incident = useIncident(incidentId);
  if (incident.isPending) return <Loading label="Loading the report" />;
  if (incident.isError) {
    if (isApiError(incident.error) && incident.error.status === 404) return <Refusal title="No such report" text="It may be from an older link, or of another team." />;
    if (isApiError(incident.error) && incident.error.status === 403) {
      return <Refusal title="Not your report" text="Reports are for the safety captains, the mentors and the one who sent it." />;
    }
    return <ErrorNotice title="Could not load the report" error={incident.error} onRetry={() => incident.refetch()} retrying={incident.isFetching} />;
  }
  const timeZone = timeZoneOf(incident.data.eventId) ?? here;
  if (incident.data.view === 'reporter') return <ReporterView incident={incident.data} timeZone={timeZone} />;
  return <FullReport incident={incident.data} timeZone={timeZone} owners={owners} batteries={batteries} />;
}
