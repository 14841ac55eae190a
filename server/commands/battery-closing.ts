import type { Transaction } from 'sequelize';
import { BatteryUse, ChargingSession } from '../models';
import { emitToEvent } from '../realtime/broadcast';

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

/**
 * Ends whatever the records say the battery is doing at `at` (its charge, its time in the robot)
 * before a status set by hand, so that the status and the records never disagree; a use it
 * ends is announced to that use's event after the commit.
 */
export async function endOpenRecords(batteryId: string, userId: string, at: Date, transaction: Transaction) {
  await closeOpenCharging(batteryId, userId, at, transaction);
  const use = await closeOpenUse(batteryId, userId, at, transaction);
  if (use) transaction.afterCommit(() => emitToEvent(use.eventId, 'batteries:used', { eventId: use.eventId, batteryId, matchId: use.matchId }));
}
