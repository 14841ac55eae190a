import { useMemo } from 'react';
import { columnsOf } from '@shared/domain/repair-board';
import { REPAIR_STATUSES } from '@shared/domain/repair-urgency';
import type { RepairJson, RepairListJson, RepairSummaryJson } from '@shared/schemas/repairs';
import { LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PencilIcon, PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCan, useViewer } from '../../../lib/authorization';
import { formatZonedTime } from '../../../lib/dates';
import { formatMinutes } from '../../../lib/match-labels';
import { useServerNow } from '../../../lib/server-clock';
import { subsystemLabel, useSubsystems } from '../api/get-subsystems';
import { useRepairs } from '../api/get-repairs';
import { isDetailed } from '../api/repairs-cache';
import { anyFilter, RepairFilters, useRepairFilters, type RepairFilterValues } from './repair-filters';
import { RepairBoard } from './repair-board';
import type { CardFacts } from './repair-card';
import { matchLabelOf, type RepairMatch } from './repair-context';
import { STATUS_LABELS } from './repair-words';

function NeededBy({ list, matches, timeZone, now }: { list: RepairListJson; matches: RepairMatch[]; timeZone: string; now: Date }) {
  if (!list.nextQueue) return <>No match of ours is ahead, so nothing is needed by a queue call.</>;
  const match = matchLabelOf(matches, list.nextQueue.matchId);
  const minutes = Math.floor((Date.parse(list.nextQueue.queueAt) - now.getTime()) / 60_000);
  const at = formatZonedTime(new Date(list.nextQueue.queueAt), timeZone, false);
  return (
    <span className="tabular-nums">
      Open tickets are needed by the queue call{match ? ` for ${match.name}` : ''} at {at}
      {minutes >= 0 ? ` — in ${formatMinutes(minutes)}` : ' — it has passed'}.
    </span>
  );
}

function matchesFilters(ticket: RepairJson, filters: RepairFilterValues, userId: string): boolean {
  if (filters.mine && ticket.assignee?.id !== userId && ticket.reporter.id !== userId) return false;
  if (filters.subsystem && ticket.subsystem !== filters.subsystem) return false;
  if (filters.blocking && ticket.severity !== 'blocks_match') return false;
  return true;
}

/** What a viewer sees: each column's titles, nothing to drag. */
function SummaryBoard({ repairs }: { repairs: RepairSummaryJson[] }) {
  const columns = columnsOf(repairs);
  return (
    <div className="grid gap-4 md:grid-cols-4 md:gap-3 xl:gap-4">
      {REPAIR_STATUSES.map((status) => (
        <section key={status} aria-labelledby={`repair-column-${status}`} className="rounded-2xl bg-sunken p-2">
          <div className="flex items-baseline justify-between gap-2 px-1 pt-1 pb-3">
            <h2 id={`repair-column-${status}`} className="text-xl font-bold">
              {STATUS_LABELS[status]}
            </h2>
            <span className="font-semibold text-ink-muted tabular-nums">
              {columns[status].length}
              <span className="sr-only"> {columns[status].length === 1 ? 'ticket' : 'tickets'}</span>
            </span>
          </div>
          <ul className="flex flex-col gap-2">
            {columns[status].map((ticket) => (
              <li key={ticket.id} className="rounded-xl border border-line bg-surface p-3 font-semibold break-words">
                {ticket.title}
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}

interface RepairsPageProps {
  eventId: string;
  timeZone: string;
  /** The event's matches (from the schedule), to name the match a ticket was found in. */
  matches: RepairMatch[];
}

/** The repair board of the current event: four columns, filters in the address, drag and drop for those who work on repairs. */
export function RepairsPage({ eventId, timeZone, matches }: RepairsPageProps) {
  const repairs = useRepairs(eventId);
  const subsystems = useSubsystems();
  const { user } = useViewer();
  const canWork = useCan('repairs:work');
  const canManage = useCan('repairs:manage');
  const now = useServerNow(60_000);
  const [filters, setFilters] = useRepairFilters();
  const list = repairs.data;

  const tickets = useMemo(() => (isDetailed(list) ? list.repairs : []), [list]);
  const shownTickets = useMemo(() => tickets.filter((ticket) => matchesFilters(ticket, filters, user.id)), [tickets, filters, user.id]);
  const shown = useMemo(() => columnsOf(shownTickets), [shownTickets]);
  const facts: CardFacts = {
    subsystemLabel: (key) => subsystemLabel(subsystems.data, key),
    matchOf: (matchId) => matchLabelOf(matches, matchId),
    queueAt: list?.nextQueue?.queueAt ?? null,
    now,
    timeZone,
  };

  return (
    <>
      <PageHeader
        title="Repairs"
        description={list && <NeededBy list={list} matches={matches} timeZone={timeZone} now={now} />}
        actions={
          <>
            {canManage && (
              <LinkButton to="/repairs/subsystems" variant="secondary" icon={<PencilIcon className="size-5" />}>
                Subsystems
              </LinkButton>
            )}
            {canWork && (
              <LinkButton to="/repairs/new" size="lg" icon={<PlusIcon />}>
                Report a problem
              </LinkButton>
            )}
          </>
        }
      />
      {repairs.isPending && <Loading label="Loading the repair board" />}
      {repairs.isError && (
        <ErrorNotice title="Could not load the repair board" error={repairs.error} onRetry={() => repairs.refetch()} retrying={repairs.isFetching} />
      )}
      {list && !isDetailed(list) && <SummaryBoard repairs={list.repairs} />}
      {isDetailed(list) && (
        <div className="flex flex-col gap-4">
          <RepairFilters
            values={filters}
            onChange={setFilters}
            subsystems={subsystems.data?.subsystems ?? []}
            shownCount={shownTickets.length}
            totalCount={tickets.length}
          />
          {anyFilter(filters) && shownTickets.length === 0 && tickets.length > 0 && (
            <p className="text-lg text-ink-muted">No ticket matches these filters.</p>
          )}
          <RepairBoard eventId={eventId} tickets={tickets} shown={shown} facts={facts} canWork={canWork} canPlaceByHand={canManage} />
          {canWork && (
            <p className="text-ink-muted">
              {canManage
                ? 'Drag a card by its handle to move it; where you drop it is where it stays. Dropped where urgency would put it, urgency keeps ordering it.'
                : 'Drag a card by its handle into another column; it goes where its urgency puts it. A lead can place cards by hand.'}
            </p>
          )}
        </div>
      )}
    </>
  );
}
