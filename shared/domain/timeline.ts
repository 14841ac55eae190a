/**
 * The event timeline: projected start of every remaining match from the schedule, the field's
 * actual starts and "now"; queue times and turnaround windows for our own matches.
 *
 * Everything here works on instants (milliseconds since the epoch, ISO strings with `Z` in and
 * out). Wall clocks and time zones belong to display only (see `event-clock.ts`): a duration
 * computed from instants is right across a daylight-saving change, one from wall clocks is not.
 */
import { median } from './median';

/** Match levels in the order an event runs them; the order breaks ties in the schedule. */
export const MATCH_LEVELS = ['practice', 'qualification', 'playoff'] as const;
/** A match level. */
export type MatchLevel = (typeof MATCH_LEVELS)[number];
/** Alliance colour. */
export type Alliance = 'red' | 'blue';

/** One match of the event as the timeline reads it; instants are ISO strings with an offset. */
export interface TimelineMatch {
  id: string;
  level: MatchLevel;
  number: number;
  scheduledStart: string;
  /** When the field marked the match as started; null while it has not. */
  startedAt: string | null;
  red: readonly [number, number, number];
  blue: readonly [number, number, number];
}

/** How early we queue: a number of matches before ours, or a number of minutes. */
export type QueueLead = { matches: number } | { minutes: number };

/** The event settings the timeline needs. */
export interface TimelineSettings {
  teamNumber: number;
  queueLead: QueueLead;
  matchLengthSeconds: number;
  returnToPitMinutes: number;
  tightTurnaroundMinutes: number;
  allowRunningAhead: boolean;
}

/** Defaults for every setting but the team number. */
export const TIMELINE_DEFAULTS = {
  queueLead: { matches: 2 },
  matchLengthSeconds: 150,
  returnToPitMinutes: 5,
  tightTurnaroundMinutes: 20,
  allowRunningAhead: false,
} as const satisfies Omit<TimelineSettings, 'teamNumber'>;

/** One row of the event's schedule with its projection. */
export interface TimelineMatchJson {
  id: string;
  level: MatchLevel;
  number: number;
  scheduledStart: string;
  projectedStart: string;
  startedAt: string | null;
  ours: boolean;
  alliance: Alliance | null;
}

/** One of our matches still to play, with when to queue and how long the pit has before. */
export interface OurMatchJson {
  matchId: string;
  level: MatchLevel;
  number: number;
  alliance: Alliance;
  projectedStart: string;
  queueAt: string;
  /** Whole minutes (rounded down) from our previous match's return to the pit until queueing; null for our first match. */
  turnaroundMinutes: number | null;
  tight: boolean;
}

/** What the timeline endpoint answers. */
export interface TimelineJson {
  cycleSeconds: number;
  delaySeconds: number;
  matches: TimelineMatchJson[];
  ourMatches: OurMatchJson[];
}

/** How many recent actual gaps make the observed cycle. */
export const CYCLE_WINDOW = 5;

const MINUTE_MS = 60_000;
const LEVEL_RANK: Record<MatchLevel, number> = { practice: 0, qualification: 1, playoff: 2 };
// An instant without an offset would be read in the server's or the tablet's own zone.
const HAS_OFFSET = /(?:Z|[+-]\d{2}:?\d{2})$/i;

/** Milliseconds since the epoch of an ISO instant with an offset (`Z` or `±hh:mm`) or a Date. */
export function toInstantMs(value: string | Date, what = 'instant'): number {
  const ms = typeof value === 'string' ? (HAS_OFFSET.test(value.trim()) ? Date.parse(value) : NaN) : value.getTime();
  if (Number.isNaN(ms)) throw new RangeError(`${what} is not an ISO instant with an offset: ${String(value)}`);
  return ms;
}

interface Row {
  match: TimelineMatch;
  scheduledMs: number;
  startedMs: number | null;
  alliance: Alliance | null;
}

// Schedule order: scheduled start, then level, then number (then id, so that equal rows keep
// one order whatever order the database returned them in).
function compareRows(a: Row, b: Row): number {
  return (
    a.scheduledMs - b.scheduledMs ||
    LEVEL_RANK[a.match.level] - LEVEL_RANK[b.match.level] ||
    a.match.number - b.match.number ||
    (a.match.id < b.match.id ? -1 : a.match.id > b.match.id ? 1 : 0)
  );
}

/** The alliance a team plays on in a match; null when it does not play in it. */
export function allianceOf(match: { red: readonly number[]; blue: readonly number[] }, teamNumber: number): Alliance | null {
  if (match.red.includes(teamNumber)) return 'red';
  if (match.blue.includes(teamNumber)) return 'blue';
  return null;
}

/**
 * The cycle the projection steps by, in whole seconds, from rows in schedule order. Observed:
 * the median of the last CYCLE_WINDOW gaps between consecutive started matches. Until there is
 * one such gap, the median scheduled gap, which one lunch or one night cannot skew.
 */
