import { TIMELINE_DEFAULTS } from '../../shared/domain/timeline';
import type { BatterySettings } from '../../shared/domain/battery-state';
import type { Battery, Event } from '../models';
import { drawPercentOf, estimateChargePercent, useDrops } from './charge-estimate';
import type { FleetRecords } from './fleet-records';
import { socIn } from './settings';

/**
 * Charge one match takes at the event, learned from the fleet's uses there (readings before and
 * after), else modelled for the event's match length at the median capacity of the batteries in service.
 */
export function fleetDraw({ batteries, records, event, settings }: { batteries: readonly Battery[]; records: FleetRecords; event: Event | null; settings: BatterySettings }) {
  const socOf = socIn(settings);
  const drops = batteries.flatMap((battery) =>
    useDrops({ readings: records.readingsOf(battery.id), uses: records.usesOf(battery.id).filter((use) => use.eventId === event?.id) }, socOf),
  );
  const inService = batteries.filter((battery) => battery.status !== 'retired');
  return drawPercentOf(
    drops,
    inService.map((battery) => battery.nominalCapacityAh),
    event?.matchLengthSeconds ?? TIMELINE_DEFAULTS.matchLengthSeconds,
    settings,
  );
}

/** The battery's estimated charge at `at` (see charge-estimate.ts). */
export const chargeOf = (battery: Battery, records: FleetRecords, { at, drawPercent, settings }: { at: Date; drawPercent: number; settings: BatterySettings }) =>
  estimateChargePercent(
    { readings: records.readingsOf(battery.id), uses: records.usesOf(battery.id), sessions: records.sessionsOf(battery.id) },
    { at, drawPercent, socOf: socIn(settings) },
  );
