import type { CreateBatteryInput } from '../../shared/schemas/batteries';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Battery, Team } from '../models';
import { presentBattery } from '../presenters/battery';
import { emitToTeam } from '../realtime/broadcast';
import {assertLabelFree } from './battery-guards';

/**
 * Adds a battery to the fleet, ready for use. Resending the same `id` answers the battery the
 * first call made; an id in use by another team answers 409 `id_taken`, a label the team already
 * painted 409 `label_taken`.
 */
export async function createBattery(teamId: string, { id, ...fields }: CreateBatteryInput) {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    if (id) {
      const existing = await Battery.findByPk(id, { transaction });
      if (existing?.teamId === teamId) return { battery: await presentBattery(existing, transaction), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    await assertLabelFree(teamId, fields.label, null, transaction);
    const battery = await Battery.create({ id, teamId, ...fields, status: 'ready' }, { transaction });
    transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: battery.id }));
    return { battery: await presentBattery(battery, transaction), created: true };
  });
}