export function cycleSecondsOf(rows: readonly { scheduledMs: number; startedMs: number | null }[]): number {
  const scheduledGaps: number[] = [];
  for (let i = 1; i < rows.length; i++) {
    const gap = rows[i].scheduledMs - rows[i - 1].scheduledMs;
    if (gap > 0) scheduledGaps.push(gap);
  }
  const scheduledCycleMs = median(scheduledGaps) ?? 0;

  const gaps: number[] = [];
  let previousStarted = -1;
  let breakSincePrevious = false;
  for (let i = 0; i < rows.length; i++) {
    // Lunch or the night between days is not a cycle of the field: a gap across it is dropped.
    if (i > 0 && rows[i].scheduledMs - rows[i - 1].scheduledMs > 2 * scheduledCycleMs) breakSincePrevious = true;
    const started = rows[i].startedMs;
    if (started === null) continue;
    if (previousStarted >= 0 && !breakSincePrevious) {
      // Per schedule slot, so a match nobody marked as started does not count as a double cycle.
      const gap = (started - (rows[previousStarted].startedMs as number)) / (i - previousStarted);
      // A start marked out of order (a replay, a typo) is no evidence of the field's pace.
      if (gap > 0) gaps.push(gap);
    }
    previousStarted = i;
    breakSincePrevious = false;
  }
  const cycleMs = median(gaps.slice(-CYCLE_WINDOW)) ?? scheduledCycleMs;
  return Math.round(cycleMs / 1000);
}

/**
 * Projects the event: every match gets a projected start (its actual start once it has one),
 * and each of our matches still to play gets a queue time and a turnaround window.
 * Deterministic; one sort, then linear passes.
 */
export function computeTimeline(
  matches: readonly TimelineMatch[],
  settings: TimelineSettings,
  now: Date | string,
): TimelineJson {
  const nowMs = toInstantMs(now, 'now');
  const rows: Row[] = matches
    .map((match) => ({
      match,
      scheduledMs: toInstantMs(match.scheduledStart, `scheduledStart of match ${match.id}`),
      startedMs: match.startedAt === null ? null : toInstantMs(match.startedAt, `startedAt of match ${match.id}`),
      alliance: allianceOf(match, settings.teamNumber),
    }))
    .sort(compareRows);

  const cycleSeconds = cycleSecondsOf(rows);
  const cycleMs = cycleSeconds * 1000;

  // breaksUpTo[i]: scheduled breaks (a gap longer than two cycles) at or before row i, so
  // "is there a break between rows j and i" is one subtraction.
  const breaksUpTo: number[] = [];
  const isBreakBefore = (i: number) => i > 0 && rows[i].scheduledMs - rows[i - 1].scheduledMs > 2 * cycleMs;
  rows.forEach((_, i) => breaksUpTo.push((i > 0 ? breaksUpTo[i - 1] : 0) + (isBreakBefore(i) ? 1 : 0)));

  const projected: number[] = [];
  let anyStarted = false;
  let lastStarted = -1;
  rows.forEach((row, i) => {
    if (row.startedMs !== null) {
      projected.push(row.startedMs);
      anyStarted = true;
      lastStarted = i;
      return;
    }
    let at = row.scheduledMs;
    if (i > 0) {
      const chained = projected[i - 1] + cycleMs;
      // Running ahead needs evidence (an actual start to chain from), and after a break the
      // field restarts at the scheduled time, not earlier.
      const runAhead = settings.allowRunningAhead && anyStarted && !isBreakBefore(i);
      at = runAhead ? chained : Math.max(row.scheduledMs, chained);
    }
    // The field has not started it, so it cannot start in the past.
    projected.push(Math.max(at, nowMs));
  });

  // The field's next match is the one after the last started one (the field runs in order; an
  // earlier match left unmarked is more likely a forgotten tap than the field's pace).
  // `|| 0`: a delay under half a second early rounds to -0, which a deep-equal tells from 0.
  const next = lastStarted + 1;
  const delaySeconds = next < rows.length ? Math.round((projected[next] - rows[next].scheduledMs) / 1000) || 0 : 0;

  const queueAtOf = (i: number): number => {
    const lead = settings.queueLead;
    if ('minutes' in lead) return projected[i] - lead.minutes * MINUTE_MS;
    const byCycles = projected[i] - lead.matches * cycleMs;
    const before = i - lead.matches;
    if (before < 0) return byCycles;
    // Across lunch or a night, nobody queues before the break for the first matches after it.
    return breaksUpTo[i] - breaksUpTo[before] > 0 ? Math.max(projected[before], byCycles) : projected[before];
  };

  const ourMatches: OurMatchJson[] = [];
  let previousOurs = -1;
  rows.forEach((row, i) => {
    if (row.alliance === null) return;
    if (row.startedMs === null) {
      const queueAt = queueAtOf(i);
      let turnaroundMinutes: number | null = null;
      let tight = false;
      if (previousOurs >= 0) {
        const backInPit =
          projected[previousOurs] + settings.matchLengthSeconds * 1000 + settings.returnToPitMinutes * MINUTE_MS;
        const windowMs = queueAt - backInPit;
        // Rounded down: the crew plans with minutes it surely has.
        turnaroundMinutes = Math.floor(windowMs / MINUTE_MS);
        tight = windowMs < settings.tightTurnaroundMinutes * MINUTE_MS;
      }
      ourMatches.push({
        matchId: row.match.id,
        level: row.match.level,
        number: row.match.number,
        alliance: row.alliance,
        projectedStart: new Date(projected[i]).toISOString(),
        queueAt: new Date(queueAt).toISOString(),
        turnaroundMinutes,
        tight,
      });
    }
    previousOurs = i;
  });

  return {
    cycleSeconds,
    delaySeconds,
    matches: rows.map((row, i) => ({
      id: row.match.id,
      level: row.match.level,
      number: row.match.number,
      scheduledStart: new Date(row.scheduledMs).toISOString(),
      projectedStart: new Date(projected[i]).toISOString(),
      startedAt: row.startedMs === null ? null : new Date(row.startedMs).toISOString(),
      ours: row.alliance !== null,
      alliance: row.alliance,
    })),
    ourMatches,
  };
}
