import { z } from 'zod';
import { MATCH_LEVELS, type MatchLevel } from '../domain/timeline';
import { clientId, requiredOr, versionField } from './common';

/** Largest schedule file the import accepts. */
export const SCHEDULE_FILE_MAX_BYTES = 1024 * 1024;
/** Highest match number of a level: three digits cover every event format we know. */
export const MATCH_NUMBER_MAX = 999;

// With seconds and milliseconds optional, and `Z` or `±hh:mm`: what people type and what
// `toISOString` writes. A bare local time is refused; it would be read in someone's own zone.
const INSTANT = /^(\d{4})-(\d{2})-(\d{2})T\d{2}:\d{2}(?::\d{2}(?:\.\d{1,3})?)?(?:Z|[+-]\d{2}:\d{2})$/i;

// Far outside any season is a typo, and beyond year 9999 the database cannot store it at all.
const EARLIEST_MS = Date.UTC(2000, 0, 1);
const LATEST_MS = Date.UTC(2100, 0, 1);

/** True for an ISO 8601 instant with an offset on a real calendar day, between 2000 and 2100. */
export function isInstant(value: string): boolean {
  const parts = INSTANT.exec(value);
  const ms = Date.parse(value);
  if (!parts || Number.isNaN(ms) || ms < EARLIEST_MS || ms >= LATEST_MS) return false;
  // Date.parse rolls 2027-02-30 over into March; the calendar day must exist as written.
  const [year, month, day] = parts.slice(1, 4).map(Number);
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

export const INSTANT_MESSAGE = 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z';
/** An instant in, its canonical ISO form (`…Z`, milliseconds) out. */
export const instantField = z
  .string(requiredOr(INSTANT_MESSAGE))
  .refine(isInstant, { message: INSTANT_MESSAGE })
  .transform((value) => new Date(value).toISOString());

export const LEVEL_MESSAGE = 'Use practice, qualification or playoff';
export const levelField = z.enum(MATCH_LEVELS, requiredOr(LEVEL_MESSAGE));

export const MATCH_NUMBER_MESSAGE = `A whole number from 1 to ${MATCH_NUMBER_MAX}`;
export const matchNumberField = z
  .number(requiredOr(MATCH_NUMBER_MESSAGE))
  .int({ message: MATCH_NUMBER_MESSAGE })
  .min(1, { message: MATCH_NUMBER_MESSAGE })
  .max(MATCH_NUMBER_MAX, { message: MATCH_NUMBER_MESSAGE });

export const TEAM_NUMBER_MESSAGE = 'A team number from 1 to 99999';
export const teamNumberField = z
  .number(requiredOr(TEAM_NUMBER_MESSAGE))
  .int({ message: TEAM_NUMBER_MESSAGE })
  .min(1, { message: TEAM_NUMBER_MESSAGE })
  .max(99999, { message: TEAM_NUMBER_MESSAGE });

const alliance = z.tuple([teamNumberField, teamNumberField, teamNumberField], requiredOr('Three team numbers'));

const matchFields = z.object({
  level: levelField,
  number: matchNumberField,
  scheduledStart: instantField,
  red: alliance,
  blue: alliance,
});

/** Every seat a team takes a second time (red seats first), with the alliance it is on. */
export function repeatedSeats(match: { red?: readonly number[]; blue?: readonly number[] }) {
  const seen = new Set<number>();
  const repeats: { side: 'red' | 'blue'; team: number }[] = [];
  for (const side of ['red', 'blue'] as const) {
    for (const team of match[side] ?? []) {
      if (seen.has(team)) repeats.push({ side, team });
      seen.add(team);
    }
  }
  return repeats;
}

function oneSeatPerTeam(match: { red?: readonly number[]; blue?: readonly number[] }, ctx: z.RefinementCtx) {
  for (const { side, team } of repeatedSeats(match)) {
    ctx.addIssue({ code: 'custom', path: [side], message: `Team ${team} is in this match twice` });
  }
}

export const eventParams = z.object({ eventId: z.uuid({ message: 'Must be a UUID' }) });
export const matchParams = z.object({ id: z.uuid({ message: 'Must be a UUID' }) });

export const createMatchSchema = matchFields.extend({ id: clientId.optional() }).strict().superRefine(oneSeatPerTeam);
export type CreateMatchInput = z.infer<typeof createMatchSchema>;

export const updateMatchSchema = matchFields
  .partial()
  .extend({ version: versionField.optional() })
  .strict()
  .superRefine(oneSeatPerTeam);
export type UpdateMatchInput = z.infer<typeof updateMatchSchema>;

// Query strings carry text: `?dryRun=1` (or `true`) previews, anything else is refused.
export const importQuery = z.object({
  dryRun: z
    .enum(['1', '0', 'true', 'false'], { message: 'Use 1 to preview without saving' })
    .optional()
    .transform((value) => value === '1' || value === 'true'),
});

export const fieldProgressSchema = z.object({ matchId: z.uuid(requiredOr('Must be a UUID')), startedAt: instantField.optional() }).strict();
export type FieldProgressInput = z.infer<typeof fieldProgressSchema>;

export const timelineQuery = z.object({ at: instantField.optional() });

/** A match as every schedule answer shows it. */
export interface MatchJson {
  id: string;
  level: MatchLevel;
  number: number;
  scheduledStart: string;
  /** The latest field mark not undone; null while the match has not started. */
  startedAt: string | null;
  red: [number, number, number];
  blue: [number, number, number];
  version: number;
}

/** What an import (or its dry run) answers. */
export interface ImportJson {
  created: number;
  updated: number;
  unchanged: number;
  matches: MatchJson[];
}

/** One bad cell (or a whole bad line when `column` is null) of an imported file. */
export interface ScheduleFileError {
  row: number;
  column: string | null;
  message: string;
}
