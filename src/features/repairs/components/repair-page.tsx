import { useState, type ReactNode } from 'react';
import { urgencyOf } from '@shared/domain/repair-urgency';
import type { RepairDetailJson } from '@shared/schemas/repairs';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PencilIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { StatusTag } from '../../../components/ui/status-tag';
import { isApiError } from '../../../lib/api-client';
import { useCan } from '../../../lib/authorization';
import { useServerNow } from '../../../lib/server-clock';
import { hasDetail, useRepair } from '../api/get-repair';
import { subsystemLabel, useSubsystems } from '../api/get-subsystems';
import { matchLabelOf, type RepairAssignee, type RepairMatch } from './repair-context';
import { RepairEditForm } from './repair-edit-form';
import { formatValue, formatWhen, type Namers } from './repair-format';
import { RepairHistory } from './repair-history';
import { RepairMoveButtons } from './repair-move-buttons';
import { RepairPhotos } from './repair-photos';
import { STATUS_LABELS } from './repair-words';
import { SeverityTag } from './severity-tag';
import { UrgencyLine } from './urgency-line';

// A ticket of an event the route knows no zone for (not the current one): the tablet's own clock.
const here = Intl.DateTimeFormat().resolvedOptions().timeZone;

interface RepairPageProps {
  repairId: string;
  /** The time zone of a ticket's event (from the events feature), if known. */
  timeZoneOf: (eventId: string) => string | undefined;
  /** The current event's matches (from the schedule). */
  matches: RepairMatch[];
  /** Every member, to name people in the history; undefined while they load. */
  people: RepairAssignee[] | undefined;
  /** Members who work on repairs. */
  assignees: RepairAssignee[] | undefined;
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex min-w-0 flex-col">
      <dt className="text-sm font-semibold text-ink-muted">{label}</dt>
      <dd className="text-lg break-words">{children}</dd>
    </div>
  );
}

function BackLink() {
  return (
    <LinkButton to="/repairs" variant="quiet" className="-ml-4 self-start">
      ← All repairs
    </LinkButton>
  );
}

