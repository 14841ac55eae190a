import type { BatteryJson, ChargerJson } from '@shared/schemas/batteries';

/** The tablet's own zone, for a page shown without an event (chargers belong to the team, not to an event). */
export const deviceTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** "Bench charger · bay 2"; a one-bay charger is just its name. */
export const bayName = (charger: ChargerJson, bay: number) => (charger.bays === 1 ? charger.name : `${charger.name} · bay ${bay}`);

/**
 * The plan numbers bays 1, 2, 3… across the team's chargers in the order the chargers come
 * (shared/domain/battery-plan.ts): that number → the charger and its own bay.
 */
export function bayOfPlanNumber(chargers: readonly ChargerJson[], planBay: number): { charger: ChargerJson; bay: number } | null {
  let first = 1;
  for (const charger of chargers) {
    if (planBay < first + charger.bays) return { charger, bay: planBay - first + 1 };
    first += charger.bays;
  }
  return null;
}

/** The battery on a charger's bay, from the batteries' open charging sessions. */
export function batteryOnBay(batteries: readonly BatteryJson[], chargerId: string, bay: number): BatteryJson | undefined {
  return batteries.find((battery) => battery.charging?.chargerId === chargerId && battery.charging.bay === bay);
}

/** What may go on a charger: not retired, not already charging, not in the robot. */
export const canGoOnCharger = (battery: BatteryJson) => battery.status !== 'retired' && battery.status !== 'charging' && battery.status !== 'in_robot';
