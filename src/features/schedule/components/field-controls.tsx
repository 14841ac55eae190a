import type { TimelineMatchJson } from '@shared/domain/timeline';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CheckIcon, FieldIcon, UndoIcon } from '../../../components/ui/icons';
import { isApiError } from '../../../lib/api-client';
import { matchName } from '../../../lib/match-labels';
import { EarlierStart } from './earlier-start';
import type { useMarkFieldProgress } from '../api/mark-field-progress';
import type { useUndoFieldProgress } from '../api/undo-field-progress';

interface FieldControlsProps {
  next: TimelineMatchJson | null;
  timeZone: string;
  // Owned by the page: the controls move to the next row after each mark, and their messages
  // ("Marked Qualification 6") must survive the move.
  mark: ReturnType<typeof useMarkFieldProgress>;
  undo: ReturnType<typeof useUndoFieldProgress>;
}

/**
 * The lead's field controls, shown on the row of the next match (which the page opens at):
 * tapping when a match starts is what keeps every projection honest.
 */
export function FieldControls({ next, timeZone, mark, undo }: FieldControlsProps) {
  const busy = mark.isPending || undo.isPending;

  // Each action clears the other's outcome, so the panel only ever reports the latest tap.
  const onMark = (variables: { matchId: string; startedAt?: Date }) => {
    undo.reset();
    mark.mutate(variables);
  };
  const onUndo = () => {
    mark.reset();
    undo.mutate();
  };

  return (
    <section aria-label="Field progress" className="flex flex-col gap-3 border-t border-line pt-3">
      <div className="flex flex-wrap items-center gap-3">
        {next ? (
          <Button
            size="lg"
            className="min-h-16 grow text-xl sm:grow-0"
            icon={<FieldIcon className="size-7" />}
            pending={mark.isPending}
            disabled={busy}
            onClick={() => onMark({ matchId: next.id })}
          >
            {matchName(next.level, next.number)} is on the field now
          </Button>
        ) : (
          <p className="text-lg text-ink-muted">Every match of the schedule is marked as started.</p>
        )}
        <Button variant="secondary" size="lg" className="grow sm:grow-0" icon={<UndoIcon />} pending={undo.isPending} disabled={busy} onClick={onUndo}>
          Undo last mark
        </Button>
      </div>
      {next && <EarlierStart match={next} timeZone={timeZone} disabled={busy} onMark={onMark} />}
      <div aria-live="polite">
        {mark.isSuccess && (
          <p className="flex items-center gap-2 font-semibold text-ok">
            <CheckIcon className="size-5" /> Marked {matchName(mark.data.level, mark.data.number)} as started.
          </p>
        )}
        {undo.isSuccess && (
          <p className="flex items-center gap-2 font-semibold text-ok">
            <CheckIcon className="size-5" /> Took back the mark on {matchName(undo.data.level, undo.data.number)}.
          </p>
        )}
      </div>
      {mark.isError && (
        <ErrorNotice
          title="The match was not marked"
          error={mark.error}
          onRetry={() => mark.variables && onMark(mark.variables)}
          retrying={mark.isPending}
        />
      )}
      {undo.isError &&
        (isApiError(undo.error, 'nothing_to_undo') ? (
          <p className="text-lg text-ink-muted">There is no mark to take back.</p>
        ) : (
          <ErrorNotice title="The mark was not taken back" error={undo.error} onRetry={onUndo} retrying={undo.isPending} />
        ))}
    </section>
  );
}
