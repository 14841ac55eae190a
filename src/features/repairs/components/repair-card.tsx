import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { urgencyOf } from '@shared/domain/repair-urgency';
import type { RepairJson } from '@shared/schemas/repairs';
import { CameraIcon } from '../../../components/ui/action-icons';
import { CheckIcon, UserIcon } from '../../../components/ui/icons';
import { Spinner } from '../../../components/ui/loading';
import { formatZonedTime } from '../../../lib/dates';
import type { RepairMatch } from './repair-context';
import { SeverityTag } from './severity-tag';
import { UrgencyLine } from './urgency-line';

export interface CardFacts {
  subsystemLabel: (key: string) => string;
  matchOf: (matchId: string | null) => RepairMatch | null;
  /** The next queue call every open ticket is needed by. */
  queueAt: string | null;
  /** Minute-by-minute server time: minutes left are counted again each minute. */
  now: Date;
  timeZone: string;
}

interface RepairCardProps {
  ticket: RepairJson;
  facts: CardFacts;
  /** The drag handle, for those who may move cards. */
  handle?: ReactNode;
  /** Its move is on its way to the server. */
  saving?: boolean;
}

function Title({ ticket }: { ticket: RepairJson }) {
  // Full width of the card: four columns on a portrait tablet leave about 170 px for it.
  return (
    <h3 lang="en" className="text-lg leading-snug font-bold hyphens-auto break-words md:text-base xl:text-lg">
      <Link to={`/repairs/${ticket.id}`} className="underline-offset-4 hover:underline">
        {ticket.title}
      </Link>
    </h3>
  );
}

/**
 * The handle floats at the card's top right: the severity beside it when there is room, below it
 * in a narrow column (four columns on a portrait tablet), never under it.
 */
function Handle({ handle }: { handle: ReactNode }) {
  return handle ? <div className="float-right mb-1 ml-2">{handle}</div> : null;
}

function Saving() {
  return (
    <p role="status" className="flex items-center gap-1.5 text-sm text-ink-muted">
      <Spinner className="size-4" /> Saving the move…
    </p>
  );
}

/** A done ticket: its name and when it was done, small, so the open work stays in view. */
function DoneCard({ ticket, facts, handle, saving }: RepairCardProps) {
  return (
    <div className="flow-root rounded-xl border border-line bg-surface p-2 pl-3">
      <Handle handle={handle} />
      <p className="pt-3 pb-1 text-sm font-semibold text-ok tabular-nums">
        <CheckIcon className="mr-1.5 inline size-5 align-[-0.3em]" strokeWidth={3} />
        {ticket.doneAt ? `Done ${formatZonedTime(new Date(ticket.doneAt), facts.timeZone, false)}` : 'Done'}
      </p>
      <Title ticket={ticket} />
      {saving && <Saving />}
    </div>
  );
}

/**
 * A ticket on the board: what is wrong, how bad (word + shape + colour), where, who is on it, the
 * match it broke in, its photo and the minutes left to the queue call.
 */
export function RepairCard(props: RepairCardProps) {
  const { ticket, facts, handle, saving } = props;
  if (ticket.status === 'done') return <DoneCard {...props} />;
  const urgency = urgencyOf(ticket, facts.queueAt, facts.now);
  const match = facts.matchOf(ticket.foundInMatchId);
  const late = urgency.late;
  return (
    <div className={`flow-root rounded-xl border-2 bg-surface p-2.5 xl:p-3 ${late ? 'border-danger' : 'border-line'}`}>
      <Handle handle={handle} />
      {/* A line box, not a flex row: the tag sits beside the floated handle when it fits, else below it. */}
      <div className="mb-2 pt-2.5">
        <SeverityTag severity={ticket.severity} />
      </div>
      <div className="flex flex-col gap-2">
        <Title ticket={ticket} />
        <p className="text-sm font-semibold break-words">
          {facts.subsystemLabel(ticket.subsystem)}
          {match && (
            <>
              {' · '}
              <span className="whitespace-nowrap">
                <span aria-hidden="true">found in {match.short}</span>
                <span className="sr-only">found in {match.name}</span>
              </span>
            </>
          )}
        </p>
        <p className={`flex items-start gap-1.5 text-sm ${ticket.assignee ? '' : 'text-ink-muted italic'}`}>
          <UserIcon className="mt-0.5 size-4" />
          <span className="min-w-0 break-words">{ticket.assignee ? ticket.assignee.displayName : 'Nobody on it yet'}</span>
        </p>
        <UrgencyLine urgency={urgency} severity={ticket.severity} done={false} />
        {/* Why it is not where urgency would put it. */}
        {ticket.placedByHand && <p className="text-sm text-ink-muted">Placed here by a lead</p>}
        {ticket.photoCount > 0 && (
          <p className="flex items-center gap-2 text-sm text-ink-muted">
            {ticket.coverThumbUrl ? (
              <img src={ticket.coverThumbUrl} alt="" loading="lazy" className="h-12 w-16 rounded-md border border-line object-cover" />
            ) : (
              <CameraIcon className="size-5" />
            )}
            <span className="tabular-nums">
              {ticket.photoCount} photo{ticket.photoCount === 1 ? '' : 's'}
            </span>
          </p>
        )}
        {saving && <Saving />}
      </div>
    </div>
  );
}
