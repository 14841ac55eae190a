import type { EndChargingInput } from '../../shared/schemas/batteries';
import { inTransaction } from '../db/transaction';
import { notFound } from '../errors';
import { Battery, ChargingSession, Team } from '../models';
import { presentChargingSession } from '../presenters/battery';
import { emitToTeam } from '../realtime/broadcast';
import { assertInstant } from './input-guards';

/**
 * Takes a battery off its bay (it is then `ready`). Sent again for a session already ended, it
 * corrects the time and leaves the battery's status alone.
 */
export async function endCharging(teamId: string, userId: string, sessionId: string, { endedAt }: EndChargingInput) {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const session = await ChargingSession.findByPk(sessionId, { transaction });
    const battery = session ? await Battery.findOne({ where: { id: session.batteryId, teamId }, transaction }) : null;
    if (!session || !battery) throw notFound('Charging session');
    const at = new Date(endedAt);
    assertInstant('endedAt', at, { notBefore: session.startedAt, what: 'it went on the charger' });
    const wasOpen = session.endedAt === null;
    await session.update({ endedAt: at, endedById: userId }, { transaction });
    if (wasOpen && battery.status === 'charging') await battery.update({ status: 'ready' }, { transaction });
    transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: battery.id }));
    return presentChargingSession(session);
  });
}
