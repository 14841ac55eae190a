import type { Transaction } from 'sequelize';
import type { ChecklistItem, MarkValue } from '../../shared/domain/checklist';
import { ChecklistItemState, ChecklistMark, encodeMarkValue } from '../models';

/** One empty state row per item of a run: a mark is then an UPDATE by key, never an insert race. */
export async function createItemStates(runId: string, items: readonly ChecklistItem[], transaction: Transaction) {
  await ChecklistItemState.bulkCreate(
    items.map((item) => ({ runId, itemId: item.id, value: null, note: null, markedById: null, markedAt: null })),
    { transaction },
  );
}

/**
 * Sets an item's current mark (null: un-marked, which keeps no who or when) and appends it to the
 * run's history with who did it. Updated by its key alone: marks of other items never wait for it.
 */
export async function recordMark(
  { runId, itemId, value, note, markedById, markedAt }: { runId: string; itemId: string; value: MarkValue | null; note: string | null; markedById: string; markedAt: Date },
  transaction: Transaction,
) {
  const stored = encodeMarkValue(value);
  await ChecklistItemState.update(
    value === null ? { value: null, note: null, markedById: null, markedAt: null } : { value: stored, note, markedById, markedAt },
    { where: { runId, itemId }, transaction },
  );
  await ChecklistMark.create({ runId, itemId, value: stored, note, markedById, markedAt }, { transaction });
}
