import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import type { MatchLevel } from '../../shared/domain/timeline';
import { HttpError } from '../errors';
import { Match } from '../models';

interface MatchFields {
  level?: MatchLevel;
  number?: number;
  scheduledStart?: string;
  red?: readonly [number, number, number];
  blue?: readonly [number, number, number];
}

/** The API's alliances as the table's seat columns; only the fields given. */
export function matchColumns({ level, number, scheduledStart, red, blue }: MatchFields) {
  return {
    ...(level !== undefined && { level }),
    ...(number !== undefined && { number }),
    ...(scheduledStart !== undefined && { scheduledStart: new Date(scheduledStart) }),
    ...(red && { red1: red[0], red2: red[1], red3: red[2] }),
    ...(blue && { blue1: blue[0], blue2: blue[1], blue3: blue[2] }),
  } as Pick<Match, 'level' | 'number' | 'scheduledStart' | 'red1' | 'red2' | 'red3' | 'blue1' | 'blue2' | 'blue3'>;
}

/**
 * 409 `match_exists` when another match of the event has this level and number. Checked under
 * the event's row lock, so the unique index is never the one to answer (that would be a 500).
 */
export async function assertSlotFree(eventId: string, level: MatchLevel, number: number, exceptId: string | null, transaction: Transaction) {
  const taken = await Match.findOne({
    where: { eventId, level, number, ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}) },
    transaction,
  });
  if (taken) throw new HttpError(409, 'match_exists', `The schedule already has ${level} match ${number}`, { fields: { number: 'Already in the schedule' } });
}
