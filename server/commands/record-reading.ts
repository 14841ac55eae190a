import type { Transaction } from 'sequelize';
import type { CreatedReadingJson, ReadingInput } from '../../shared/schemas/batteries';
import { settingsOf } from '../batteries/settings';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Battery, BatteryReading, BatteryUse, User } from '../models';
import { healthOfReadings, presentReading } from '../presenters/battery';
import { emitToTeam } from '../realtime/broadcast';
import { assertInstant, invalidField } from './input-guards';

/**
 * Logs what the analyzer showed, and answers it with its state of charge and the battery's health
 * after it. Resending the same `id` answers the reading the first call made.
 */
export async function recordReading(teamId: string, userId: string, batteryId: string, input: ReadingInput) {
  return inTransaction(async (transaction) => {
    // The battery's row lock puts a resent reading behind the first one.
    const battery = await Battery.ofTeam(teamId, batteryId, { transaction, lock: true });
    if (input.id) {
      const existing = await BatteryReading.findByPk(input.id, { transaction });
      if (existing?.batteryId === battery.id) return { reading: await answerOf(battery, existing, transaction), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const takenAt = input.takenAt ? new Date(input.takenAt) : new Date();
    assertInstant('takenAt', takenAt);
    if (input.useId && (await BatteryUse.count({ where: { id: input.useId, batteryId: battery.id }, transaction })) === 0) {
      throw invalidField('useId', 'Not a use of this battery');
    }
    const reading = await BatteryReading.create(
      {
        id: input.id,
        batteryId: battery.id,
        // The columns keep the analyzer's digits, no more (see models/decimal.ts).
        voltage: input.voltage,
        internalResistanceMilliohm: input.internalResistanceMilliohm,
        rested: input.rested,
        restedMinutes: input.restedMinutes,
        temperatureC: input.temperatureC,
        takenAt,
        takenById: userId,
        useId: input.useId ?? null,
      },
      { transaction },
    );
    transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: battery.id }, { withScreens: true }));
    return { reading: await answerOf(battery, reading, transaction), created: true };
  });
}

/** The reading as stored (the columns keep the analyzer's digits), with the battery's health after it. */
async function answerOf(battery: Battery, reading: BatteryReading, transaction: Transaction): Promise<CreatedReadingJson> {
  const settings = await settingsOf(battery.teamId, transaction);
  const readings = await BatteryReading.findAll({
    where: { batteryId: battery.id },
    order: [['takenAt', 'ASC'], ['createdAt', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  const taker = await User.findByPk(reading.takenById, { attributes: ['id', 'name'], transaction, rejectOnEmpty: true });
  const stored = readings.find((row) => row.id === reading.id) ?? reading;
  return { ...presentReading(stored, new Map([[taker.id, { id: taker.id, name: taker.name }]]), settings), health: healthOfReadings(readings, settings) };
}
