import { useEffect, useRef, useState } from 'react';
import type { IncidentJson } from '@shared/schemas/incidents';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { FirstThingsFirst } from '../../../components/ui/first-things-first';
import { PencilIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { isApiError, isNotFound } from '../../../lib/api-client';
import { useCan } from '../../../lib/authorization';
import { useIncident } from '../api/get-incident';
import { CloseReport } from './close-report';
import { EditReport } from './edit-report';
import { FollowUps, type FollowUpOwner } from './follow-ups';
import { IncidentDetails, IncidentHeading } from './incident-details';
import { IncidentPhotos } from './incident-photos';
import type { IncidentBattery } from './report-choices';
import { StaleIncidentNotice } from './stale-incident-notice';
import { useIncidentWrite } from './use-incident-write';

interface IncidentPageProps {
  incidentId: string;
  /** Whose clock a report is read on: its event's (from the events feature), else this device's. */
  timeZoneOf: (eventId: string | null) => string;
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
  // Opening the form moves into it, closing it goes back to its button: the keyboard's place is
  // never lost with the element that had it.
  const details = useRef<HTMLElement>(null);
  const wasEditing = useRef(false);
  const isEditing = editing !== null;
  useEffect(() => {
    if (isEditing) details.current?.querySelector<HTMLElement>('form input, form select, form textarea')?.focus();
    else if (wasEditing.current) details.current?.querySelector<HTMLElement>('button')?.focus();
    wasEditing.current = isEditing;
  }, [isEditing]);
  return (
    <article aria-labelledby="incident-title" className="flex max-w-4xl flex-col gap-8">
      <header className="flex flex-col gap-3">
        <BackLink toLog />
        <IncidentHeading incident={incident} />
      </header>
      {writer.conflict && (
        <StaleIncidentNotice conflict={writer.conflict} timeZone={timeZone} pending={writer.pending} onKeepMine={writer.keepMine} onTakeTheirs={writer.takeTheirs} />
      )}
      <section ref={details} aria-labelledby="incident-details-title" className="flex flex-col gap-4">
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
  if (isNotFound(incident.error)) return <Refusal title="No such report" text="It may be from an older link, or of another team." />;
  if (isApiError(incident.error) && incident.error.status === 403) {
    return <Refusal title="Not your report" text="Reports are for the safety captains, the mentors and the one who sent it." />;
  }
  // A refetch that failed on the arena Wi-Fi keeps the report on screen, and with it the
  // follow-up, closing note or correction being typed.
  if (!incident.data) {
    if (incident.isError) return <ErrorNotice title="Could not load the report" error={incident.error} onRetry={() => incident.refetch()} retrying={incident.isFetching} />;
    return <Loading label="Loading the report" />;
  }
  const timeZone = timeZoneOf(incident.data.eventId);
  return (
    <>
      {incident.isError && (
        <div className="mb-6">
          <ErrorNotice title="Could not reload the report: this is how it was" error={incident.error} onRetry={() => incident.refetch()} retrying={incident.isFetching} />
        </div>
      )}
      {incident.data.view === 'reporter' ? (
        <ReporterView incident={incident.data} timeZone={timeZone} />
      ) : (
        <FullReport incident={incident.data} timeZone={timeZone} owners={owners} batteries={batteries} />
      )}
    </>
  );
}
