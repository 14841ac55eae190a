import type { BatteryJson, ReadingJson } from '@shared/schemas/batteries';
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
      {!reading.reliable && <NotRested />}
    </span>
  );
}

function NotRested() {
  return (
    <span className="inline-flex items-center gap-1 text-sm font-semibold whitespace-nowrap text-warning">
      <UnrestedMark /> not rested
    </span>
  );
}

/**
 * The fleet table's charge: the server's estimate of it now, and beneath it, small, the last
 * reading it started from when the two differ (a match since, or a charge), so a spent battery no
 * longer shows the 100 % it went in with. Marked "not rested" after that reading when it was not.
 */
export function EstimatedCharge({ battery }: { battery: Pick<BatteryJson, 'estimatedChargePercent' | 'latestReading'> }) {
  const { estimatedChargePercent: estimate, latestReading: reading } = battery;
  if (estimate === null) return reading ? <ChargeValue reading={reading} /> : <span className="text-ink-muted">No reading</span>;
  const sameAsRead = reading !== null && formatPercent(reading.stateOfChargePercent) === formatPercent(estimate);
  if (sameAsRead) return <ChargeValue reading={reading} />;
  return (
    <span className="flex flex-col">
      <span className="inline-flex items-baseline gap-x-1 whitespace-nowrap">
        <span className="text-lg font-bold tabular-nums">{formatPercent(estimate)}</span>
        <span className="text-sm text-ink-muted">
          <span aria-hidden="true">est.</span>
          <span className="sr-only">estimated,</span>
        </span>
      </span>
      <span className="inline-flex flex-wrap items-baseline gap-x-2 text-sm text-ink-muted">
        {reading ? (
          <>
            <span className="whitespace-nowrap">last read {formatPercent(reading.stateOfChargePercent)}</span>
            {!reading.reliable && <NotRested />}
          </>
        ) : (
          <span className="whitespace-nowrap">not read yet</span>
        )}
      </span>
    </span>
  );
}
