import { inTransaction } from '../db/transaction';
import { notFound } from '../errors';
import { ScreenToken } from '../models';
import { disconnectScreen } from '../realtime/broadcast';

/**
 * Revokes a pit screen of the team: its token stops opening the board at once, and its open
 * sockets are dropped once the revocation has committed. Revoking twice keeps the first time.
 */
export async function revokeScreen(teamId: string, id: string) {
  return inTransaction(async (transaction) => {
    const screen = await ScreenToken.findOne({ where: { id, teamId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!screen) throw notFound('Screen');
    if (!screen.revokedAt) await screen.update({ revokedAt: new Date() }, { transaction });
    transaction.afterCommit(() => disconnectScreen(screen.id));
    return screen;
  });
}
