import type { PlanCharging } from '@shared/domain/battery-plan';
import type { ChargerJson } from '@shared/schemas/batteries';
import { formatZonedTime } from '../../../../lib/dates';
import { bayName, bayOfPlanNumber } from '../chargers/bays';

/** When each battery charges, bay by bay, in the event's time zone. */
export function ChargingSchedule({ charging, chargers, labelOf, timeZone }: {
  charging: readonly PlanCharging[];
  chargers: readonly ChargerJson[];
  labelOf: (batteryId: string) => string;
  timeZone: string;
}) {
  const time = (at: string) => formatZonedTime(new Date(at), timeZone, false);
  const bays = [...new Set(charging.map((entry) => entry.bay))].sort((a, b) => a - b);
  return (
    <section aria-labelledby="charging-schedule-title" className="flex flex-col gap-2">
      <h3 id="charging-schedule-title" className="text-xl font-bold">
        Charging
      </h3>
      {bays.length === 0 ? (
        <p className="text-ink-muted">Nothing needs charging for the matches left.</p>
      ) : (
        <ul className="divide-y divide-line rounded-xl border border-line">
          {bays.map((planBay) => {
            const place = bayOfPlanNumber(chargers, planBay);
            const entries = charging.filter((entry) => entry.bay === planBay).sort((a, b) => Date.parse(a.from) - Date.parse(b.from));
            return (
              <li key={planBay} className="grid gap-x-4 gap-y-1 px-4 py-3 sm:grid-cols-[12rem_1fr]">
                <p className="font-semibold text-ink-muted">{place ? bayName(place.charger, place.bay) : `Bay ${planBay}`}</p>
                <ol className="flex flex-wrap gap-x-6 gap-y-1">
                  {entries.map((entry) => (
                    <li key={`${entry.batteryId}-${entry.from}`} className="text-lg tabular-nums">
                      <span className="font-extrabold">{labelOf(entry.batteryId)}</span> {time(entry.from)} → {time(entry.to)}
                    </li>
                  ))}
                </ol>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
