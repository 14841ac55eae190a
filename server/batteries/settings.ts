import type { Transaction } from 'sequelize';
import { BATTERY_DEFAULTS, SOC_TABLES, stateOfChargePercent, type BatterySettings } from '../../shared/domain/battery-state';
import { BatterySetting } from '../models';

/** The team's battery settings: its row, or BATTERY_DEFAULTS while it has none. */
export async function settingsOf(teamId: string, transaction?: Transaction): Promise<BatterySettings> {
  const row = await BatterySetting.findByPk(teamId, { transaction });
  if (!row) return { ...BATTERY_DEFAULTS };
  return {
    socTable: row.socTable,
    watchIncreasePercent: row.watchIncreasePercent,
    replaceIncreasePercent: row.replaceIncreasePercent,
    replaceAboveMilliohm: row.replaceAboveMilliohm,
    baselineReadings: row.baselineReadings,
    minimumStartChargePercent: row.minimumStartChargePercent,
    chargeFactor: row.chargeFactor,
    chargeTailMinutes: row.chargeTailMinutes,
    peukertExponent: row.peukertExponent,
    matchAverageCurrentA: row.matchAverageCurrentA,
  };
}

/** State of charge of a voltage in the team's table, unrounded: computations use it as it is. */
export const socIn = (settings: BatterySettings) => (volts: number) => stateOfChargePercent(volts, SOC_TABLES[settings.socTable]);
