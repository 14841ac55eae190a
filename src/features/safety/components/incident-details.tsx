import type { ReactNode } from 'react';
import { KIND_LABELS, LOCATION_LABELS, type IncidentJson } from '@shared/schemas/incidents';
import { StatusTag } from '../../../components/ui/status-tag';
import { CheckIcon, DotIcon } from '../../../components/ui/icons';
import { ClassTag } from './class-tag';
import { basisText, CLASS_LABELS, formatWhen, listWords, personLabel, REASON_LABELS, STATUS_LABELS, treatmentsText } from './incident-words';

function Fact({ label, wide = false, children }: { label: string; wide?: boolean; children: ReactNode }) {
  return (
    <div className={`flex min-w-0 flex-col ${wide ? 'sm:col-span-2' : ''}`}>
      <dt className="text-sm font-semibold text-ink-muted">{label}</dt>
      <dd className="text-lg break-words">{children}</dd>
    </div>
  );
}

const none = <span className="text-ink-muted">None</span>;

/** Open or closed: icon + word + colour. */
export function IncidentStatusTag({ incident }: { incident: Pick<IncidentJson, 'status'> }) {
  const closed = incident.status === 'closed';
  return (
    <StatusTag large tone={closed ? 'ok' : 'accent'} icon={closed ? <CheckIcon className="size-5" /> : <DotIcon className="size-5" />}>
      {STATUS_LABELS[incident.status]}
    </StatusTag>
  );
}

export const incidentTitle = (incident: Pick<IncidentJson, 'kind' | 'location'>) => `${KIND_LABELS[incident.kind]} · ${LOCATION_LABELS[incident.location]}`;

/** The heading block of a report: what, where, its class and status, and why the contacts were alerted at once. */
export function IncidentHeading({ incident }: { incident: IncidentJson }) {
  return (
    <>
      <h1 id="incident-title" className="text-3xl font-bold tracking-tight break-words sm:text-4xl">
        {incidentTitle(incident)}
      </h1>
      <div className="flex flex-wrap items-center gap-2">
        <ClassTag incidentClass={incident.classification.class} />
        <IncidentStatusTag incident={incident} />
      </div>
      {incident.alertReasons.length > 0 && (
        <p className="text-lg font-semibold">Safety contacts alerted at once: {listWords(incident.alertReasons.map((reason) => REASON_LABELS[reason]))}.</p>
      )}
    </>
  );
}

/** What was reported, as both views show it. */
export function IncidentDetails({ incident, timeZone }: { incident: IncidentJson; timeZone: string }) {
  return (
    <dl className="grid gap-x-8 gap-y-4 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:grid-cols-2 sm:p-6">
      <Fact label="When">
        <span className="tabular-nums">{formatWhen(incident.occurredAt, timeZone)}</span>
      </Fact>
      <Fact label="Where">{LOCATION_LABELS[incident.location]}</Fact>
      <Fact label="Kind">{KIND_LABELS[incident.kind]}</Fact>
      <Fact label="Reported by">
        {incident.reporter.name} · <span className="tabular-nums">{formatWhen(incident.createdAt, timeZone)}</span>
      </Fact>
      {incident.batteryName && <Fact label="Battery">{incident.batteryName}</Fact>}
      <Fact label="People involved">
        {incident.involved.length > 0 ? (
          <ul>
            {incident.involved.map((person, index) => (
              <li key={`${index}-${person.initials}`}>{personLabel(person)}</li>
            ))}
          </ul>
        ) : (
          none
        )}
      </Fact>
      <Fact label="What happened" wide>
        <span className="whitespace-pre-line">{incident.description}</span>
      </Fact>
      <Fact label="Care given" wide>
        {incident.treatments.length > 0 ? treatmentsText(incident.treatments) : none}
      </Fact>
      <Fact label="What was done straight away" wide>
        {incident.immediateActions ? <span className="whitespace-pre-line">{incident.immediateActions}</span> : none}
      </Fact>
      <Fact label="Class" wide>
        {CLASS_LABELS[incident.classification.class]}. {basisText(incident.classification)}
      </Fact>
    </dl>
  );
}
