import { describe, expect, it } from 'vitest';
import { computeTimeline, type Alliance } from '../../../shared/domain/timeline';
import { plan, projections, settings, SEVEN, t } from './timeline-fixtures';

describe('computeTimeline: worked examples', () => {
  it('on schedule: the full answer', () => {
    // Matches 1–3 started exactly on time: gaps 7, 7 → cycle = median(7, 7) = 7 min = 420 s.
    // Match 4: max(scheduled 09:21, 09:14 + 7 = 09:21) = 09:21, and so on: the schedule holds.
    // We are blue in match 5; queue 2 matches before = match 3, which started at 09:14.
    const result = computeTimeline(
      plan(SEVEN.slice(0, 6), { started: { 1: '09:00', 2: '09:07', 3: '09:14' }, ours: { 5: 'blue' } }),
      settings(),
      t('09:15:30'),
    );
    const row = (n: number, started: boolean, alliance: Alliance | null = null) => ({
      id: `qualification-${n}`,
      level: 'qualification',
      number: n,
      scheduledStart: t(SEVEN[n - 1]),
      projectedStart: t(SEVEN[n - 1]),
      startedAt: started ? t(SEVEN[n - 1]) : null,
      ours: alliance !== null,
      alliance,
    });
    expect(result).toEqual({
      cycleSeconds: 420,
      delaySeconds: 0,
      matches: [row(1, true), row(2, true), row(3, true), row(4, false), row(5, false, 'blue'), row(6, false)],
      ourMatches: [
        {
          matchId: 'qualification-5',
          level: 'qualification',
          number: 5,
          alliance: 'blue',
          projectedStart: t('09:28'),
          queueAt: t('09:14'),
          turnaroundMinutes: null,
          tight: false,
        },
      ],
    });
  });

  it('running 12 minutes late: median of the actual gaps, a field fault does not skew it', () => {
    // Actual starts 09:00, 09:07, 09:15, 09:31 (field fault), 09:38, 09:46 → gaps 7, 8, 16, 7, 8.
    // Sorted 7, 7, 8, 8, 16 → median 8 min = 480 s (a mean would say 9.2).
    // Match 7: max(09:42, 09:46 + 8 = 09:54) = 09:54 → 12 min late = 720 s.
    // Then 10:02, 10:10, 10:18 (each scheduled 7 later, projected 8 later).
    const result = computeTimeline(
      plan(SEVEN.slice(0, 10), {
        started: { 1: '09:00', 2: '09:07', 3: '09:15', 4: '09:31', 5: '09:38', 6: '09:46' },
        ours: { 5: 'red', 9: 'blue' },
      }),
      settings(),
      t('09:47'),
    );
    expect(result.cycleSeconds).toBe(480);
    expect(result.delaySeconds).toBe(720);
    expect(projections(result)).toEqual(
      ['09:00', '09:07', '09:15', '09:31', '09:38', '09:46', '09:54', '10:02', '10:10', '10:18'].map((c) => t(c)),
    );
    // Match 5 has started, so only match 9 is listed. Queue: 2 matches before = match 7 = 09:54.
    // Turnaround: match 5 started 09:38 + 2:30 match + 5:00 back to the pit = 09:45:30;
    // 09:45:30 → 09:54 = 8.5 min → 8 (rounded down), under 20 → tight.
    expect(result.ourMatches).toEqual([
      {
        matchId: 'qualification-9',
        level: 'qualification',
        number: 9,
        alliance: 'blue',
        projectedStart: t('10:10'),
        queueAt: t('09:54'),
        turnaroundMinutes: 8,
        tight: true,
      },
    ]);
  });

  it('uses only the last five gaps: a slow morning no longer counts', () => {
    // Gaps 12, 12, 12, 12, 7, 7, 7. All seven: median 12. Last five: 12, 12, 7, 7, 7 → 7.
    // Match 9: max(09:56, 10:09 + 7 = 10:16) = 10:16 → 20 min late.
    const result = computeTimeline(
      plan(SEVEN.slice(0, 9), {
        started: { 1: '09:00', 2: '09:12', 3: '09:24', 4: '09:36', 5: '09:48', 6: '09:55', 7: '10:02', 8: '10:09' },
      }),
      settings(),
      t('10:10'),
    );
    expect(result.cycleSeconds).toBe(420);
    expect(result.matches[8].projectedStart).toBe(t('10:16'));
    expect(result.delaySeconds).toBe(1200);
  });

  it('a match the field has not started is never projected before now (field stalled)', () => {
    // On time to match 3 (09:14); at 09:30 match 4 (due 09:21) has still not started.
    // Match 4: max(09:21, 09:14 + 7 = 09:21, now 09:30) = 09:30 → 9 min late = 540 s.
    // Match 5: max(09:28, 09:30 + 7) = 09:37; match 6: 09:44.
    const result = computeTimeline(
      plan(SEVEN.slice(0, 6), { started: { 1: '09:00', 2: '09:07', 3: '09:14' } }),
      settings(),
      new Date(t('09:30')),
    );
    expect(projections(result).slice(3)).toEqual([t('09:30'), t('09:37'), t('09:44')]);
    expect(result.delaySeconds).toBe(540);
  });

  it('a start marked out of order (before the previous one) is no evidence of the pace', () => {
    // Starts 09:00, 09:07, then 09:05 for match 3 (a slip of the finger): gaps 7 and −2.
    // The −2 is dropped → cycle 7, not median(7, −2) = 2.5 min.
    const result = computeTimeline(
      plan(SEVEN.slice(0, 4), { started: { 1: '09:00', 2: '09:07', 3: '09:05' } }),
      settings(),
      t('09:08'),
    );
    expect(result.cycleSeconds).toBe(420);
    expect(result.matches[3].projectedStart).toBe(t('09:21'));
  });

  it('a match nobody marked counts as one slot, not as a double cycle', () => {
    // Match 1 at 09:00, match 3 at 09:16, match 2 never marked: 16 min over 2 slots → cycle 8.
    // Match 2 is still "not started": max(09:07, 09:00 + 8, now 09:17) = 09:17.
    // Match 4 chains from match 3: max(09:21, 09:16 + 8 = 09:24) = 09:24; match 5: 09:32.
    // The field's next match is 4 (after the last started one): 09:24 − 09:21 = 3 min late.
    const result = computeTimeline(
      plan(SEVEN.slice(0, 5), { started: { 1: '09:00', 3: '09:16' } }),
      settings(),
      t('09:17'),
    );
    expect(result.cycleSeconds).toBe(480);
    expect(projections(result)).toEqual([t('09:00'), t('09:17'), t('09:16'), t('09:24'), t('09:32')]);
    expect(result.delaySeconds).toBe(180);
  });
});

