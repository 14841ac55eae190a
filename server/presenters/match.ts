import type { Transaction } from 'sequelize';
import { MATCH_LEVELS } from '../../shared/domain/timeline';
import type { MatchJson } from '../../shared/schemas/schedule';
import { FieldMark, Match } from '../models';

export const presentMatch = (match: Match, startedAt: Date | null | undefined): MatchJson => ({
  id: match.id,
  level: match.level,
  number: match.number,
  scheduledStart: match.scheduledStart.toISOString(),
  startedAt: startedAt ? startedAt.toISOString() : null,
  red: [match.red1, match.red2, match.red3],
  blue: [match.blue1, match.blue2, match.blue3],
  version: match.version,
});

/** One match with its start, read inside the caller's transaction when there is one. */
export async function presentMatchWithStart(match: Match, transaction?: Transaction): Promise<MatchJson> {
  const starts = await FieldMark.startsOf(match.eventId, { matchId: match.id, transaction });
  return presentMatch(match, starts.get(match.id));
}

// Schedule order as the timeline sorts it: the level string alone would put playoffs first.
const compare = (a: MatchJson, b: MatchJson) =>
  a.scheduledStart.localeCompare(b.scheduledStart) ||
  MATCH_LEVELS.indexOf(a.level) - MATCH_LEVELS.indexOf(b.level) ||
  a.number - b.number ||
  a.id.localeCompare(b.id);

/** The event's whole schedule, in schedule order, each match with its start. */
export async function presentSchedule(eventId: string, transaction?: Transaction): Promise<MatchJson[]> {
  // One after the other: queries of one transaction share its connection.
  const matches = await Match.findAll({ where: { eventId }, transaction });
  const starts = await FieldMark.startsOf(eventId, { transaction });
  return matches.map((match) => presentMatch(match, starts.get(match.id))).sort(compare);
}
