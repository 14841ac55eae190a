import { rechargeMinutes } from '../../shared/domain/battery-state';
import type { StartChargingInput } from '../../shared/schemas/batteries';
import { chargeOf, fleetDraw } from '../batteries/fleet-charge';
import { fleetRecords } from '../batteries/fleet-records';
import { settingsOf } from '../batteries/settings';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Battery, BatteryUse, Charger, ChargingSession, Event, Team } from '../models';
import { presentChargingSession } from '../presenters/battery';
import { emitToTeam } from '../realtime/broadcast';
import { invalidField } from './input-guards';

const MINUTE_MS = 60_000;

/**
 * Puts a battery on a charger bay: it is `charging` until the session ends. The expected end is
 * REFERENCES §4's recharge time for the charge it is missing now (taken as empty when nothing
 * says) at the bay's current. A bay charges one battery; a battery charges on one bay.
 */
export async function startCharging(teamId: string, userId: string, batteryId: string, { id, chargerId, bay }: StartChargingInput) {
  return inTransaction(async (transaction) => {
    const team = await Team.lockRow(teamId, transaction);
    const battery = await Battery.ofTeam(teamId, batteryId, { transaction });
    if (id) {
      // A resend is for the same battery: an id reused for another one must not answer that one's session.
      const existing = await ChargingSession.findByPk(id, { transaction });
      if (existing?.batteryId === battery.id) return { session: presentChargingSession(existing), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const charger = await Charger.ofTeam(teamId, chargerId, { transaction });
    if (bay > charger.bays) throw invalidField('bay', `${charger.name} has ${charger.bays === 1 ? '1 bay' : `bays 1 to ${charger.bays}`}`);
    if (battery.status === 'retired') throw new HttpError(409, 'retired', `Battery ${battery.label} is retired: put it back in service before charging it`);
    if ((await BatteryUse.count({ where: { batteryId: battery.id, removedAt: null }, transaction })) > 0) {
      throw new HttpError(409, 'battery_in_robot', `Battery ${battery.label} is in the robot: record it taken out first`);
    }
    if ((await ChargingSession.count({ where: { batteryId: battery.id, endedAt: null }, transaction })) > 0) {
      throw new HttpError(409, 'already_charging', `Battery ${battery.label} is already on a charger`);
    }
    const onBay = await ChargingSession.findOne({ where: { chargerId: charger.id, bay, endedAt: null }, transaction });
    if (onBay) {
      const other = await Battery.findByPk(onBay.batteryId, { attributes: ['label'], transaction, rejectOnEmpty: true });
      throw new HttpError(409, 'bay_busy', `${charger.name} bay ${bay} is charging battery ${other.label}`, {
        fields: { bay: `Battery ${other.label} is on this bay: take it off first, or pick another bay` },
      });
    }

    const now = new Date();
    const settings = await settingsOf(teamId, transaction);
    const fleet = await Battery.findAll({ where: { teamId }, transaction });
    const records = await fleetRecords(
      fleet.map((member) => member.id),
      transaction,
    );
    const event = team.currentEventId ? await Event.findByPk(team.currentEventId, { transaction }) : null;
    const draw = fleetDraw({ batteries: fleet, records, event, settings });
    const charge = chargeOf(battery, records, { at: now, drawPercent: draw.percent, settings }) ?? 0;
    const missingAh = ((100 - charge) / 100) * battery.nominalCapacityAh;
    const expectedEndAt = new Date(now.getTime() + rechargeMinutes(missingAh, charger.currentPerBayA, settings) * MINUTE_MS);

    const session = await ChargingSession.create(
      { id, batteryId: battery.id, chargerId: charger.id, bay, startedAt: now, startedById: userId, expectedEndAt },
      { transaction },
    );
    await battery.update({ status: 'charging' }, { transaction });
    transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: battery.id }));
    return { session: presentChargingSession(session), created: true };
  });
}
