import { describe, expect, it } from 'vitest';
import {
  formatClock,
  localDate,
  localTimeToInstant,
  minutesBetween,
  zoneAbbreviation,
} from '../../../shared/domain/event-clock';

// Expected values come from the IANA time zone database (tzdata): America/New_York is EST
// (UTC−5) until 02:00 local on Sunday 2027-03-14, then EDT (UTC−4); back to EST at 02:00 EDT on
// Sunday 2027-11-07. Each display is also checked against Intl, which carries that database.
const ZONE = 'America/New_York';
const intl = (iso: string, options: Intl.DateTimeFormatOptions) =>
  new Intl.DateTimeFormat('en-US', { timeZone: ZONE, ...options }).format(new Date(iso));
const intlClock = (iso: string) => intl(iso, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });

describe('event clock on the weekend of 2027-03-13/14 in America/New_York (IANA tzdata via Intl)', () => {
  const instants = [
    ['2027-03-13T14:00:00Z', '09:00', 'EST', '2027-03-13'], // Saturday morning, UTC−5
    ['2027-03-14T03:30:00Z', '22:30', 'EST', '2027-03-13'], // still Saturday locally
    ['2027-03-14T06:55:00Z', '01:55', 'EST', '2027-03-14'],
    ['2027-03-14T07:02:00Z', '03:02', 'EDT', '2027-03-14'], // 7 minutes later, after the change
    ['2027-03-14T13:00:00Z', '09:00', 'EDT', '2027-03-14'], // Sunday morning, UTC−4
  ] as const;

  for (const [iso, clock, zone, day] of instants) {
    it(`${iso} shows as ${clock} ${zone} on ${day}, as Intl says`, () => {
      expect(formatClock(iso, ZONE)).toBe(clock);
      expect(formatClock(iso, ZONE)).toBe(intlClock(iso));
      expect(zoneAbbreviation(iso, ZONE)).toBe(zone);
      expect(localDate(iso, ZONE)).toBe(day);
      expect(localDate(iso, ZONE)).toBe(
        intl(iso, { year: 'numeric', month: '2-digit', day: '2-digit' }).replace(/(\d+)\/(\d+)\/(\d+)/, '$3-$1-$2'),
      );
    });
  }

  it('durations are elapsed time: 01:55 EST → 03:02 EDT is 7 minutes, Saturday 09:00 → Sunday 09:00 is 23 hours', () => {
    expect(minutesBetween('2027-03-14T06:55:00Z', '2027-03-14T07:02:00Z')).toBe(7);
    expect(minutesBetween(new Date('2027-03-13T14:00:00Z'), '2027-03-14T13:00:00Z')).toBe(23 * 60);
    expect(minutesBetween('2027-03-14T07:02:00Z', '2027-03-14T06:55:00Z')).toBe(-7);
  });

  it('reads a printed local schedule into instants', () => {
    expect(localTimeToInstant('2027-03-13', '16:00', ZONE).toISOString()).toBe('2027-03-13T21:00:00.000Z');
    expect(localTimeToInstant('2027-03-14', '01:55', ZONE).toISOString()).toBe('2027-03-14T06:55:00.000Z');
    expect(localTimeToInstant('2027-03-14', '03:02', ZONE).toISOString()).toBe('2027-03-14T07:02:00.000Z');
  });

  it('refuses a time the clocks skip, and malformed input', () => {
    expect(() => localTimeToInstant('2027-03-14', '02:30', ZONE)).toThrow(/does not exist/);
    expect(() => localTimeToInstant('2027-02-30', '10:00', ZONE)).toThrow(/does not exist/);
    expect(() => localTimeToInstant('2027-03-14', '9:00', ZONE)).toThrow(RangeError);
    expect(() => formatClock('2027-03-14T07:02:00', ZONE)).toThrow(RangeError);
  });

  it('reads a time that happens twice (2027-11-07, 01:30) as the first, in EDT', () => {
    const first = localTimeToInstant('2027-11-07', '01:30', ZONE).toISOString();
    expect(first).toBe('2027-11-07T05:30:00.000Z');
    expect(zoneAbbreviation(first, ZONE)).toBe('EDT');
    // One hour later the clocks show 01:30 again, now in EST.
    expect(formatClock('2027-11-07T06:30:00Z', ZONE)).toBe('01:30');
    expect(zoneAbbreviation('2027-11-07T06:30:00Z', ZONE)).toBe('EST');
  });
});
