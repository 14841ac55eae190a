import { useEffect, useRef } from 'react';
import type { CreatedReadingJson } from '@shared/schemas/batteries';
import { CheckIcon } from '../../../components/ui/icons';
import { formatIncrease, formatMilliohm, formatVolts } from './battery-format';
import { HealthTag } from './battery-tags';
import { ChargeValue } from './charge-value';

/** What a reading just logged says, the moment the server answers: its charge and the battery's health. */
export function ReadingResult({ reading, label }: { reading: CreatedReadingJson; label: string }) {
  const { health } = reading;
  const ref = useRef<HTMLDivElement>(null);
  // It appears just above the button that was tapped, where the tab bar of a phone or a portrait
  // tablet may hide it: bring each new answer to the middle of the screen.
  useEffect(() => ref.current?.scrollIntoView({ block: 'center' }), [reading.id]);
  return (
    <div ref={ref} role="status" className="flex flex-col gap-3 rounded-xl border-2 border-ok bg-ok-soft p-4 text-ink">
      <p className="flex items-center gap-2 text-lg font-bold">
        <CheckIcon className="size-6 text-ok" strokeWidth={3} />
        Logged for battery {label}: {formatVolts(reading.voltage)}, {formatMilliohm(reading.internalResistanceMilliohm)}
      </p>
      <div className="flex flex-wrap items-start gap-x-8 gap-y-3">
        <div className="flex flex-col">
          <span className="text-sm font-semibold text-ink-muted">State of charge</span>
          <ChargeValue reading={reading} size="lg" />
        </div>
        <div className="flex flex-col gap-1">
          <span className="text-sm font-semibold text-ink-muted">Health</span>
          <span className="flex flex-wrap items-center gap-2">
            <HealthTag status={health.status} />
            {health.increasePercent !== null && health.baselineMilliohm !== null && (
              <span className="tabular-nums">
                <span className="whitespace-nowrap">{formatIncrease(health.increasePercent)}</span> over its{' '}
                <span className="whitespace-nowrap">{formatMilliohm(health.baselineMilliohm)}</span> baseline
              </span>
            )}
          </span>
        </div>
      </div>
    </div>
  );
}
