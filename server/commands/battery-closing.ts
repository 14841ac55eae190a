import type { Transaction } from 'sequelize';
import { BatteryUse, ChargingSession } from '../models';

/** Takes the battery off its charger at `at`, if it is on one; answers whether it was. */
export async function closeOpenCharging(batteryId: string, userId: string, at: Date, transaction: Transaction) {
  const [closed] = await ChargingSession.update({ endedAt: at, endedById: userId }, { where: { batteryId, endedAt: null }, transaction });
  return closed > 0;
}

/** Records the battery out of the robot at `at`, if it is in; answers the closed use. */
export async function closeOpenUse(batteryId: string, userId: string, at: Date, transaction: Transaction) {
  const use = await BatteryUse.findOne({ where: { batteryId, removedAt: null }, transaction });
  if (use) await use.update({ removedAt: at, removedById: userId }, { transaction });
  return use;
}
