import type { RepairJson } from '@shared/schemas/repairs';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../components/ui/error-notice';
import { AlertIcon } from '../../../components/ui/icons';
import { staleRepair } from '../api/repairs-cache';
import type { MoveRepairVariables } from '../api/move-repair';
import { STATUS_LABELS, ticketName } from './repair-words';

export interface MoveProblem {
  error: unknown;
  variables: MoveRepairVariables;
  /** The ticket as the other person left it, for a 409 `stale`. */
  theirs?: RepairJson | null;
}

/**
 * Says that a move was not made, and why: someone else moved or changed the card first (it now
 * shows where they left it), or the server could not be reached (it went back). The move can be
 * tried again from there.
 */
export function MoveNotice({ problem, onRetry, onDismiss, floating = false }: { problem: MoveProblem; onRetry: () => void; onDismiss: () => void; floating?: boolean }) {
  const theirs = problem.theirs ?? staleRepair(problem.error);
  const { ticket, status } = problem.variables;
  const name = ticketName(theirs?.title ?? ticket.title);
  const target = STATUS_LABELS[status];
  const alreadyThere = theirs?.status === status;
  return (
    <div
      role="alert"
      className={`flex flex-wrap items-start gap-3 rounded-xl border-2 border-warning bg-warning-soft p-4 text-ink ${
        // On the board it floats above the columns, wherever the card was dropped (a long column scrolls far from the top).
        floating ? 'fixed inset-x-4 bottom-24 z-30 shadow-xl sm:left-auto sm:max-w-xl lg:right-8 lg:bottom-8' : ''
      }`}
    >
      <AlertIcon className="mt-0.5 size-6 text-warning" />
      <div className="min-w-0 flex-1 basis-64">
        {theirs ? (
          <p className="font-bold">
            Someone else moved or changed {name} first; it is now in {STATUS_LABELS[theirs.status]}. Your move was not made.
          </p>
        ) : (
          <>
            <p className="font-bold">{name} was not moved to {target}. It is back where it was.</p>
            <p>{errorMessage(problem.error)}</p>
          </>
        )}
      </div>
      <div className="flex flex-wrap gap-3">
        {!alreadyThere && (
          <Button variant="secondary" onClick={() => onRetry()}>
            {theirs ? `Move it to ${target} now` : 'Try again'}
          </Button>
        )}
        <Button variant="quiet" onClick={onDismiss}>
          OK
        </Button>
      </div>
    </div>
  );
}
