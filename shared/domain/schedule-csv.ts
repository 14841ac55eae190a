/**
 * Reads a schedule file in our CSV format: one header line
 * `level,number,scheduled_start,red1,red2,red3,blue1,blue2,blue3`, then one match per line.
 * `scheduled_start` is an ISO instant with an offset, or `YYYY-MM-DD HH:mm` read in the event's
 * time zone. Pure: text in, rows or every error out, so the browser can check a file before upload.
 */
import { parse } from 'csv-parse/sync';
import {
  isInstant,
  LEVEL_MESSAGE,
  levelField,
  MATCH_NUMBER_MESSAGE,
  matchNumberField,
  TEAM_NUMBER_MESSAGE,
  teamNumberField,
  type ScheduleFileError,
} from '../schemas/schedule';
import { localTimeToInstant } from './event-clock';
import type { MatchLevel } from './timeline';

/** The header line, exactly; columns are read by position. */
export const SCHEDULE_COLUMNS = ['level', 'number', 'scheduled_start', 'red1', 'red2', 'red3', 'blue1', 'blue2', 'blue3'] as const;
const TEAM_COLUMNS = SCHEDULE_COLUMNS.slice(3);

/** One match read from the file; `line` is where it starts (1 is the header). */
export interface ScheduleRow {
  line: number;
  level: MatchLevel;
  number: number;
  scheduledStart: string;
  red: [number, number, number];
  blue: [number, number, number];
}

/** Either every row, or every problem: a file is taken whole or not at all. */
export type ScheduleParseResult = { ok: true; rows: ScheduleRow[] } | { ok: false; errors: ScheduleFileError[] };

const LOCAL = /^(\d{4}-\d{2}-\d{2})[ T](\d{2}:\d{2})$/;
const WHOLE = /^\d+$/;
const START_MESSAGE = 'Use YYYY-MM-DD HH:mm (event time) or an ISO time with an offset, e.g. 2027-03-05T15:00:00Z';

/** Text to a whole number, or NaN: `Number('')` is 0 and `Number('1e2')` is 100, neither meant. */
const wholeNumber = (text: string) => (WHOLE.test(text) ? Number(text) : NaN);

function readStart(text: string, timeZone: string): { value: string } | { error: string } {
  if (isInstant(text)) return { value: new Date(text).toISOString() };
  const local = LOCAL.exec(text);
  if (!local) return { error: START_MESSAGE };
  try {
    return { value: localTimeToInstant(local[1], local[2], timeZone).toISOString() };
  } catch {
    // A spring-forward gap or a 25:00: the printed schedule has a typo worth showing.
    return { error: `${local[1]} ${local[2]} does not exist in ${timeZone}` };
  }
}

/** Parses a schedule file for an event in `timeZone` (IANA). */
export function parseScheduleCsv(text: string, timeZone: string): ScheduleParseResult {
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(text, { bom: true, info: true, relax_column_count: true, skip_empty_lines: true, trim: true });
  } catch (error) {
    // A quote left open swallows the rest of the file: nothing after it can be read reliably.
    const line = typeof (error as { lines?: unknown }).lines === 'number' ? (error as { lines: number }).lines : 1;
    return { ok: false, errors: [{ row: line, column: null, message: `Not readable as CSV: ${(error as Error).message}` }] };
  }

  const errors: ScheduleFileError[] = [];
  // info.lines is where a record ends; a quoted cell may span lines, and the row is where it starts.
  const lineOf = ({ record, info }: (typeof records)[number]) =>
    info.lines - record.reduce((count, cell) => count + (cell.match(/\n/g)?.length ?? 0), 0);

  const [header, ...body] = records;
  if (!header) return { ok: false, errors: [{ row: 1, column: null, message: 'The file is empty' }] };
  if (header.record.map((cell) => cell.toLowerCase()).join(',') !== SCHEDULE_COLUMNS.join(',')) {
    errors.push({ row: lineOf(header), column: null, message: `The first line must be: ${SCHEDULE_COLUMNS.join(',')}` });
  }
  if (body.length === 0) errors.push({ row: lineOf(header), column: null, message: 'The file holds no matches' });

  const rows: ScheduleRow[] = [];
  const seen = new Map<string, number>();
  for (const entry of body) {
    const row = lineOf(entry);
    const cells = entry.record;
    if (cells.length !== SCHEDULE_COLUMNS.length) {
      errors.push({ row, column: null, message: `Expected ${SCHEDULE_COLUMNS.length} columns, found ${cells.length}` });
      continue;
    }
    const bad = (column: string, message: string) => errors.push({ row, column, message });
    const errorsBefore = errors.length;

    const level = levelField.safeParse(cells[0].toLowerCase());
    if (!level.success) bad('level', LEVEL_MESSAGE);
    const number = matchNumberField.safeParse(wholeNumber(cells[1]));
    if (!number.success) bad('number', MATCH_NUMBER_MESSAGE);
    const start = readStart(cells[2], timeZone);
    if ('error' in start) bad('scheduled_start', start.error);

    const teams: number[] = [];
    TEAM_COLUMNS.forEach((column, i) => {
      const team = teamNumberField.safeParse(wholeNumber(cells[3 + i]));
      if (!team.success) return bad(column, TEAM_NUMBER_MESSAGE);
      if (teams.includes(team.data)) bad(column, `Team ${team.data} is in this match twice`);
      teams.push(team.data);
    });

    if (level.success && number.success) {
      const key = `${level.data} ${number.data}`;
      const first = seen.get(key);
      if (first !== undefined) bad('number', `${key} is already on row ${first}`);
      else seen.set(key, row);
    }
    if (errors.length > errorsBefore || !level.success || !number.success || 'error' in start) continue;
    rows.push({
      line: row,
      level: level.data,
      number: number.data,
      scheduledStart: start.value,
      red: [teams[0], teams[1], teams[2]],
      blue: [teams[3], teams[4], teams[5]],
    });
  }
  return errors.length ? { ok: false, errors } : { ok: true, rows };
}
