import type { Alliance, MatchLevel } from '@shared/domain/timeline';

const LEVEL_NAMES: Record<MatchLevel, string> = {
  practice: 'Practice',
  qualification: 'Qualification',
  playoff: 'Playoff',
};

/** "Qualification 14": how the field announcer and the queue card say it. */
export function matchName(level: MatchLevel, number: number): string {
  return `${LEVEL_NAMES[level]} ${number}`;
}

/** "Q14", for tight rows on a phone; always paired with the full name for screen readers. */
export function matchShortName(level: MatchLevel, number: number): string {
  return `${LEVEL_NAMES[level][0]}${number}`;
}

/** The word every alliance colour is shown with, so colour is never the only signal. */
export function allianceWord(alliance: Alliance): 'RED' | 'BLUE' {
  return alliance === 'red' ? 'RED' : 'BLUE';
}

const pad = (value: number) => String(value).padStart(2, '0');

/** A duration as "1:05:09" or "12:04" (whole seconds, sign dropped). */
export function formatDuration(ms: number): string {
  const total = Math.floor(Math.abs(ms) / 1000);
  const hours = Math.floor(total / 3600);
  const minutes = Math.floor((total % 3600) / 60);
  const seconds = total % 60;
  return hours > 0 ? `${hours}:${pad(minutes)}:${pad(seconds)}` : `${minutes}:${pad(seconds)}`;
}

/** Observed cycle in min:ss, e.g. 420 → "7:00". */
export function formatCycle(cycleSeconds: number): string {
  return formatDuration(cycleSeconds * 1000);
}

/** The field's delay in words: "running 12 min late", "on time", "3 min ahead". */
export function describeDelay(delaySeconds: number): string {
  // Under a minute either way is noise from the tap on "On the field now", not a trend.
  const minutes = Math.round(delaySeconds / 60);
  if (minutes === 0) return 'on time';
  return minutes > 0 ? `running ${minutes} min late` : `${-minutes} min ahead`;
}

/** "12 min", "1 h 5 min", "−3 min" (back to back), for turnaround windows. */
export function formatMinutes(minutes: number): string {
  const sign = minutes < 0 ? '−' : '';
  const abs = Math.abs(minutes);
  if (abs < 60) return `${sign}${abs} min`;
  return `${sign}${Math.floor(abs / 60)} h ${abs % 60} min`;
}

/** Under this long before the queue call, the board and the pit screen say so loudly. */
export const QUEUE_WARNING_MS = 5 * 60_000;

/** True when the queue call is under five minutes away, or already past. */
export const isQueueSoon = (queueAt: string, now: Date) => Date.parse(queueAt) - now.getTime() < QUEUE_WARNING_MS;

/**
 * Who is with us and who against, from the match's alliances (unknown while they load), with
 * the words both views label them by.
 */
export function lineupOf(
  alliance: Alliance,
  teams: { red: readonly number[]; blue: readonly number[] } | undefined,
  teamNumber: number,
) {
  const ours = teams ? (alliance === 'red' ? teams.red : teams.blue) : undefined;
  return {
    word: allianceWord(alliance),
    opponentWord: allianceWord(alliance === 'red' ? 'blue' : 'red'),
    partners: ours?.filter((team) => team !== teamNumber),
    opponents: teams ? (alliance === 'red' ? teams.blue : teams.red) : undefined,
  };
}
