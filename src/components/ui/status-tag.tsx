import type { ReactNode } from 'react';

type Tone = 'ok' | 'warning' | 'danger' | 'accent' | 'neutral';

const tones: Record<Tone, string> = {
  ok: 'bg-ok-soft text-ok',
  warning: 'bg-warning-soft text-warning',
  danger: 'bg-danger-soft text-danger',
  accent: 'bg-accent-soft text-accent-ink',
  neutral: 'bg-sunken text-ink-muted',
};

/** A state shown as icon + word + colour, never by colour alone; `large` where it is the first thing read at arm's length. */
export function StatusTag({ tone, icon, large = false, children }: { tone: Tone; icon?: ReactNode; large?: boolean; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-full px-3 font-semibold ${large ? 'py-1.5 text-base' : 'py-1 text-sm'} ${tones[tone]}`}>
      {icon}
      {children}
    </span>
  );
}
