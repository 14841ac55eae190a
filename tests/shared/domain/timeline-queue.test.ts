import { describe, expect, it } from 'vitest';
import { computeTimeline, type TimelineMatch } from '../../../shared/domain/timeline';
import { formatClock, minutesBetween } from '../../../shared/domain/event-clock';
import { plan, projections, settings, SEVEN, t } from './timeline-fixtures';

describe('computeTimeline: queue and turnaround', () => {
  // Nothing started; the cycle falls back to the scheduled 7 min. We are red in 1, blue in 5.
  const QUEUE = plan(SEVEN.slice(0, 6), { ours: { 1: 'red', 5: 'blue' } });

  it('queue by matches: the projected start of the match N places before ours', () => {
    // Match 1 has no 2 matches before it: 09:00 − 2 × 7 min = 08:46. Match 5: match 3 = 09:14.
    // Turnaround for 5: 09:00 + 2:30 + 5:00 = 09:07:30 → 09:14 = 6.5 → 6 min, tight.
    const result = computeTimeline(QUEUE, settings({ queueLead: { matches: 2 } }), t('08:30'));
    expect(result.ourMatches.map((m) => [m.number, m.queueAt, m.turnaroundMinutes, m.tight])).toEqual([
      [1, t('08:46'), null, false],
      [5, t('09:14'), 6, true],
    ]);
  });

  it('queue by minutes: ours minus M minutes', () => {
    // 15 min: 09:00 → 08:45 and 09:28 → 09:13. Turnaround for 5: 09:07:30 → 09:13 = 5.5 → 5.
    const result = computeTimeline(QUEUE, settings({ queueLead: { minutes: 15 } }), t('08:30'));
    expect(result.ourMatches.map((m) => [m.number, m.queueAt, m.turnaroundMinutes, m.tight])).toEqual([
      [1, t('08:45'), null, false],
      [5, t('09:13'), 5, true],
    ]);
  });

  it('tight turnaround: under the threshold, not at or over it', () => {
    // We play 2 (09:07), 6 (09:35) and 12 (10:17); queue 2 matches before.
    // 6: back at 09:07 + 7:30 = 09:14:30, queue at match 4 = 09:21 → 6.5 → 6 min, tight.
    // 12: back at 09:35 + 7:30 = 09:42:30, queue at match 10 = 10:03 → 20.5 → 20 min: not
    // under 20, so not tight; with a 21-minute threshold it is.
    const matches = plan(SEVEN, { ours: { 2: 'red', 6: 'blue', 12: 'red' } });
    const result = computeTimeline(matches, settings(), t('08:00'));
    expect(result.ourMatches).toEqual([
      {
        matchId: 'qualification-2',
        level: 'qualification',
        number: 2,
        alliance: 'red',
        projectedStart: t('09:07'),
        queueAt: t('08:53'),
        turnaroundMinutes: null,
        tight: false,
      },
      {
        matchId: 'qualification-6',
        level: 'qualification',
        number: 6,
        alliance: 'blue',
        projectedStart: t('09:35'),
        queueAt: t('09:21'),
        turnaroundMinutes: 6,
        tight: true,
      },
      {
        matchId: 'qualification-12',
        level: 'qualification',
        number: 12,
        alliance: 'red',
        projectedStart: t('10:17'),
        queueAt: t('10:03'),
        turnaroundMinutes: 20,
        tight: false,
      },
    ]);
    const stricter = computeTimeline(matches, settings({ tightTurnaroundMinutes: 21 }), t('08:00'));
    expect(stricter.ourMatches.map((m) => m.tight)).toEqual([false, true, true]);
    // Exactly at the threshold: 5.5 min back to the pit → back at 09:43, 09:43 → 10:03 = 20.0.
    const atThreshold = computeTimeline(matches, settings({ returnToPitMinutes: 5.5 }), t('08:00'));
    expect(atThreshold.ourMatches[2]).toMatchObject({ turnaroundMinutes: 20, tight: false });
  });
});

describe('computeTimeline: order, edges and input', () => {
  it('orders by scheduled start, then level, then number', () => {
    const matches: TimelineMatch[] = [
      ...plan(['10:07'], { level: 'qualification' }).map((m) => ({ ...m, id: 'q2', number: 2 })),
      ...plan(['15:00'], { level: 'playoff' }).map((m) => ({ ...m, id: 'po1' })),
      ...plan(['10:00'], { level: 'qualification' }).map((m) => ({ ...m, id: 'q1' })),
      ...plan(['10:00'], { level: 'practice' }).map((m) => ({ ...m, id: 'p4', number: 4 })),
      ...plan(['10:00'], { level: 'practice' }).map((m) => ({ ...m, id: 'p3', number: 3 })),
    ];
    const result = computeTimeline(matches, settings(), t('08:00'));
    expect(result.matches.map((m) => m.id)).toEqual(['p3', 'p4', 'q1', 'q2', 'po1']);
  });

  it('nothing left to play: no delay and none of ours listed', () => {
    const result = computeTimeline(
      plan(['09:00', '09:07'], { started: { 1: '09:02', 2: '09:09' }, ours: { 2: 'red' } }),
      settings(),
      t('12:00'),
    );
    expect(result).toMatchObject({ cycleSeconds: 420, delaySeconds: 0, ourMatches: [] });
    expect(result.matches[1]).toMatchObject({ ours: true, alliance: 'red', projectedStart: t('09:09') });
  });

  it('a delay under half a second early is 0, not -0', () => {
    // Running ahead: starts 09:00:00 and 09:06:59.600 → cycle round(419.6 s) = 420 s; match 3 at
    // 09:13:59.600, 0.4 s before its 09:14 → delay rounds to 0 (Object.is(-0, 0) is false).
    const result = computeTimeline(
      plan(SEVEN.slice(0, 3), { started: { 1: '09:00', 2: '2027-04-10T09:06:59.600Z' } }),
      settings({ allowRunningAhead: true }),
      t('09:07:30'),
    );
    expect(result.matches[2].projectedStart).toBe('2027-04-10T09:13:59.600Z');
    expect(Object.is(result.delaySeconds, 0)).toBe(true);
  });

  it('an empty schedule', () => {
    expect(computeTimeline([], settings(), t('08:00'))).toEqual({
      cycleSeconds: 0,
      delaySeconds: 0,
      matches: [],
      ourMatches: [],
    });
  });

  it('answers instants in UTC whatever offset they came with', () => {
    // 11:00 at +02:00 is 09:00Z.
    const result = computeTimeline(plan(['2027-04-10T11:00:00+02:00']), settings(), '2027-04-10T08:00:00Z');
    expect(result.matches[0].scheduledStart).toBe('2027-04-10T09:00:00.000Z');
  });

  it('refuses an instant without an offset (it would be read in the machine’s own zone)', () => {
    expect(() => computeTimeline(plan(['2027-04-10T09:00:00']), settings(), t('08:00'))).toThrow(RangeError);
    expect(() => computeTimeline([], settings(), 'soon')).toThrow(/now/);
  });
});

