import { Link } from 'react-router';
import { columnsOf } from '@shared/domain/repair-board';
import { urgencyOf } from '@shared/domain/repair-urgency';
import { LinkButton } from '../../../components/ui/button';
import { OctagonIcon, WrenchIcon } from '../../../components/ui/icons';
import { useServerNow } from '../../../lib/server-clock';
import { useRepairs } from '../api/get-repairs';
import { isDetailed } from '../api/repairs-cache';
import { STATUS_LABELS } from './repair-words';
import { UrgencyLine } from './urgency-line';

/**
 * For the board's next-match card: the open tickets that block the match, each with its minutes
 * left and a link to it. Says nothing when there are none (or for a viewer, who sees titles only).
 */
export function NextMatchRepairs({ eventId }: { eventId: string }) {
  const repairs = useRepairs(eventId);
  const now = useServerNow(60_000);
  const list = repairs.data;
  if (!isDetailed(list)) return null;
  const columns = columnsOf(list.repairs);
  // Board order: the most urgent first within each column, the columns nearest done last.
  const blocking = [...columns.reported, ...columns.in_progress, ...columns.needs_test].filter((ticket) => ticket.severity === 'blocks_match');
  if (blocking.length === 0) return null;
  const queueAt = list.nextQueue?.queueAt ?? null;
  return (
    <section aria-labelledby="blocking-repairs-title" className="flex flex-col gap-3 rounded-2xl border-2 border-danger p-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h3 id="blocking-repairs-title" className="flex items-center gap-2 text-xl font-extrabold text-danger">
          <OctagonIcon className="size-7" strokeWidth={2.5} />
          {blocking.length === 1 ? 'A repair blocks this match' : `${blocking.length} repairs block this match`}
        </h3>
        <LinkButton to="/repairs?blocking=1" variant="secondary" icon={<WrenchIcon />}>
          Open the repairs
        </LinkButton>
      </div>
      <ul className="flex flex-col divide-y divide-line">
        {blocking.map((ticket) => (
          <li key={ticket.id} className="flex flex-wrap items-start justify-between gap-x-4 gap-y-1 py-2">
            <div className="flex min-w-0 flex-col">
              <Link to={`/repairs/${ticket.id}`} className="text-lg font-bold break-words underline-offset-4 hover:underline">
                {ticket.title}
              </Link>
              <span className="text-sm text-ink-muted">
                {STATUS_LABELS[ticket.status]} · {ticket.assignee?.displayName ?? 'nobody on it yet'}
              </span>
            </div>
            <UrgencyLine urgency={urgencyOf(ticket, queueAt, now)} severity={ticket.severity} done={false} />
          </li>
        ))}
      </ul>
    </section>
  );
}
