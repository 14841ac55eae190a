import { SIGN_OFF_REASON_MIN, type SignOffInput } from '../../shared/schemas/checks';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { ChecklistRun } from '../models';
import { presentRun } from '../presenters/checklist';
import { emitToEvent } from '../realtime/broadcast';

/**
 * A lead signs a run off as done. With required items open or a number out of limits, only
 * with a written reason, which the run keeps. A run signed off already answers as it is.
 */
export async function signOffRun(teamId: string, userId: string, runId: string, { reason }: SignOffInput) {
  return inTransaction(async (transaction) => {
    const run = await ChecklistRun.ofTeam(teamId, runId, { transaction, lock: true });
    if (run.signedOffAt) return presentRun(run, transaction);
    const { complete } = await presentRun(run, transaction);
    if (!complete && (reason === null || reason.length < SIGN_OFF_REASON_MIN)) {
      throw new HttpError(400, 'invalid', 'Check these fields: reason', {
        fields: { reason: `Items are still open: say why the run is done anyway (at least ${SIGN_OFF_REASON_MIN} characters)` },
      });
    }
    await run.update({ signedOffAt: new Date(), signedOffById: userId, signOffReason: reason }, { transaction });
    transaction.afterCommit(() => emitToEvent(run.eventId, 'checks:signed-off', { eventId: run.eventId, runId: run.id }));
    return presentRun(run, transaction);
  });
}
