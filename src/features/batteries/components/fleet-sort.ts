import { BATTERY_STATUSES, HEALTH_STATUSES } from '@shared/domain/battery-state';
import type { BatteryJson } from '@shared/schemas/batteries';

export const FLEET_COLUMNS = ['label', 'status', 'charge', 'resistance', 'health', 'lastUsed', 'uses'] as const;
export type FleetColumn = (typeof FLEET_COLUMNS)[number];

export interface FleetSort {
  column: FleetColumn;
  direction: 'ascending' | 'descending';
}

export const DEFAULT_FLEET_SORT: FleetSort = { column: 'label', direction: 'ascending' };

// Labels like "2027-10" and "2027-9" sort as a person counts.
const compareLabels = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' }).compare;

/** What each column sorts by; null for "nothing to say" (no reading, never used). Charge is the estimate now, as shown. */
const SORT_KEYS: Record<FleetColumn, (battery: BatteryJson) => number | string | null> = {
  label: (battery) => battery.label,
  status: (battery) => BATTERY_STATUSES.indexOf(battery.status),
  charge: (battery) => battery.estimatedChargePercent,
  resistance: (battery) => battery.latestReading?.internalResistanceMilliohm ?? null,
  health: (battery) => HEALTH_STATUSES.indexOf(battery.health.status),
  lastUsed: (battery) => (battery.lastUsedAt ? Date.parse(battery.lastUsedAt) : null),
  uses: (battery) => battery.usesThisEvent,
};

function compareKeys(a: number | string, b: number | string): number {
  return typeof a === 'string' && typeof b === 'string' ? compareLabels(a, b) : (a as number) - (b as number);
}

/** The fleet in the chosen order; blanks always last, ties by label (then id), so the order never jumps. */
export function sortFleet(batteries: readonly BatteryJson[], sort: FleetSort): BatteryJson[] {
  const key = SORT_KEYS[sort.column];
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return [...batteries].sort((a, b) => {
    const ka = key(a);
    const kb = key(b);
    if (ka === null || kb === null) {
      if (ka !== kb) return ka === null ? 1 : -1;
    } else {
      const order = compareKeys(ka, kb);
      if (order !== 0) return sign * order;
    }
    return compareLabels(a.label, b.label) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
  });
}

/** A header tap: the same column flips its direction, another column starts ascending. */
export function nextFleetSort(current: FleetSort, column: FleetColumn): FleetSort {
  if (current.column !== column) return { column, direction: 'ascending' };
  return { column, direction: current.direction === 'ascending' ? 'descending' : 'ascending' };
}
