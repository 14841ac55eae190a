import type { EndUseInput } from '../../shared/schemas/batteries';
import { inTransaction } from '../db/transaction';
import { notFound } from '../errors';
import { Battery, BatteryUse, Team } from '../models';
import { presentUse } from '../presenters/battery';
import { emitToEvent, emitToTeam } from '../realtime/broadcast';
import { assertInstant } from './input-guards';

/**
 * Records a battery taken out of the robot (it is then `spent`). Sent again for a use already
 * ended, it corrects the time and leaves the battery's status alone: it may be charging by now.
 */
export async function removeBattery(teamId: string, userId: string, useId: string, { removedAt }: EndUseInput) {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const use = await BatteryUse.findByPk(useId, { transaction });
    const battery = use ? await Battery.findOne({ where: { id: use.batteryId, teamId }, transaction }) : null;
    if (!use || !battery) throw notFound('Battery use');
    const at = new Date(removedAt);
    assertInstant('removedAt', at, { notBefore: use.installedAt, what: 'it went in' });
    const wasOpen = use.removedAt === null;
    await use.update({ removedAt: at, removedById: userId }, { transaction });
    if (wasOpen && battery.status === 'in_robot') await battery.update({ status: 'spent' }, { transaction });
    transaction.afterCommit(() => {
      emitToEvent(use.eventId, 'batteries:used', { eventId: use.eventId, batteryId: battery.id, matchId: use.matchId });
      // The use may belong to an event that is no longer current: the fleet lists hear it anyway.
      emitToTeam(teamId, 'batteries:changed', { id: battery.id });
    });
    return presentUse(use);
  });
}