function TicketDetail({ ticket, timeZone, matches, people, assignees }: { ticket: RepairDetailJson; timeZone: string } & Omit<RepairPageProps, 'repairId' | 'timeZoneOf'>) {
  const canWork = useCan('repairs:work');
  const subsystems = useSubsystems();
  const now = useServerNow(60_000);
  const [editing, setEditing] = useState<RepairDetailJson | null>(null);
  const names: Namers = {
    subsystem: (key) => subsystemLabel(subsystems.data, key),
    match: (matchId) => matchLabelOf(matches, matchId)?.name ?? null,
    person: (userId) => people?.find((person) => person.id === userId)?.name ?? null,
  };
  const urgency = urgencyOf(ticket, ticket.urgency.neededBy, now);
  const done = ticket.status === 'done';

  return (
    <article aria-labelledby="repair-title" className="flex max-w-4xl flex-col gap-8">
      <header className="flex flex-col gap-3">
        <BackLink />
        <h1 id="repair-title" className="text-3xl font-bold tracking-tight break-words sm:text-4xl">
          {ticket.title}
        </h1>
        <div className="flex flex-wrap items-center gap-2">
          <SeverityTag severity={ticket.severity} />
          <StatusTag tone={done ? 'ok' : 'accent'}>
            <span className="sr-only">Column: </span>
            {STATUS_LABELS[ticket.status]}
          </StatusTag>
        </div>
        <UrgencyLine urgency={urgency} severity={ticket.severity} done={done} />
      </header>

      {canWork && <RepairMoveButtons ticket={ticket} />}

      {done && !ticket.resolutionNote && canWork && !editing && (
        <div className="flex flex-wrap items-center gap-3 rounded-xl border-2 border-accent bg-accent-soft p-4">
          <p className="min-w-0 flex-1 basis-64 font-semibold">How was it fixed? A line of resolution note helps whoever meets this again.</p>
          <Button variant="secondary" icon={<PencilIcon className="size-5" />} onClick={() => setEditing(ticket)}>
            Add a resolution note
          </Button>
        </div>
      )}

      <section aria-labelledby="repair-details-title" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="repair-details-title" className="text-2xl font-bold">
            Details
          </h2>
          {canWork && !editing && (
            <Button variant="secondary" icon={<PencilIcon className="size-5" />} onClick={() => setEditing(ticket)}>
              Edit the ticket
            </Button>
          )}
        </div>
        {editing ? (
          subsystems.isSuccess ? (
            <div className="rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-6">
              <RepairEditForm
                ticket={editing}
                latest={ticket}
                subsystems={subsystems.data.subsystems}
                matches={matches}
                assignees={assignees}
                names={names}
                onDone={() => setEditing(null)}
              />
            </div>
          ) : (
            <Loading label="Loading the subsystems" />
          )
        ) : (
          <dl className="grid gap-x-8 gap-y-4 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:grid-cols-2 sm:p-6">
            <Fact label="Subsystem">{names.subsystem(ticket.subsystem)}</Fact>
            <Fact label="Found in">{ticket.foundInMatchId ? formatValue('foundInMatchId', ticket.foundInMatchId, names) : 'Not in a match'}</Fact>
            <Fact label="Reported by">
              {ticket.reporter.displayName} · <span className="tabular-nums">{formatWhen(ticket.reportedAt, timeZone, now)}</span>
            </Fact>
            <Fact label="Who fixes it">{ticket.assignee?.displayName ?? <span className="text-ink-muted italic">Nobody yet</span>}</Fact>
            <Fact label="Estimate">{formatValue('estimateMinutes', ticket.estimateMinutes, names)}</Fact>
            <Fact label="Time spent">{formatValue('timeSpentMinutes', ticket.timeSpentMinutes, names)}</Fact>
            {ticket.doneAt && (
              <Fact label="Done">
                <span className="tabular-nums">{formatWhen(ticket.doneAt, timeZone, now)}</span>
              </Fact>
            )}
            <div className="sm:col-span-2">
              <Fact label="Description">{ticket.description ? <span className="whitespace-pre-line">{ticket.description}</span> : <span className="text-ink-muted">None</span>}</Fact>
            </div>
            <div className="sm:col-span-2">
              <Fact label="Parts used">
                {ticket.partsUsed.length > 0 ? (
                  <ul className="list-disc pl-6">
                    {ticket.partsUsed.map((part, index) => (
                      <li key={`${index}-${part}`}>{part}</li>
                    ))}
                  </ul>
                ) : (
                  <span className="text-ink-muted">None</span>
                )}
              </Fact>
            </div>
            {ticket.resolutionNote && (
              <div className="sm:col-span-2">
                <Fact label="How it was fixed">
                  <span className="whitespace-pre-line">{ticket.resolutionNote}</span>
                </Fact>
              </div>
            )}
          </dl>
        )}
      </section>

      <RepairPhotos ticket={ticket} timeZone={timeZone} now={now} />
      <RepairHistory history={ticket.history} names={names} timeZone={timeZone} now={now} />
    </article>
  );
}

/** One ticket, everything on it: for viewers, its title and column only. */
export function RepairPage({ repairId, timeZoneOf, matches, people, assignees }: RepairPageProps) {
  const repair = useRepair(repairId);
  if (repair.isPending) return <Loading label="Loading the ticket" />;
  if (repair.isError) {
    if (isApiError(repair.error) && repair.error.status === 404) {
      return (
        <div className="flex flex-col items-start gap-4">
          <h1 className="text-3xl font-bold">No such ticket</h1>
          <p className="text-lg text-ink-muted">It may be from an older link, or of another team.</p>
          <LinkButton to="/repairs">All repairs</LinkButton>
        </div>
      );
    }
    return <ErrorNotice title="Could not load the ticket" error={repair.error} onRetry={() => repair.refetch()} retrying={repair.isFetching} />;
  }
  const ticket = repair.data;
  if (!hasDetail(ticket)) {
    return (
      <article className="flex flex-col gap-3">
        <BackLink />
        <h1 className="text-3xl font-bold break-words">{ticket.title}</h1>
        <p className="text-lg">
          Column: <span className="font-semibold">{STATUS_LABELS[ticket.status]}</span>
        </p>
      </article>
    );
  }
  return <TicketDetail ticket={ticket} timeZone={timeZoneOf(ticket.eventId) ?? here} matches={matches} people={people} assignees={assignees} />;
}
