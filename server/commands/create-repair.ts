import { randomUUID } from 'node:crypto';
import type { CreateRepairInput } from '../../shared/schemas/repairs';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Event, Repair, RepairChange, Team } from '../models';
import { presentRepair } from '../presenters/repair';
import { columnOf, keyForSlot, urgencySlot } from '../repairs/placement';
import { invalidReferences } from '../repairs/references';
import { assertNoInvalidFields } from './input-guards';
import { announceCreated, announceRekeyed } from './repair-announce';

/**
 * Reports a problem on the event's board: in `reported`, where urgency puts it, reported by the
 * caller. Resending the same `id` answers the ticket the first call made; an id in use elsewhere
 * answers 409 `id_taken`.
 */
export async function createRepair(teamId: string, userId: string, eventId: string, { id, ...input }: CreateRepairInput) {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const event = await Event.ofTeam(teamId, eventId, { transaction });
    if (id) {
      const existing = await Repair.findByPk(id, { transaction });
      if (existing?.eventId === event.id) return { repair: await presentRepair(existing, transaction), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const { subsystem, foundInMatchId, assigneeId } = input;
    assertNoInvalidFields(await invalidReferences(teamId, event.id, { subsystem, foundInMatchId, assigneeId }, transaction));

    const now = new Date();
    const ticket = { id: id ?? randomUUID(), severity: input.severity, status: 'reported' as const, estimateMinutes: input.estimateMinutes, timeSpentMinutes: 0 };
    const column = await columnOf(event.id, 'reported', null, transaction);
    const { orderKey, rekeyed } = await keyForSlot(column, urgencySlot(column, { ...ticket, reportedAt: now.toISOString() }), transaction);
    const repair = await Repair.create(
      { ...input, ...ticket, eventId: event.id, orderKey, placedByHand: false, reporterId: userId, partsUsed: [], createdAt: now, updatedAt: now },
      // `silent` keeps the updatedAt given: a new ticket was last changed when it was reported.
      { transaction, silent: true },
    );
    // What was reported, as it was first written: later edits show against it.
    const reported = Object.fromEntries(
      Object.entries({ title: input.title, subsystem, severity: input.severity, description: input.description, foundInMatchId, assigneeId, estimateMinutes: input.estimateMinutes })
        .filter(([, value]) => value !== null)
        .map(([field, value]) => [field, [null, value]]),
    ) as Record<string, [unknown, unknown]>;
    await RepairChange.create({ repairId: repair.id, kind: 'created', changes: reported, byId: userId, at: now }, { transaction });
    transaction.afterCommit(() => {
      announceCreated(repair);
      announceRekeyed(rekeyed);
    });
    return { repair: await presentRepair(repair, transaction, now), created: true };
  });
}
