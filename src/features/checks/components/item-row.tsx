import { useId } from 'react';
import { describeLimits, type MarkValue } from '@shared/domain/checklist';
import { ROLE_LABELS } from '@shared/roles';
import type { RunItemJson } from '@shared/schemas/checks';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../components/ui/error-notice';
import { AlertIcon, CheckIcon, UndoIcon, UserIcon } from '../../../components/ui/icons';
import { Spinner } from '../../../components/ui/loading';
import { RelativeTime } from '../../../components/ui/relative-time';
import { StatusTag } from '../../../components/ui/status-tag';
import { isApiError } from '../../../lib/api-client';
import { useClearItem } from '../api/clear-item';
import { useMarkItem } from '../api/mark-item';
import { ChoiceControl, ForItem, NumberControl, TextControl, TickControl } from './item-controls';

/** Why the server refused a mark, in the words it gave for the value when it gave some. */
function refusal(error: unknown): string {
  if (isApiError(error) && error.fields.value) return error.fields.value;
  return errorMessage(error);
}

const shown = (item: RunItemJson) => `${String(item.value)}${item.unit ? ` ${item.unit}` : ''}`;

function ItemState({ item }: { item: RunItemJson }) {
  if (item.failed) {
    const limits = describeLimits(item);
    return (
      <StatusTag tone="danger" icon={<AlertIcon className="size-4" />}>
        Failed: {shown(item)} is outside the limits{limits ? ` (${limits})` : ''}
      </StatusTag>
    );
  }
  if (item.done) return <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>Done</StatusTag>;
  return <StatusTag tone={item.required ? 'warning' : 'neutral'}>{item.required ? 'Required' : 'Optional'}</StatusTag>;
}

interface ItemRowProps {
  runId: string;
  item: RunItemJson;
  /** The server's now, from the page: "2 min ago" for every row off one clock. */
  now: Date;
  canMark: boolean;
}

/**
 * One item of a run: its control, limits and help, who marked it and when. A mark shows at once;
 * while it travels the row says so, and a refusal puts the item back with the server's reason.
 */
export function ItemRow({ runId, item, now, canMark }: ItemRowProps) {
  const mark = useMarkItem(runId, item.id);
  const clear = useClearItem(runId, item.id);
  const labelId = useId();
  const helpId = useId();
  const limits = item.kind === 'number' ? describeLimits(item) : null;
  const describedBy = item.help || limits ? helpId : undefined;
  const saving = mark.isPending || clear.isPending;
  const failure = mark.error ?? clear.error;

  const onMark = (value: MarkValue) => {
    clear.reset();
    mark.mutate({ value });
  };
  const onClear = () => {
    mark.reset();
    clear.mutate();
  };
  const retry = () => (mark.isError && mark.variables ? onMark(mark.variables.value) : onClear());

  const frame = item.failed ? 'border-danger bg-danger-soft' : item.done ? 'border-ok bg-ok-soft' : 'border-line bg-surface';
  const control = { item, disabled: !canMark, onMark, labelId, describedBy, onClear: canMark && item.value !== null ? onClear : undefined };
  return (
    <li className={`flex flex-col gap-3 rounded-2xl border-2 p-3 sm:p-4 ${frame}`}>
      {item.kind === 'tick' ? (
        <TickControl item={item} disabled={!canMark} label={item.label} describedBy={describedBy} onToggle={() => (item.value === true ? onClear() : onMark(true))} />
      ) : (
        <p id={labelId} className="text-xl font-bold break-words">
          {item.label}
        </p>
      )}
      {(item.help || limits) && (
        <div id={helpId} className="flex flex-col gap-0.5 text-ink-muted">
          {limits && <p className="font-semibold text-ink">Limits: {limits}</p>}
          {item.help && <p>{item.help}</p>}
        </div>
      )}
      {item.kind === 'number' && <NumberControl {...control} />}
      {item.kind === 'choice' && <ChoiceControl {...control} />}
      {item.kind === 'text' && <TextControl {...control} />}

      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <ItemState item={item} />
        {item.role && <StatusTag tone="neutral" icon={<UserIcon className="size-4" />}>{ROLE_LABELS[item.role]}</StatusTag>}
        {item.markedBy && item.markedAt && (
          <span className="text-ink-muted">
            <span className="font-semibold text-ink">{item.markedBy.name}</span> · <RelativeTime at={item.markedAt} now={now} />
          </span>
        )}
        <span aria-live="polite" className="text-ink-muted">
          {saving && (
            <span className="inline-flex items-center gap-1.5">
              <Spinner className="size-4" /> Saving…
            </span>
          )}
        </span>
        {canMark && item.kind === 'choice' && item.value !== null && (
          <Button variant="quiet" className="ml-auto" icon={<UndoIcon className="size-5" />} onClick={onClear}>
            Clear
            <ForItem label={item.label} />
          </Button>
        )}
      </div>
      {/* No field here writes a note yet, but the API takes one with a mark (the demo has some): it must not vanish. */}
      {item.note && (
        <p className="break-words">
          <span className="font-semibold">Note:</span> {item.note}
        </p>
      )}
      {failure && (
        <div role="alert" className="flex flex-wrap items-center gap-3 rounded-xl border-2 border-danger bg-surface p-3">
          <AlertIcon className="size-6 text-danger" />
          <p className="min-w-0 flex-1 basis-48 font-semibold">
            Not saved: {refusal(failure)}
          </p>
          {/* A refused value answers the same again; a lost connection may not. */}
          {!(isApiError(failure) && failure.status >= 400 && failure.status < 500) && (
            <Button variant="secondary" onClick={retry}>
              Try again
              <ForItem label={item.label} />
            </Button>
          )}
        </div>
      )}
    </li>
  );
}
