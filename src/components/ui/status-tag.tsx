import type { ReactNode } from 'react';

type Tone = 'ok' | 'warning' | 'danger' | 'accent' | 'neutral';

const tones: Record<Tone, string> = {
  ok: 'bg-ok-soft text-ok',
  warning: 'bg-warning-soft text-warning',
  danger: 'bg-danger-soft text-danger',
  accent: 'bg-accent-soft text-accent-ink',
  neutral: 'bg-sunken text-ink-muted',
};

/** A state shown as icon + word + colour, never by colour alone. */
export function StatusTag({ tone, icon, children }: { tone: Tone; icon?: ReactNode; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-full px-3 py-1 text-sm font-semibold ${tones[tone]}`}>
      {icon}
      {children}
    </span>
  );
}