// Checked against the IANA time zone database (tzdata) as the runtime's Intl ships it:
// America/New_York leaves EST (UTC−5) for EDT (UTC−4) at 02:00 local on Sunday 2027-03-14.
describe('computeTimeline across the change to daylight saving time (IANA tzdata via Intl, America/New_York)', () => {
  const ZONE = 'America/New_York';
  const intlClock = (iso: string) =>
    new Intl.DateTimeFormat('en-US', { timeZone: ZONE, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(
      new Date(iso),
    );

  // Every 7 minutes through the night: 01:48 EST = 06:48Z, 01:55 EST = 06:55Z, then
  // 06:55Z + 7 min = 07:02Z = 03:02 EDT and 07:09Z = 03:09 EDT.
  const NIGHT = ['2027-03-14T06:48:00Z', '2027-03-14T06:55:00Z', '2027-03-14T07:02:00Z', '2027-03-14T07:09:00Z'];

  it('a match 7 minutes after 01:55 EST shows as 03:02 EDT, 7 minutes later, not 67', () => {
    const matches = plan(NIGHT, { started: { 1: '2027-03-14T06:48:00Z', 2: '2027-03-14T06:55:00Z' } });
    const result = computeTimeline(matches, settings(), '2027-03-14T06:56:00Z');
    expect(result.cycleSeconds).toBe(420);
    expect(result.delaySeconds).toBe(0);
    const clocks = result.matches.map((m) => formatClock(m.projectedStart, ZONE));
    expect(clocks).toEqual(['01:48', '01:55', '03:02', '03:09']);
    expect(clocks).toEqual(result.matches.map((m) => intlClock(m.projectedStart)));
    expect(minutesBetween(result.matches[1].projectedStart, result.matches[2].projectedStart)).toBe(7);
  });

  it('the skipped hour is no scheduled break: a field running ahead keeps its pace through it', () => {
    // Actual starts 06:48Z and 06:53Z → cycle 5 min; running ahead allowed.
    // Match 3: 06:53Z + 5 = 06:58Z (01:58 EST); match 4: 07:03Z (03:03 EDT). On wall clocks the
    // scheduled gap 01:55 → 03:02 would be 67 min, over 2 cycles, a "break" holding match 3 at 03:02.
    const matches = plan(NIGHT, { started: { 1: '2027-03-14T06:48:00Z', 2: '2027-03-14T06:53:00Z' } });
    const result = computeTimeline(matches, settings({ allowRunningAhead: true }), '2027-03-14T06:54:00Z');
    expect(result.cycleSeconds).toBe(300);
    expect(projections(result).slice(2)).toEqual(['2027-03-14T06:58:00.000Z', '2027-03-14T07:03:00.000Z']);
    expect(result.matches.slice(2).map((m) => intlClock(m.projectedStart))).toEqual(['01:58', '03:03']);
    expect(result.delaySeconds).toBe(-240);
  });

  it('the turnaround over the night of the change is an hour shorter than the wall clocks say', () => {
    // Saturday 17:46 EST = 22:46Z and 17:53 EST = 22:53Z (ours, red); Sunday 09:00 EDT = 13:00Z
    // (ours, blue) and 09:07 EDT = 13:07Z. Queue 15 minutes before: 12:45Z = 08:45 EDT.
    // Back in the pit Saturday: 22:53Z + 2:30 + 5:00 = 23:00:30Z (18:00:30 EST).
    // 23:00:30Z → 12:45Z = 13 h 44.5 min = 824.5 → 824 min; the wall clocks (18:00:30 → 08:45)
    // would say 884.
    const matches = plan(
      ['2027-03-13T22:46:00Z', '2027-03-13T22:53:00Z', '2027-03-14T13:00:00Z', '2027-03-14T13:07:00Z'],
      { ours: { 2: 'red', 3: 'blue' } },
    );
    const result = computeTimeline(matches, settings({ queueLead: { minutes: 15 } }), '2027-03-13T12:00:00Z');
    const sunday = result.ourMatches[1];
    expect(sunday).toMatchObject({ queueAt: '2027-03-14T12:45:00.000Z', turnaroundMinutes: 824, tight: false });
    expect(formatClock(sunday.queueAt, ZONE)).toBe('08:45');
    expect(intlClock(sunday.queueAt)).toBe('08:45');
    expect(formatClock(result.ourMatches[0].projectedStart, ZONE)).toBe(intlClock('2027-03-13T22:53:00Z'));
  });
});
