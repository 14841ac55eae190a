/**
 * Display of instants in the event's IANA time zone, and the one way back from a printed local
 * schedule to instants. Durations are always differences of instants, never of wall clocks, so
 * they stay right on the weekend the clocks change.
 */
import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import { toInstantMs } from './timeline';

const LOCAL_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const LOCAL_TIME = /^(\d{2}):(\d{2})$/;

function inZone(instant: Date | string, timeZone: string): TZDate {
  return new TZDate(toInstantMs(instant), timeZone);
}

/** Local wall-clock time `HH:mm` (24-hour, so it sorts and never needs AM/PM) in the zone. */
export function formatClock(instant: Date | string, timeZone: string): string {
  return format(inZone(instant, timeZone), 'HH:mm');
}

/** Local calendar date `yyyy-MM-dd` in the zone: the event day a match belongs to. */
export function localDate(instant: Date | string, timeZone: string): string {
  return format(inZone(instant, timeZone), 'yyyy-MM-dd');
}

/**
 * Short zone name at that instant (`EST`, `EDT` in en-US), shown next to clocks on the
 * weekend they change; where the locale has no abbreviation, Intl gives `GMT-5` and the like.
 */
export function zoneAbbreviation(instant: Date | string, timeZone: string, locale = 'en-US'): string {
  const parts = new Intl.DateTimeFormat(locale, { timeZone, timeZoneName: 'short' }).formatToParts(
    new Date(toInstantMs(instant)),
  );
  return parts.find((part) => part.type === 'timeZoneName')?.value ?? timeZone;
}

/** Elapsed minutes from one instant to another (negative when `to` is earlier); not rounded. */
export function minutesBetween(from: Date | string, to: Date | string): number {
  return (toInstantMs(to) - toInstantMs(from)) / 60_000;
}

/**
 * The instant of a printed local date and time (`yyyy-MM-dd`, `HH:mm`) in the zone, for
 * importing a schedule. A time the clocks skip (02:30 on a spring-forward night) is a typo in
 * the schedule and throws; a time that happens twice (autumn) is read as the first one.
 */
export function localTimeToInstant(date: string, time: string, timeZone: string): Date {
  const d = LOCAL_DATE.exec(date);
  const t = LOCAL_TIME.exec(time);
  if (!d || !t) throw new RangeError(`Not a local date and time: ${date} ${time}`);
  const [year, month, day, hour, minute] = [d[1], d[2], d[3], t[1], t[2]].map(Number);
  // TZDate resolves a skipped time forward and a repeated one to the earlier instant; the
  // round trip below catches the skipped (and out-of-range, e.g. 24:00 or 02-30) ones.
  const zoned = new TZDate(year, month - 1, day, hour, minute, timeZone);
  if (Number.isNaN(zoned.getTime()) || format(zoned, 'yyyy-MM-dd HH:mm') !== `${date} ${time}`) {
    throw new RangeError(`${date} ${time} does not exist in ${timeZone}`);
  }
  return new Date(zoned.getTime());
}
