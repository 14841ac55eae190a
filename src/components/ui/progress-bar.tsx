type Tone = 'accent' | 'ok' | 'warning' | 'danger';

const fills: Record<Tone, string> = {
  accent: 'bg-accent',
  ok: 'bg-ok',
  warning: 'bg-warning',
  danger: 'bg-danger',
};

/** A bar for "7 of 9 done"; the words beside it carry the numbers, the bar only the glance. */
export function ProgressBar({ value, max, label, tone = 'accent', className = '' }: {
  value: number;
  max: number;
  /** What is counted, for screen readers, e.g. "Required items done". */
  label: string;
  tone?: Tone;
  className?: string;
}) {
  const percent = max > 0 ? Math.min(100, Math.round((value / max) * 100)) : 100;
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={max}
      aria-valuenow={value}
      aria-valuetext={`${value} of ${max}`}
      className={`h-3 w-full overflow-hidden rounded-full border border-line-strong bg-sunken ${className}`}
    >
      <div className={`h-full rounded-full transition-[width] ${fills[tone]}`} style={{ width: `${percent}%` }} />
    </div>
  );
}
