import { Link } from 'react-router';
import type { IncidentJson } from '@shared/schemas/incidents';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { Loading } from '../../../components/ui/loading';
import { useIncidents } from '../api/get-incidents';
import type { IncidentFilter } from '../api/incidents-cache';
import { ClassTag } from './class-tag';
import { IncidentStatusTag, incidentTitle } from './incident-details';
import { formatWhen } from './incident-words';

const peopleWords = (count: number) => (count === 0 ? 'Nobody named' : count === 1 ? '1 person' : `${count} people`);

function IncidentRow({ incident, timeZone }: { incident: IncidentJson; timeZone: string }) {
  const toDo = incident.followUps.filter((item) => !item.done).length;
  return (
    <li>
      <Link
        to={`/safety/incidents/${incident.id}`}
        className="flex flex-col gap-2 rounded-2xl border-2 border-line bg-surface p-4 hover:border-line-strong hover:bg-sunken active:bg-sunken"
      >
        <span className="flex flex-wrap items-center gap-2">
          <ClassTag incidentClass={incident.classification.class} />
          <IncidentStatusTag incident={incident} />
          <span className="text-ink-muted tabular-nums">{formatWhen(incident.occurredAt, timeZone)}</span>
        </span>
        <span className="text-xl font-bold break-words">{incidentTitle(incident)}</span>
        <span className="line-clamp-2 break-words">{incident.description}</span>
        <span className="text-ink-muted">
          {peopleWords(incident.involved.length)} · reported by {incident.reporter.name}
          {toDo > 0 && ` · ${toDo} follow-up${toDo === 1 ? '' : 's'} to do`}
        </span>
      </Link>
    </li>
  );
}

/** The incidents the filter picks, newest first, each a link to its report. */
export function IncidentLog({ filter, timeZoneOf }: { filter: IncidentFilter; timeZoneOf: (eventId: string | null) => string }) {
  const incidents = useIncidents(filter);
  if (incidents.isPending) return <Loading label="Loading the safety log" />;
  if (incidents.isError) return <ErrorNotice title="Could not load the safety log" error={incidents.error} onRetry={() => incidents.refetch()} retrying={incidents.isFetching} />;
  const list = incidents.data.incidents;
  if (list.length === 0) return <p className="text-lg text-ink-muted">{filter.status ? `No ${filter.status} incidents here.` : 'No incidents here. Good.'}</p>;
  return (
    <ul aria-label="Incidents" aria-busy={incidents.isPlaceholderData || undefined} className="flex flex-col gap-3">
      {list.map((incident) => (
        <IncidentRow key={incident.id} incident={incident} timeZone={timeZoneOf(incident.eventId)} />
      ))}
    </ul>
  );
}
