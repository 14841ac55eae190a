import { TZDate, tzName } from '@date-fns/tz';
import { format, parseISO } from 'date-fns';

/**
 * Event dates are calendar days (YYYY-MM-DD), not instants: they are parsed as local midnight
 * and printed back without any zone arithmetic, so they read the same in every zone.
 */
export function formatDateRange(startDate: string, endDate: string): string {
  const start = parseISO(startDate);
  const end = parseISO(endDate);
  if (startDate === endDate) return format(start, 'EEE d MMM yyyy');
  const sameYear = start.getFullYear() === end.getFullYear();
  const sameMonth = sameYear && start.getMonth() === end.getMonth();
  const from = format(start, sameMonth ? 'EEE d' : sameYear ? 'EEE d MMM' : 'EEE d MMM yyyy');
  return `${from} – ${format(end, 'EEE d MMM yyyy')}`;
}

// Follow the reader's own habit (13:05 or 1:05 PM): a pit clock read in the wrong cycle is a missed queue call.
const uses12Hour = new Intl.DateTimeFormat(undefined, { hour: 'numeric' }).resolvedOptions().hour12 === true;

/** Wall-clock time in an IANA zone, e.g. "14:05:09" or "2:05:09 PM". */
export function formatZonedTime(instant: Date, timeZone: string, withSeconds = true): string {
  const { time, dayPeriod } = zonedClock(instant, timeZone, withSeconds);
  return dayPeriod ? `${time} ${dayPeriod}` : time;
}

/** The same, in parts, so a big clock can set "PM" smaller than the digits. */
export function zonedClock(instant: Date, timeZone: string, withSeconds = true): { time: string; dayPeriod: string | null } {
  const zoned = new TZDate(instant, timeZone);
  const seconds = withSeconds ? ':ss' : '';
  if (!uses12Hour) return { time: format(zoned, `HH:mm${seconds}`), dayPeriod: null };
  return { time: format(zoned, `h:mm${seconds}`), dayPeriod: format(zoned, 'a') };
}

/** Day in an IANA zone, e.g. "Sat 15 Mar". */
export function formatZonedDay(instant: Date, timeZone: string): string {
  return format(new TZDate(instant, timeZone), 'EEE d MMM');
}

/** Short zone name and UTC offset at that instant, e.g. "CDT · UTC-05:00"; both change with daylight saving. */
export function describeZone(instant: Date, timeZone: string): string {
  const utc = `UTC${format(new TZDate(instant, timeZone), 'xxx')}`;
  const short = tzName(timeZone, instant, 'short');
  return short.startsWith('GMT') || short === 'UTC' ? utc : `${short} · ${utc}`;
}

/** "America/Port_of_Spain" → "America / Port of Spain" for people rather than machines. */
export function readableZone(timeZone: string): string {
  return timeZone.replaceAll('_', ' ').replaceAll('/', ' / ');
}

/** An instant in the reader's own zone and clock habit, e.g. "Sat 12 Dec, 14:05", for mail and links. */
export function formatDateTime(at: string): string {
  return new Date(at).toLocaleString(undefined, { weekday: 'short', day: 'numeric', month: 'short', hour: 'numeric', minute: '2-digit' });
}

/** This device's time zone: the clock of a record outside any event. */
export const deviceTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone;
