import { valueProblem, type MarkValue } from '../../shared/domain/checklist';
import type { MarkInput } from '../../shared/schemas/checks';
import { inTransaction } from '../db/transaction';
import { HttpError, notFound } from '../errors';
import { ChecklistItemState, ChecklistRun, ChecklistTemplateVersion, User } from '../models';
import { presentRunItem } from '../presenters/checklist';
import { emitToEvent } from '../realtime/broadcast';
import { recordMark } from './item-states';

/** Marks or un-marks one item; of two marks of the same item the later write wins whole (value, note, who and when). */
export async function writeMark(teamId: string, userId: string, runId: string, itemId: string, value: MarkValue | null, note: string | null) {
  return inTransaction(async (transaction) => {
    const run = await ChecklistRun.ofTeam(teamId, runId, { transaction });
    const version = await ChecklistTemplateVersion.findByPk(run.templateVersionId, { transaction, rejectOnEmpty: true });
    const item = version.items.find((candidate) => candidate.id === itemId);
    if (!item) throw notFound('Item');
    const problem = value === null ? null : valueProblem(item, value);
    if (problem) throw new HttpError(400, 'invalid', 'Check these fields: value', { fields: { value: problem } });

    await recordMark({ runId: run.id, itemId, value, note, markedById: userId, markedAt: new Date() }, transaction);
    // Read back under the row lock the update holds: this is what was stored.
    const state = await ChecklistItemState.findOne({ where: { runId: run.id, itemId }, transaction, rejectOnEmpty: true });
    const user = await User.findByPk(userId, { attributes: ['id', 'name'], transaction, rejectOnEmpty: true });
    // Ids only: the event room includes pit screens, which must never receive people's names.
    transaction.afterCommit(() => emitToEvent(run.eventId, 'checks:marked', { eventId: run.eventId, runId: run.id, itemId }));
    return presentRunItem(item, state, new Map([[user.id, { id: user.id, name: user.name }]]));
  });
}

/** Marks an item with a value that fits its kind (a number out of limits is stored, and failed). */
export const markItem = (teamId: string, userId: string, runId: string, itemId: string, { value, note }: MarkInput) =>
  writeMark(teamId, userId, runId, itemId, value, note);
