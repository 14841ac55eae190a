import type { BatteryStatus } from '../../shared/domain/battery-state';
import type { UpdateBatteryInput } from '../../shared/schemas/batteries';
import { inTransaction } from '../db/transaction';
import { stale } from '../errors';
import { Battery, Team } from '../models';
import { presentBattery } from '../presenters/battery';
import { emitToTeam } from '../realtime/broadcast';
import { endOpenRecords } from './battery-closing';
import { assertLabelFree } from './battery-guards';
import { invalidField } from './input-guards';

// These two need a match or a bay: installing and charging set them, with their records.
const SET_BY_RECORDS: readonly BatteryStatus[] = ['in_robot', 'charging'];

/**
 * Edits a battery, refusing a stale `version`. A status set by hand (`retired` retires it) ends
 * what the records say it is doing: it leaves the robot or its charger now, so that the status
 * and the records never disagree.
 */
export async function updateBattery(teamId: string, userId: string, id: string, { version, status, ...fields }: UpdateBatteryInput) {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const battery = await Battery.ofTeam(teamId, id, { transaction });
    if (version !== undefined && version !== battery.version) throw stale(await presentBattery(battery, transaction));
    if (fields.label !== undefined && fields.label !== battery.label) await assertLabelFree(teamId, fields.label, battery.id, transaction);
    battery.set(fields);
    if (status !== undefined && status !== battery.status) {
      if (SET_BY_RECORDS.includes(status)) {
        throw invalidField('status', status === 'in_robot' ? 'Install it for a match to put it in the robot' : 'Put it on a charger bay to charge it');
      }
      await endOpenRecords(battery.id, userId, new Date(), transaction);
      battery.status = status;
    }
    if (battery.changed()) {
      await battery.save({ transaction });
      transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: battery.id }, { withScreens: true }));
    }
    return presentBattery(battery, transaction);
  });
}
