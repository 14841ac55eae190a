import type { RepairSeverity, RepairUrgency } from '@shared/domain/repair-urgency';
import { AlertIcon, ClockIcon } from '../../../components/ui/icons';
import { urgencyWords, workLeftWords } from './repair-words';

const TONES = {
  danger: 'bg-danger text-on-danger font-bold',
  warning: 'bg-warning-soft text-warning font-bold',
  neutral: 'text-ink-muted font-semibold',
} as const;

/** Minutes left to the queue call, with the work still estimated; loud only when the ticket is late. */
export function UrgencyLine({ urgency, severity, done, withWorkLeft = true }: { urgency: RepairUrgency; severity: RepairSeverity; done: boolean; withWorkLeft?: boolean }) {
  const words = urgencyWords(urgency, severity, done);
  if (!words) return null;
  const workLeft = withWorkLeft ? workLeftWords(urgency) : null;
  const Icon = words.tone === 'neutral' ? ClockIcon : AlertIcon;
  return (
    <p className="flex flex-col gap-0.5">
      <span className={`inline-flex items-start gap-1.5 self-start rounded-lg tabular-nums ${words.tone === 'neutral' ? '' : 'px-2 py-0.5'} ${TONES[words.tone]}`}>
        <Icon className="mt-0.5 size-4" strokeWidth={2.5} />
        {words.text}
      </span>
      {workLeft && <span className="text-sm text-ink-muted tabular-nums">{workLeft}</span>}
    </p>
  );
}
