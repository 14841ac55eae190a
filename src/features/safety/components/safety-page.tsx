import { buttonClass, LinkButton } from '../../../components/ui/button';
import { PrintIcon } from '../../../components/ui/action-icons';
import { PlusIcon } from '../../../components/ui/icons';
import { PageHeader } from '../../../components/ui/page-header';
import { useCan } from '../../../lib/authorization';
import { incidentsCsvUrl } from '../api/get-incidents';
import { IncidentLog } from './incident-log';
import { LogFilters } from './log-filters';
import { SafetyCautions } from './safety-cautions';
import { timeZoneIn, useLogFilter, type SafetyEvent } from './safety-event';

function ReportButton() {
  return (
    <LinkButton to="/safety/report" size="lg" icon={<PlusIcon className="size-6" />}>
      Report an incident
    </LinkButton>
  );
}

/** For everyone without the log: how to report, and what becomes of a report. */
function WhatHappens() {
  return (
    <section aria-labelledby="what-happens-title" className="flex flex-col gap-2 rounded-2xl border border-line bg-surface p-4 text-lg shadow-sm sm:p-6">
      <h2 id="what-happens-title" className="text-xl font-bold">
        What happens to a report
      </h2>
      <ul className="flex list-disc flex-col gap-1.5 pl-6">
        <li>The safety captains and mentors read it and follow it up; nobody else on the team sees it.</li>
        <li>Anything beyond first aid, anyone losing consciousness, and any battery acid or chemical: they get an e-mail at once.</li>
        <li>People are named by initials only, never by name.</li>
        <li>You can open your own report afterwards to see where it stands and add photos.</li>
      </ul>
    </section>
  );
}

function SafetyLog({ events }: { events: SafetyEvent[] }) {
  const [filter, setFilter] = useLogFilter(events);
  const timeZoneOf = timeZoneIn(events);
  const printSearch = new URLSearchParams({ eventId: filter.eventId });
  return (
    <section aria-labelledby="safety-log-title" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="safety-log-title" className="text-2xl font-bold">
          Safety log
        </h2>
        <div className="flex flex-wrap gap-3">
          {/* A plain link: the browser saves the file with the server's name for it. */}
          <a href={incidentsCsvUrl(filter.eventId)} download className={buttonClass('secondary')}>
            Download CSV
          </a>
          <LinkButton to={`/safety/print?${printSearch}`} variant="secondary" icon={<PrintIcon className="size-5" />}>
            Print view
          </LinkButton>
        </div>
      </div>
      <LogFilters events={events} filter={filter} onChange={setFilter} />
      <IncidentLog filter={filter} timeZoneOf={timeZoneOf} />
    </section>
  );
}

/** The safety area: the log for safety captains and mentors; for everyone, the report button and the cautions. */
export function SafetyPage({ events }: { events: SafetyEvent[] }) {
  const readsLog = useCan('incidents:read');
  return (
    <>
      <PageHeader title="Safety" description="Report anything that hurt someone or nearly did." actions={<ReportButton />} />
      <div className="flex max-w-4xl flex-col gap-8">
        {readsLog ? <SafetyLog events={events} /> : <WhatHappens />}
        <SafetyCautions />
      </div>
    </>
  );
}
