import type { PlanWarning, PlanWarningCode } from '@shared/domain/battery-plan';
import { StopIcon } from '../battery-icons';
import { AlertIcon } from '../../../../components/ui/icons';
import { formatZonedTime } from '../../../../lib/dates';

/** What went wrong, in a word or three: the card leads with it, the plan's message follows with the fix. */
export const WARNING_WORDS: Record<PlanWarningCode, string> = {
  no_battery_ready: 'No battery ready',
  reused_previous: 'Same battery again',
  only_worn_battery: 'Only a worn battery',
};

/** No battery at all is a fault; the other two are a risk the pit can live with. */
export const isFault = (warning: PlanWarning) => warning.code === 'no_battery_ready';

export function WarningIcon({ warning, className = 'size-6' }: { warning: PlanWarning; className?: string }) {
  return isFault(warning) ? <StopIcon className={className} strokeWidth={2.5} /> : <AlertIcon className={className} />;
}

/** "12 min short": how long after the queue call a battery would be ready. */
export const shortfallText = (minutes: number) => `${Math.ceil(minutes)} min short`;

/** "12 min short, ready at 14:32": the numbers of a warning, empty when it has none. */
export function warningNumbers(warning: PlanWarning, timeZone: string): string {
  const parts = [
    ...(warning.shortfallMinutes > 0 ? [shortfallText(warning.shortfallMinutes)] : []),
    ...(warning.readyAt ? [`ready at ${formatZonedTime(new Date(warning.readyAt), timeZone, false)}`] : []),
  ];
  return parts.join(', ');
}

/**
 * One warning, loudly: icon + word + the match + the shortfall + what would fix it. A fault is
 * solid red, a risk amber; the word says which, so colour is never the only signal.
 */
export function PlanWarningCard({ warning, matchLabel, timeZone }: { warning: PlanWarning; matchLabel: string; timeZone: string }) {
  const fault = isFault(warning);
  const numbers = warningNumbers(warning, timeZone);
  return (
    <div
      data-code={warning.code}
      className={`flex items-start gap-3 rounded-xl border-2 p-4 ${fault ? 'border-danger bg-danger text-on-danger' : 'border-warning bg-warning-soft text-ink'}`}
    >
      <WarningIcon warning={warning} className={`mt-0.5 size-8 ${fault ? '' : 'text-warning'}`} />
      <div className="min-w-0 flex-1">
        <p className="flex flex-wrap items-baseline gap-x-3 text-xl font-extrabold">
          <span>
            {WARNING_WORDS[warning.code]} · {matchLabel}
          </span>
          {numbers && <span className="tabular-nums">{numbers}</span>}
        </p>
        <p className="text-lg">{warning.message}</p>
      </div>
    </div>
  );
}
