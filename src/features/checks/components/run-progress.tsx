import type { RunSummaryJson } from '@shared/schemas/checks';
import { AlertIcon, CheckIcon } from '../../../components/ui/icons';
import { ProgressBar } from '../../../components/ui/progress-bar';

/** Done / required with a bar; failed numbers called out, since they never count as done. */
export function RunProgress({ run, compact = false }: { run: Pick<RunSummaryJson, 'progress' | 'complete'>; compact?: boolean }) {
  const { required, requiredDone, failed, total, done } = run.progress;
  const optional = total - required;
  const optionalDone = done - requiredDone;
  return (
    <div className="flex flex-col gap-1.5">
      <div className={`flex flex-wrap items-baseline gap-x-3 gap-y-1 ${compact ? 'text-base' : 'text-lg'}`}>
        <p className="font-bold tabular-nums">
          {requiredDone} of {required} required done
        </p>
        {optional > 0 && (
          <p className="text-ink-muted tabular-nums">
            {optionalDone} of {optional} optional
          </p>
        )}
        {failed > 0 && (
          <p className="inline-flex items-center gap-1 font-bold text-danger">
            <AlertIcon className="size-5" /> {failed} failed
          </p>
        )}
        {run.complete && (
          <p className="inline-flex items-center gap-1 font-bold text-ok">
            <CheckIcon className="size-5" /> Complete
          </p>
        )}
      </div>
      <ProgressBar value={requiredDone} max={required} label="Required items done" tone={failed > 0 ? 'danger' : run.complete ? 'ok' : 'accent'} />
    </div>
  );
}
