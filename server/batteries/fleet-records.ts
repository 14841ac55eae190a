import type { Transaction } from 'sequelize';
import { BatteryReading, BatteryUse, ChargingSession } from '../models';

export interface FleetRecords {
  /** Oldest first. */
  readingsOf: (batteryId: string) => BatteryReading[];
  /** Oldest first. */
  usesOf: (batteryId: string) => BatteryUse[];
  /** Oldest first. */
  sessionsOf: (batteryId: string) => ChargingSession[];
}

function byBattery<T extends { batteryId: string }>(rows: readonly T[]) {
  const map = new Map<string, T[]>();
  for (const row of rows) {
    const list = map.get(row.batteryId);
    if (list) list.push(row);
    else map.set(row.batteryId, [row]);
  }
  return (batteryId: string) => map.get(batteryId) ?? [];
}

/** Every reading, use and charging session of these batteries, in three queries. */
export async function fleetRecords(batteryIds: readonly string[], transaction?: Transaction): Promise<FleetRecords> {
  if (batteryIds.length === 0) return { readingsOf: () => [], usesOf: () => [], sessionsOf: () => [] };
  const where = { batteryId: [...batteryIds] };
  // One after the other: queries of one transaction share its connection.
  const readings = await BatteryReading.findAll({ where, order: [['takenAt', 'ASC'], ['createdAt', 'ASC'], ['id', 'ASC']], transaction });
  const uses = await BatteryUse.findAll({ where, order: [['installedAt', 'ASC'], ['id', 'ASC']], transaction });
  const sessions = await ChargingSession.findAll({ where, order: [['startedAt', 'ASC'], ['id', 'ASC']], transaction });
  return { readingsOf: byBattery(readings), usesOf: byBattery(uses), sessionsOf: byBattery(sessions) };
}
