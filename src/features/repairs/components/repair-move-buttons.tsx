import { useEffect, useRef, useState } from 'react';
import { REPAIR_NOTE_MAX, type RepairJson } from '@shared/schemas/repairs';
import { REPAIR_STATUSES, type RepairStatus } from '@shared/domain/repair-urgency';
import { ArrowRightIcon } from '../../../components/ui/action-icons';
import { Button } from '../../../components/ui/button';
import { UndoIcon } from '../../../components/ui/icons';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, Field } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useUpdateRepair, type RepairChanges } from '../api/update-repair';
import { MoveNotice } from './move-notice';
import { MinutesField } from './repair-fields';
import { fieldErrorsOf } from './repair-form-values';
import { STATUS_LABELS } from './repair-words';

/** Asked on the way to Done: how it was fixed, and how long it took. Both may stay as they are. */
function DoneDialog({ ticket, open, pending, error, onClose, onMove }: {
  ticket: RepairJson;
  open: boolean;
  pending: boolean;
  error: unknown;
  onClose: () => void;
  onMove: (changes: Omit<RepairChanges, 'version' | 'status'>) => void;
}) {
  const [note, setNote] = useState(ticket.resolutionNote ?? '');
  const [spent, setSpent] = useState(String(ticket.timeSpentMinutes));
  const errors = fieldErrorsOf({}, error);
  const [spentError, setSpentError] = useState<string | null>(null);

  function move() {
    const minutes = spent.trim() === '' ? ticket.timeSpentMinutes : Number(spent.trim());
    if (!Number.isInteger(minutes) || minutes < 0) return setSpentError('Whole minutes, 0 or more');
    setSpentError(null);
    onMove({
      ...(note.trim() !== (ticket.resolutionNote ?? '') && { resolutionNote: note.trim() || null }),
      ...(minutes !== ticket.timeSpentMinutes && { timeSpentMinutes: minutes }),
    });
  }

  return (
    <Dialog
      open={open}
      title={`Done: ‘${ticket.title}’`}
      onClose={onClose}
      actions={
        <>
          <Button variant="secondary" onClick={onClose}>
            Not yet
          </Button>
          <Button pending={pending} onClick={move}>
            Move to Done
          </Button>
        </>
      }
    >
      <Field label="How was it fixed? (optional)" hint="For whoever meets this again: what was wrong and what was done." error={errors.resolutionNote}>
        {(control) => <textarea rows={3} maxLength={REPAIR_NOTE_MAX} className={controlClass} value={note} onChange={(event) => setNote(event.target.value)} {...control} />}
      </Field>
      <MinutesField label="Time spent in minutes" value={spent} onChange={setSpent} error={spentError ?? errors.timeSpentMinutes} />
      {isApiError(error, 'stale') ? (
        <p role="alert" className="font-semibold text-warning">
          Someone else changed this ticket meanwhile; it is now in {STATUS_LABELS[ticket.status]}. Press Move to Done again to move it now.
        </p>
      ) : (
        error != null && Object.keys(errors).length === 0 && <ErrorNotice title="Not moved" error={error} />
      )}
    </Dialog>
  );
}

/**
 * A button for each other column: moving a ticket without dragging (keyboard, switch access, a
 * crowded phone). Urgency places it in its new column, as a drop by the crew does.
 */
export function RepairMoveButtons({ ticket }: { ticket: RepairJson }) {
  const update = useUpdateRepair(ticket);
  const [asking, setAsking] = useState(false);
  const [target, setTarget] = useState<RepairStatus | null>(null);
  // The pressed button goes with the move (no button for the column it is in): the focus moves to
  // the first button left, and the move is said, rather than the focus falling to the page.
  const buttonsRef = useRef<HTMLDivElement>(null);
  const [moved, setMoved] = useState<{ status: RepairStatus; count: number } | null>(null);
  useEffect(() => {
    if (moved) buttonsRef.current?.querySelector<HTMLElement>('button')?.focus();
  }, [moved]);

  function move(status: RepairStatus, extra: Omit<RepairChanges, 'version' | 'status'> = {}, base: RepairJson = ticket) {
    setTarget(status);
    setMoved(null);
    update.mutate(
      { version: base.version, status, ...extra },
      {
        onSuccess: (answer) => {
          setAsking(false);
          setMoved((old) => ({ status: answer.status, count: (old?.count ?? 0) + 1 }));
        },
      },
    );
  }

  const stale = update.error && target && !asking;
  return (
    <section aria-label="Move to another column" className="flex flex-col gap-3">
      <div ref={buttonsRef} className="flex flex-wrap gap-3">
        {REPAIR_STATUSES.filter((status) => status !== ticket.status).map((status) => (
          <Button
            key={status}
            variant={status === 'done' ? 'primary' : 'secondary'}
            icon={REPAIR_STATUSES.indexOf(status) > REPAIR_STATUSES.indexOf(ticket.status) ? <ArrowRightIcon className="size-5" /> : <UndoIcon className="size-5" />}
            pending={update.isPending && target === status}
            onClick={() => {
              if (status === 'done') {
                update.reset();
                setAsking(true);
              } else move(status);
            }}
          >
            Move to {STATUS_LABELS[status]}
          </Button>
        ))}
      </div>
      <p role="status" className="font-semibold text-ink-muted empty:hidden">
        {moved ? `Moved to ${STATUS_LABELS[moved.status]}.` : ''}
      </p>
      {stale && (
        <MoveNotice
          problem={{ error: update.error, variables: { ticket, status: target, byHand: null } }}
          onRetry={() => move(target, {}, ticket)}
          onDismiss={() => update.reset()}
        />
      )}
      {asking && (
        <DoneDialog
          ticket={ticket}
          open={asking}
          pending={update.isPending}
          error={update.error}
          onClose={() => setAsking(false)}
          onMove={(extra) => move('done', extra)}
        />
      )}
    </section>
  );
}
