import type { ReactNode } from 'react';
import type { BatterySettings } from '@shared/domain/battery-state';
import type { BatteryJson } from '@shared/schemas/batteries';
import { RelativeTime } from '../../../components/ui/relative-time';
import { CHEMISTRY_WORDS, formatIncrease, formatMilliohm, formatPercent } from './battery-format';
import { BatteryStatusTag, HealthTag } from './battery-tags';
import { ChargeValue } from './charge-value';

function Fact({ term, children, wide = false }: { term: string; children: ReactNode; wide?: boolean }) {
  return (
    <div className={`flex flex-col gap-1 ${wide ? 'sm:col-span-2' : ''}`}>
      <dt className="text-sm font-semibold text-ink-muted">{term}</dt>
      <dd className="text-lg">{children}</dd>
    </div>
  );
}

const clock = new Intl.DateTimeFormat(undefined, { hour: 'numeric', minute: '2-digit' });

function thresholdsOf(settings: BatterySettings): string {
  const absolute = settings.replaceAboveMilliohm === null ? '' : ` or above ${formatMilliohm(settings.replaceAboveMilliohm)}`;
  return `Watch from +${settings.watchIncreasePercent} %, replace from +${settings.replaceIncreasePercent} %${absolute}.`;
}

/** Where the battery stands now: status, charge, health against its baseline, use, and what it is. */
export function BatteryFacts({ battery, settings, now, actions }: { battery: BatteryJson; settings: BatterySettings | undefined; now: Date; actions?: ReactNode }) {
  const { health, latestReading: latest, estimatedChargePercent: estimate, charging } = battery;
  return (
    <section aria-labelledby="battery-now-title" className="flex flex-col gap-4 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-5">
      <h2 id="battery-now-title" className="text-2xl font-bold">
        Status and health
      </h2>
      <dl className="grid gap-x-8 gap-y-4 sm:grid-cols-2">
        <Fact term="Status">
          <span className="flex flex-wrap items-center gap-2">
            <BatteryStatusTag status={battery.status} />
            {charging && (
              <span>
                bay {charging.bay}
                {charging.expectedEndAt && <>, done about {clock.format(new Date(charging.expectedEndAt))}</>}
              </span>
            )}
          </span>
        </Fact>
        <Fact term="State of charge">
          {/* The estimate (what the plan and readiness go by) and the last reading it started from. */}
          {estimate === null && !latest ? (
            <span className="text-ink-muted">No reading yet</span>
          ) : (
            <span className="flex flex-col gap-1">
              {estimate !== null && (
                <span>
                  About <strong className="text-4xl whitespace-nowrap tabular-nums">{formatPercent(estimate)}</strong> now (estimate)
                </span>
              )}
              {latest ? (
                <span className="flex flex-wrap items-baseline gap-x-2">
                  <span>Last reading</span>
                  <ChargeValue reading={latest} />
                  <span className="text-sm text-ink-muted">
                    taken <RelativeTime at={latest.takenAt} now={now} />
                  </span>
                </span>
              ) : (
                <span className="text-sm text-ink-muted">Not read yet: from its last charge</span>
              )}
            </span>
          )}
        </Fact>
        <Fact term="Health" wide>
          <span className="flex flex-col gap-1">
            <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <HealthTag status={health.status} />
              {latest && health.baselineMilliohm !== null && health.increasePercent !== null ? (
                <span className="tabular-nums">
                  <span className="whitespace-nowrap">{formatMilliohm(latest.internalResistanceMilliohm)}</span> now, baseline{' '}
                  <span className="whitespace-nowrap">{formatMilliohm(health.baselineMilliohm)}</span>:{' '}
                  <strong className="whitespace-nowrap">{formatIncrease(health.increasePercent)}</strong>
                </span>
              ) : (
                <span className="text-ink-muted">Its first readings make its baseline.</span>
              )}
            </span>
            {settings && <span className="text-sm text-ink-muted">{thresholdsOf(settings)}</span>}
          </span>
        </Fact>
        <Fact term="Uses this event">
          <span className="tabular-nums">{battery.usesThisEvent}</span>
          {battery.lastUsedAt && (
            <span className="text-ink-muted">
              , last <RelativeTime at={battery.lastUsedAt} now={now} />
            </span>
          )}
        </Fact>
        <Fact term="Battery">
          {CHEMISTRY_WORDS[battery.chemistry]}, {battery.nominalCapacityAh} Ah, in service since {battery.yearInService}
        </Fact>
        {battery.notes && (
          <Fact term="Notes" wide>
            <span className="break-words">{battery.notes}</span>
          </Fact>
        )}
      </dl>
      {actions}
    </section>
  );
}
