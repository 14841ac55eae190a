import type { ReadingJson } from '@shared/schemas/batteries';
import { formatPercent } from './battery-format';

/** The chart's mark for a reading taken without 4 h of rest: a hollow diamond, also used beside numbers. */
export function UnrestedMark({ className = 'size-3.5' }: { className?: string }) {
  return (
    <svg viewBox="0 0 12 12" aria-hidden="true" focusable="false" className={`shrink-0 ${className}`}>
      <path d="M6 1l5 5-5 5-5-5z" fill="none" stroke="currentColor" strokeWidth={1.8} />
    </svg>
  );
}

/**
 * A reading's state of charge. An unrested one is still shown (it is the best there is) with
 * "not rested" written beside it: its voltage, and so its charge, cannot be trusted.
 */
export function ChargeValue({ reading, size = 'md' }: { reading: ReadingJson; size?: 'md' | 'lg' }) {
  return (
    <span className="inline-flex flex-wrap items-baseline gap-x-2">
      <span className={`font-bold whitespace-nowrap tabular-nums ${size === 'lg' ? 'text-4xl' : 'text-lg'}`}>{formatPercent(reading.stateOfChargePercent)}</span>
      {!reading.reliable && (
        <span className="inline-flex items-center gap-1 text-sm font-semibold whitespace-nowrap text-warning">
          <UnrestedMark /> not rested
        </span>
      )}
    </span>
  );
}
