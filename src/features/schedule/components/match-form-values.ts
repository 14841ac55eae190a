import { formatClock, localDate, localTimeToInstant } from '@shared/domain/event-clock';
import type { MatchLevel } from '@shared/domain/timeline';
import { createMatchSchema, type MatchJson } from '@shared/schemas/schedule';
import { isApiError } from '../../../lib/api-client';
import { parseForm, type FieldErrors } from '../../../lib/form-errors';

type Seats = [string, string, string];

/** What the match form's inputs hold: strings as typed, so nothing the user entered is reformatted. */
export interface MatchFormValues {
  level: MatchLevel;
  number: string;
  /** `yyyy-MM-dd` and `HH:mm` on the venue's clock, whatever zone this tablet is set to. */
  date: string;
  time: string;
  red: Seats;
  blue: Seats;
}

/** The fields a match is sent with (create body, or the source of an edit's changes). */
export interface MatchFields {
  level: MatchLevel;
  number: number;
  scheduledStart: string;
  red: [number, number, number];
  blue: [number, number, number];
}

const seats = (teams: readonly number[]) => teams.map(String) as Seats;

export function matchValuesOf(match: MatchJson, timeZone: string): MatchFormValues {
  return {
    level: match.level,
    number: String(match.number),
    date: localDate(match.scheduledStart, timeZone),
    time: formatClock(match.scheduledStart, timeZone),
    red: seats(match.red),
    blue: seats(match.blue),
  };
}

export const emptyMatchValues = (date: string): MatchFormValues => ({
  level: 'qualification',
  number: '',
  date,
  time: '',
  red: ['', '', ''],
  blue: ['', '', ''],
});

// `Number('')` is 0 and `Number('1e2')` is 100; neither is what was typed. NaN gets the schema's message.
const whole = (text: string) => (text.trim() === '' ? undefined : /^\d+$/.test(text.trim()) ? Number(text) : NaN);

/** Reads the venue-clock date and time as an instant, with a message per input when it cannot. */
function readStart(values: MatchFormValues, timeZone: string): { instant?: string; errors: FieldErrors } {
  const errors: FieldErrors = {};
  if (!values.date) errors.date = 'Choose the day';
  if (!values.time) errors.time = 'Choose the time';
  if (!values.date || !values.time) return { errors };
  try {
    return { instant: localTimeToInstant(values.date, values.time, timeZone).toISOString(), errors };
  } catch {
    // Only a time the clocks skip (or a browser that let a malformed value through) lands here.
    return { errors: { time: 'That time does not exist on that day at the venue (the clocks change)' } };
  }
}

/** Checks the form with the server's own schema; errors are keyed by input (level, number, date, time, red, blue). */
export function readMatchForm(values: MatchFormValues, timeZone: string): { ok: true; data: MatchFields } | { ok: false; errors: FieldErrors } {
  const start = readStart(values, timeZone);
  const parsed = parseForm(createMatchSchema, {
    level: values.level,
    number: whole(values.number),
    // A stand-in keeps the schema from repeating the date/time messages in API words.
    scheduledStart: start.instant ?? new Date(0).toISOString(),
    red: values.red.map(whole),
    blue: values.blue.map(whole),
  });
  const errors = { ...start.errors, ...(parsed.ok ? {} : parsed.errors) };
  if (!parsed.ok || Object.keys(errors).length > 0) return { ok: false, errors };
  const { level, number, scheduledStart, red, blue } = parsed.data;
  return { ok: true, data: { level, number, scheduledStart, red, blue } };
}

/** The server's field messages ("red.1", "scheduledStart") under the inputs that show them. */
export function serverMatchErrors(error: unknown): FieldErrors {
  if (!isApiError(error)) return {};
  const errors: FieldErrors = {};
  for (const [key, message] of Object.entries(error.fields)) {
    const head = key.split('.')[0];
    errors[head === 'scheduledStart' ? 'time' : head] ??= message;
  }
  return errors;
}

/** Only what differs from the version the edit started with, so a save overwrites nothing else. */
export function matchChanges(base: MatchJson, fields: MatchFields): Partial<MatchFields> {
  const changes: Partial<MatchFields> = {};
  if (fields.level !== base.level) changes.level = fields.level;
  if (fields.number !== base.number) changes.number = fields.number;
  if (new Date(fields.scheduledStart).getTime() !== new Date(base.scheduledStart).getTime()) changes.scheduledStart = fields.scheduledStart;
  if (fields.red.join() !== base.red.join()) changes.red = fields.red;
  if (fields.blue.join() !== base.blue.join()) changes.blue = fields.blue;
  return changes;
}
