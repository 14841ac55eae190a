import { useState } from 'react';
import type { BatteryJson, ChargerJson } from '@shared/schemas/batteries';
import { Button } from '../../../../components/ui/button';
import { PlugIcon } from '../../../../components/ui/action-icons';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { PlusIcon } from '../../../../components/ui/icons';
import { Loading } from '../../../../components/ui/loading';
import { AirIcon } from '../../../../components/ui/safety-icons';
import { useCan } from '../../../../lib/authorization';
import { useServerNow } from '../../../../lib/server-clock';
import { useBatteries } from '../../api/get-batteries';
import { useChargers } from '../../api/get-chargers';
import { AddChargerForm } from './add-charger-form';
import { batteryOnBay, canGoOnCharger, deviceTimeZone } from './bays';
import { BayRow } from './bay-row';

/**
 * The charging caution (REFERENCES §6) where batteries go on and off the chargers. One line: the
 * page's full cautions (BatteryCautions) stand above, and a second copy of them would be skimmed.
 */
function ChargingCaution() {
  return (
    <p className="flex items-start gap-2.5 rounded-xl border-2 border-warning bg-warning-soft p-3">
      <AirIcon className="mt-0.5 size-6 text-warning" />
      <span>
        <strong>Charging gives off hydrogen:</strong> keep the chargers ventilated, with no sparks or flames near them. Local codes, the event&apos;s rules and
        the battery maker&apos;s instructions come first.
      </span>
    </p>
  );
}

function ChargerCard({ charger, batteries, canManage, timeZone, now }: { charger: ChargerJson; batteries: BatteryJson[]; canManage: boolean; timeZone: string; now: Date }) {
  const candidates = batteries.filter(canGoOnCharger);
  const bays = Array.from({ length: charger.bays }, (_, index) => index + 1);
  return (
    <article aria-labelledby={`charger-${charger.id}`} className="rounded-2xl border border-line bg-surface px-4 pt-4 shadow-sm sm:px-5">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <h3 id={`charger-${charger.id}`} className="flex items-center gap-2 text-xl font-bold">
          <PlugIcon className="size-6 text-accent-ink" />
          {charger.name}
        </h3>
        <p className="text-ink-muted tabular-nums">
          {charger.bays} {charger.bays === 1 ? 'bay' : 'bays'} · {charger.currentPerBayA} A each
        </p>
      </div>
      <ul className="divide-y divide-line">
        {bays.map((bay) => (
          <BayRow
            key={bay}
            charger={charger}
            bay={bay}
            battery={batteryOnBay(batteries, charger.id, bay)}
            candidates={candidates}
            canManage={canManage}
            timeZone={timeZone}
            now={now}
          />
        ))}
      </ul>
    </article>
  );
}

/**
 * Every charger and bay: what is on each, since when and when it should be full; battery
 * handlers put batteries on and take them off, and add chargers. `timeZone` is the event's (the
 * tablet's own when there is no current event): chargers belong to the team, not to an event.
 */
export function ChargerBays({ timeZone = deviceTimeZone() }: { timeZone?: string }) {
  const chargers = useChargers();
  const batteries = useBatteries();
  const canManage = useCan('batteries:manage');
  const [adding, setAdding] = useState(false);
  const now = useServerNow(1000);

  return (
    <section aria-labelledby="chargers-title" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="chargers-title" className="text-2xl font-bold">
          Chargers
        </h2>
        {canManage && !adding && (
          <Button variant="secondary" icon={<PlusIcon />} onClick={() => setAdding(true)}>
            Add a charger
          </Button>
        )}
      </div>
      <ChargingCaution />
      {adding && <AddChargerForm onDone={() => setAdding(false)} />}
      {(chargers.isPending || batteries.isPending) && <Loading label="Loading the chargers" />}
      {chargers.isError && <ErrorNotice title="Could not load the chargers" error={chargers.error} onRetry={() => chargers.refetch()} retrying={chargers.isFetching} />}
      {batteries.isError && <ErrorNotice title="Could not load the batteries" error={batteries.error} onRetry={() => batteries.refetch()} retrying={batteries.isFetching} />}
      {chargers.isSuccess && batteries.isSuccess && (
        chargers.data.length === 0 ? (
          <p className="text-lg text-ink-muted">
            No charger yet{canManage ? ': add one with its number of bays and the current per bay.' : '. A battery handler adds them.'}
          </p>
        ) : (
          <div className="grid gap-4 xl:grid-cols-2">
            {chargers.data.map((charger) => (
              <ChargerCard key={charger.id} charger={charger} batteries={batteries.data} canManage={canManage} timeZone={timeZone} now={now} />
            ))}
          </div>
        )
      )}
    </section>
  );
}
