import type { Transaction } from 'sequelize';
import type { UpdateRepairInput } from '../../shared/schemas/repairs';
import { inTransaction } from '../db/transaction';
import { stale } from '../errors';
import { Repair, RepairChange, Team } from '../models';
import type { ChangeSet } from '../models/repair-change';
import { presentRepair } from '../presenters/repair';
import { urgencyTicketOf } from '../repairs/urgency-ticket';
import { columnOf, keyForSlot, urgencySlot } from '../repairs/placement';
import { invalidReferences, type References } from '../repairs/references';
import { assertNoInvalidFields } from './input-guards';
import { announceChanged, announceRekeyed } from './repair-announce';

type Fields = Omit<UpdateRepairInput, 'version' | 'afterId' | 'beforeId'>;
type Field = keyof Fields;

// The fields urgency reads: changing one re-places a card a lead did not place.
const URGENCY_FIELDS: readonly Field[] = ['severity', 'estimateMinutes', 'timeSpentMinutes'];

const same = (a: unknown, b: unknown) => a === b || JSON.stringify(a) === JSON.stringify(b);

/** The fields the body sets to something else than the ticket has: field → [before, after]. */
function changedFields(repair: Repair, fields: Fields): ChangeSet {
  const changes: ChangeSet = {};
  for (const [field, value] of Object.entries(fields) as [Field, unknown][]) {
    if (value !== undefined && !same(repair.get(field), value)) changes[field] = [repair.get(field), value];
  }
  return changes;
}

/** Where a lead's `afterId`/`beforeId` put the card: a slot of the target column (listed without it), or 400. */
function slotByHand(column: readonly Repair[], afterId: string | null | undefined, beforeId: string | null | undefined) {
  const indexOf = (id: string | null | undefined) => (id ? column.findIndex((card) => card.id === id) : -1);
  const after = indexOf(afterId);
  const before = indexOf(beforeId);
  const fields: Record<string, string> = {};
  const notInColumn = 'Must be another card of the column the ticket goes to';
  if (afterId && after === -1) fields.afterId = notInColumn;
  if (beforeId && before === -1) fields.beforeId = notInColumn;
  if (after !== -1 && before !== -1 && after >= before) fields.beforeId = 'Must come after the card named in afterId';
  assertNoInvalidFields(fields);
  // Right after the card named first; a list another tablet has since changed still lands next to
  // the card the lead dropped it by. `afterId: null` is the top, `beforeId: null` alone the bottom.
  if (after !== -1) return after + 1;
  if (before !== -1) return before;
  return afterId === null ? 0 : column.length;
}

/** The ticket's new place, when it moves: a fresh key in its (new) column, or null to stay. */
async function newPlace(
  repair: Repair,
  { from, byHand, afterId, beforeId, urgencyChanged }: { from: string; byHand: boolean; afterId?: string | null; beforeId?: string | null; urgencyChanged: boolean },
  transaction: Transaction,
) {
  const moved = from !== repair.status;
  if (!byHand && !moved && !(urgencyChanged && !repair.placedByHand)) return null;
  const column = await columnOf(repair.eventId, repair.status, repair.id, transaction);
  const slot = byHand ? slotByHand(column, afterId, beforeId) : urgencySlot(column, urgencyTicketOf(repair));
  // Already there (same column, same neighbours): the key stays, and with it the row.
  const current = column.filter((card) => card.orderKey < repair.orderKey || (card.orderKey === repair.orderKey && card.id < repair.id)).length;
  if (!moved && slot === current) return { orderKey: repair.orderKey, rekeyed: [] };
  return keyForSlot(column, slot, transaction);
}

/**
 * Edits, moves or places a ticket, refusing a stale `version` (409 with the current ticket,
 * nothing written). A move without a place goes where urgency puts it; a place by hand
 * (`afterId`/`beforeId`, checked by the route for `repairs:manage`) sticks until the card moves
 * again. Writes one history row per kind of change; a body that changes nothing writes nothing.
 */
export async function updateRepair(teamId: string, userId: string, id: string, input: UpdateRepairInput) {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    // Read as committed now, and held: two moves of one card queue here (and behind the team row).
    const repair = await Repair.ofTeam(teamId, id, { transaction, lock: true });
    if (input.version !== repair.version) throw stale(await presentRepair(repair, transaction));
    const { version: _version, afterId, beforeId, ...fields } = input;
    const byHand = afterId !== undefined || beforeId !== undefined;

    const changes = changedFields(repair, fields);
    // Only what changes is checked: a ticket keeps a subsystem since taken off the list, or an assignee since gone.
    const references: References = {
      subsystem: changes.subsystem?.[1] as string | undefined,
      foundInMatchId: changes.foundInMatchId?.[1] as string | null | undefined,
      assigneeId: changes.assigneeId?.[1] as string | null | undefined,
    };
    assertNoInvalidFields(await invalidReferences(teamId, repair.eventId, references, transaction));

    const from = repair.status;
    const wasPlacedByHand = repair.placedByHand;
    const previousKey = repair.orderKey;
    const now = new Date();
    repair.set(Object.fromEntries(Object.entries(changes).map(([field, [, after]]) => [field, after])));
    if (changes.status) repair.doneAt = repair.status === 'done' ? now : null;
    const urgencyChanged = URGENCY_FIELDS.some((field) => field in changes);
    const place = await newPlace(repair, { from, byHand, afterId, beforeId, urgencyChanged }, transaction);
    if (place) {
      repair.orderKey = place.orderKey;
      repair.placedByHand = byHand;
    }

    const rows: { kind: RepairChange['kind']; changes: ChangeSet }[] = [];
    const { status, assigneeId, ...edited } = changes;
    if (status) rows.push({ kind: 'moved', changes: { status } });
    if (byHand && (repair.orderKey !== previousKey || !wasPlacedByHand)) rows.push({ kind: 'placed', changes: { position: [null, 'by hand'] } });
    if (assigneeId) rows.push({ kind: 'assigned', changes: { assigneeId } });
    if (Object.keys(edited).length > 0) rows.push({ kind: 'edited', changes: edited });
    if (rows.length === 0 && !repair.changed()) return presentRepair(repair, transaction, now);

    await repair.save({ transaction });
    await RepairChange.bulkCreate(
      rows.map((row) => ({ ...row, repairId: repair.id, byId: userId, at: now })),
      { transaction },
    );
    transaction.afterCommit(() => {
      announceChanged(repair);
      announceRekeyed(place?.rekeyed ?? []);
    });
    return presentRepair(repair, transaction, now);
  });
}
