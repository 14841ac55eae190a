import { KIND_LABELS, LOCATION_LABELS, type IncidentJson } from '@shared/schemas/incidents';
import { Button, LinkButton } from '../../../components/ui/button';
import { PrintIcon } from '../../../components/ui/action-icons';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { Loading } from '../../../components/ui/loading';
import { useViewer } from '../../../lib/authorization';
import { useIncidents } from '../api/get-incidents';
import { CLASS_LABELS, formatDay, formatWhen, personLabel, STATUS_LABELS, treatmentsText } from './incident-words';
import { filterEventName, timeZoneIn, useLogFilter, type SafetyEvent } from './safety-event';

const cell = 'border border-line-strong p-2 align-top print:border-black';

function Row({ incident, timeZone }: { incident: IncidentJson; timeZone: string }) {
  return (
    <tr className="break-inside-avoid">
      <td className={`${cell} tabular-nums`}>{formatWhen(incident.occurredAt, timeZone)}</td>
      <td className={cell}>
        {KIND_LABELS[incident.kind]}, {LOCATION_LABELS[incident.location]}
      </td>
      <td className={cell}>
        <strong>{CLASS_LABELS[incident.classification.class]}</strong>
        {incident.treatments.length > 0 && <span className="block">{treatmentsText(incident.treatments)}</span>}
      </td>
      <td className={cell}>{incident.involved.map(personLabel).join(', ') || 'None'}</td>
      <td className={`${cell} whitespace-pre-line`}>
        {incident.description}
        {incident.immediateActions && <span className="mt-1 block">Done straight away: {incident.immediateActions}</span>}
      </td>
      <td className={cell}>
        {incident.followUps.length === 0
          ? 'None'
          : incident.followUps.map((item) => (
              <span key={item.id} className="block">
                {item.done ? '[done] ' : '[to do] '}
                {item.text} ({item.ownerName}, {formatDay(item.dueOn)})
              </span>
            ))}
      </td>
      <td className={cell}>
        {STATUS_LABELS[incident.status]}
        {incident.closingNote && <span className="block">{incident.closingNote}</span>}
      </td>
    </tr>
  );
}

/** A table of the event's incidents for paper: the app's frame hides itself when printing. */
export function SafetyPrintPage({ events }: { events: SafetyEvent[] }) {
  const { membership } = useViewer();
  const [filter] = useLogFilter(events);
  const incidents = useIncidents({ eventId: filter.eventId });
  const timeZoneOf = timeZoneIn(events);
  return (
    <article aria-labelledby="print-title" className="flex flex-col gap-4 print:text-black">
      <div className="flex flex-wrap items-center gap-3 print:hidden">
        <LinkButton to={`/safety?eventId=${encodeURIComponent(filter.eventId)}`} variant="quiet" className="-ml-4">
          ← Safety log
        </LinkButton>
        <Button icon={<PrintIcon className="size-5" />} onClick={() => window.print()} disabled={!incidents.isSuccess}>
          Print
        </Button>
      </div>
      <header>
        <h1 id="print-title" className="text-3xl font-bold print:text-2xl">
          Safety log: {membership.teamName}
        </h1>
        <p className="text-lg">{filterEventName(events, filter.eventId)}</p>
        <p className="mt-1 text-sm">The team&apos;s own record and classification, not an official log. Local rules, event staff and licensed medical advice come first.</p>
      </header>
      {incidents.isPending && <Loading label="Loading the incidents" />}
      {incidents.isError && <ErrorNotice title="Could not load the incidents" error={incidents.error} onRetry={() => incidents.refetch()} retrying={incidents.isFetching} />}
      {incidents.isSuccess &&
        (incidents.data.incidents.length === 0 ? (
          <p className="text-lg">No incidents.</p>
        ) : (
          <div className="overflow-x-auto print:overflow-visible">
            <table className="w-full min-w-[56rem] border-collapse text-left text-base print:min-w-0 print:text-[10pt]">
              <caption className="sr-only">Incidents, newest first</caption>
              <thead>
                <tr>
                  {['When', 'What, where', 'Class and care', 'People', 'What happened', 'Follow-ups', 'Status'].map((heading) => (
                    <th key={heading} scope="col" className={`${cell} bg-sunken font-bold print:bg-white`}>
                      {heading}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {incidents.data.incidents.map((incident) => (
                  <Row key={incident.id} incident={incident} timeZone={timeZoneOf(incident.eventId)} />
                ))}
              </tbody>
            </table>
          </div>
        ))}
    </article>
  );
}
