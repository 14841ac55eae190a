import type { ScheduleRow } from '../../shared/domain/schedule-csv';
import type { ImportJson } from '../../shared/schemas/schedule';
import { inTransaction } from '../db/transaction';
import { Event, Match } from '../models';
import { presentSchedule } from '../presenters/match';
import { emitToEvent } from '../realtime/broadcast';
import { matchColumns } from './match-columns';

// Thrown to roll a dry run back after it did everything a real import does.
class DryRun {
  constructor(readonly result: ImportJson) {}
}

/**
 * Upserts parsed schedule rows into a team's event by (level, number), in one transaction:
 * field marks stay with their match, and matches missing from the file stay as they were.
 * A dry run runs the very same writes and rolls them back, so its preview cannot drift from
 * what the import would do.
 */
export async function importMatches(teamId: string, eventId: string, rows: readonly ScheduleRow[], { dryRun = false } = {}) {
  try {
    return await inTransaction(async (transaction) => {
      const event = await Event.ofTeam(teamId, eventId, { transaction, lock: true });
      const existing = await Match.findAll({ where: { eventId: event.id }, transaction });
      const bySlot = new Map(existing.map((match) => [`${match.level} ${match.number}`, match]));
      const counts = { created: 0, updated: 0, unchanged: 0 };
      for (const row of rows) {
        const columns = matchColumns(row);
        const match = bySlot.get(`${row.level} ${row.number}`);
        if (!match) {
          await Match.create({ eventId: event.id, ...columns }, { transaction });
          counts.created++;
          continue;
        }
        match.set(columns);
        if (match.changed()) {
          await match.save({ transaction });
          counts.updated++;
        } else {
          counts.unchanged++;
        }
      }
      const result: ImportJson = { ...counts, matches: await presentSchedule(event.id, transaction) };
      if (dryRun) throw new DryRun(result);
      transaction.afterCommit(() => emitToEvent(event.id, 'matches:imported', { eventId: event.id }));
      return result;
    });
  } catch (error) {
    if (error instanceof DryRun) return error.result;
    throw error;
  }
}
