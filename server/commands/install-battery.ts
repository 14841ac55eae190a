import { allianceOf } from '../../shared/domain/timeline';
import type { CreateUseInput } from '../../shared/schemas/batteries';
import { inTransaction } from '../db/transaction';
import { HttpError, notFound } from '../errors';
import { Battery, BatteryUse, Event, Match, Team } from '../models';
import { presentUse } from '../presenters/battery';
import { presentMatch } from '../presenters/match';
import { emitToEvent } from '../realtime/broadcast';
import { closeOpenCharging } from './battery-closing';
import {openUseOfTeam } from './battery-guards';

/**
 * Puts a battery in the robot for one of our matches of the team's current event. The robot holds
 * one battery: while one is in (an open use), another install answers 409 until it is recorded
 * out. A battery taken off its charger for this ends that charge now. Resending the same `id`
 * answers the use the first call made.
 */
export async function installBattery(teamId: string, userId: string, batteryId: string, { id, matchId }: CreateUseInput) {
  return inTransaction(async (transaction) => {
    const team = await Team.lockRow(teamId, transaction);
    const battery = await Battery.ofTeam(teamId, batteryId, { transaction });
    if (id) {
      // A resend is for the same battery: an id reused for another one must not answer that one's use.
      const existing = await BatteryUse.findByPk(id, { transaction });
      if (existing?.batteryId === battery.id) return { use: presentUse(existing), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const event = team.currentEventId ? await Event.findByPk(team.currentEventId, { transaction }) : null;
    const match = event ? await Match.findOne({ where: { id: matchId, eventId: event.id }, transaction }) : null;
    if (!event || !match) throw notFound('Match');
    if (allianceOf(presentMatch(match, null), event.teamNumber) === null) {
      throw new HttpError(400, 'not_our_match', 'We do not play in this match', { fields: { matchId: 'We do not play in this match' } });
    }
    if (battery.status === 'retired') {
      throw new HttpError(409, 'retired', `Battery ${battery.label} is retired: put it back in service before using it`);
    }
    const inRobot = await openUseOfTeam(teamId, transaction);
    if (inRobot?.batteryId === battery.id) throw new HttpError(409, 'battery_in_robot', `Battery ${battery.label} is already in the robot`);
    if (inRobot) {
      const other = await Battery.findByPk(inRobot.batteryId, { attributes: ['label'], transaction, rejectOnEmpty: true });
      throw new HttpError(409, 'robot_has_battery', `Battery ${other.label} is still in the robot: record it taken out first`);
    }
    const now = new Date();
    await closeOpenCharging(battery.id, userId, now, transaction);
    const use = await BatteryUse.create({ id, batteryId: battery.id, eventId: event.id, matchId: match.id, installedAt: now, installedById: userId }, { transaction });
    await battery.update({ status: 'in_robot' }, { transaction });
    transaction.afterCommit(() => emitToEvent(event.id, 'batteries:used', { eventId: event.id, batteryId: battery.id, matchId: match.id }));
    return { use: presentUse(use), created: true };
  });
}