describe('computeTimeline: breaks', () => {
  // Morning ends 11:51, lunch, afternoon from 13:00.
  const LUNCH = ['11:30', '11:37', '11:44', '11:51', '13:00', '13:07'];

  it('delay absorbed by lunch, and nobody queues before lunch for the first match after it', () => {
    // Started 11:38, 11:45, 11:52 (8 min late): gaps 7, 7 → cycle 7.
    // Match 4: max(11:51, 11:52 + 7) = 11:59 (8 late). Match 5: max(13:00, 11:59 + 7 = 12:06) = 13:00:
    // the 69-minute scheduled gap (> 2 cycles) swallowed the delay. Match 6: max(13:07, 13:07).
    // We are blue in match 5: 2 matches before is match 3, before lunch, so the queue call is
    // max(11:52, 13:00 − 2 × 7 min = 12:46) = 12:46.
    const result = computeTimeline(
      plan(LUNCH, { started: { 1: '11:38', 2: '11:45', 3: '11:52' }, ours: { 5: 'blue' } }),
      settings(),
      t('11:53'),
    );
    expect(result.cycleSeconds).toBe(420);
    expect(projections(result).slice(3)).toEqual([t('11:59'), t('13:00'), t('13:07')]);
    expect(result.delaySeconds).toBe(480);
    expect(result.ourMatches.map((m) => m.queueAt)).toEqual([t('12:46')]);
  });

  it('the gap across lunch is not a cycle', () => {
    // Started 11:52, 11:59, then 13:02 after lunch. Gaps: 7, and 63 across the break (dropped:
    // its scheduled gap, 69 min, is over 2 × the scheduled 7). Cycle = median(7) = 7, not
    // median(7, 63) = 35. Match 6: max(13:07, 13:02 + 7 = 13:09) = 13:09 → 2 min late.
    const result = computeTimeline(
      plan(LUNCH, { started: { 3: '11:52', 4: '11:59', 5: '13:02' } }),
      settings(),
      t('13:03'),
    );
    expect(result.cycleSeconds).toBe(420);
    expect(result.matches[5].projectedStart).toBe(t('13:09'));
    expect(result.delaySeconds).toBe(120);
  });

  it('until two matches have started the cycle is the median scheduled gap, which lunch cannot skew', () => {
    // Scheduled gaps 7, 7, 7, 69, 7 → median 7 (a mean would be 19.4). Match 1 started 11:35.
    // Match 2: max(11:37, 11:35 + 7 = 11:42) = 11:42, then 11:49, 11:56; lunch absorbs the rest.
    const result = computeTimeline(plan(LUNCH, { started: { 1: '11:35' } }), settings(), t('11:36'));
    expect(result.cycleSeconds).toBe(420);
    expect(projections(result)).toEqual(['11:35', '11:42', '11:49', '11:56', '13:00', '13:07'].map((c) => t(c)));
    expect(result.delaySeconds).toBe(300);
  });
});

describe('computeTimeline: running ahead', () => {
  // 7-minute schedule to match 7 (09:42), then a break until match 8 at 10:30.
  // The field has been running 5-minute cycles: 09:00, 09:05, 09:10, 09:15 → cycle 300 s.
  const AHEAD = plan([...SEVEN.slice(0, 7), '10:30'], {
    started: { 1: '09:00', 2: '09:05', 3: '09:10', 4: '09:15' },
    ours: { 7: 'red' },
  });

  it('not allowed: the schedule is the earliest start', () => {
    // Match 5: max(09:28, 09:15 + 5 = 09:20) = 09:28, and the schedule holds from there.
    const result = computeTimeline(AHEAD, settings({ allowRunningAhead: false }), t('09:16'));
    expect(result.cycleSeconds).toBe(300);
    expect(projections(result).slice(4)).toEqual([t('09:28'), t('09:35'), t('09:42'), t('10:30')]);
    expect(result.delaySeconds).toBe(0);
    expect(result.ourMatches[0].queueAt).toBe(t('09:28')); // match 5, 2 before ours
  });

  it('allowed: one cycle after the previous match, but a break restarts on schedule', () => {
    // Match 5: 09:15 + 5 = 09:20; 6: 09:25; 7: 09:30. Match 8 follows a 48-minute scheduled gap
    // (> 2 × 5): max(10:30, 09:35) = 10:30. Delay: 09:20 − 09:28 = −8 min = −480 s.
    const result = computeTimeline(AHEAD, settings({ allowRunningAhead: true }), t('09:16'));
    expect(projections(result).slice(4)).toEqual([t('09:20'), t('09:25'), t('09:30'), t('10:30')]);
    expect(result.delaySeconds).toBe(-480);
    expect(result.ourMatches[0].queueAt).toBe(t('09:20'));
  });

  it('allowed, but still never before now', () => {
    // Now 09:22 and match 5 has not started: max(09:15 + 5 = 09:20, now) = 09:22; then 09:27.
    const result = computeTimeline(AHEAD, settings({ allowRunningAhead: true }), t('09:22'));
    expect(projections(result).slice(4, 6)).toEqual([t('09:22'), t('09:27')]);
    expect(result.delaySeconds).toBe(-360);
  });

  it('allowed, but not before the field has started anything', () => {
    // Scheduled gaps 7, 7, 9 → cycle 7. Chaining would put match 4 at 09:14 + 7 = 09:21;
    // with no actual start to show the pace, the schedule (09:23) holds.
    const result = computeTimeline(
      plan(['09:00', '09:07', '09:14', '09:23']),
      settings({ allowRunningAhead: true }),
      t('08:00'),
    );
    expect(projections(result)).toEqual([t('09:00'), t('09:07'), t('09:14'), t('09:23')]);
  });
});
