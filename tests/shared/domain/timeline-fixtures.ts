import { computeTimeline, TIMELINE_DEFAULTS, type Alliance, type MatchLevel, type TimelineMatch, type TimelineSettings } from '../../../shared/domain/timeline';

// Invented data: our team is 24817, everyone else 30000 + 10 × match number + slot.
export const OURS = 24817;

/** `t('09:07')` → `2027-04-10T09:07:00.000Z`: the worked examples run on one UTC day. */
export const t = (clock: string) => `2027-04-10T${clock.length === 5 ? `${clock}:00` : clock}.000Z`;

/** Match `number` (1-based) at each scheduled clock; `started` and `ours` keyed by match number. */
export function plan(
  clocks: string[],
  marks: { started?: Record<number, string>; ours?: Record<number, Alliance>; level?: MatchLevel } = {},
): TimelineMatch[] {
  return clocks.map((clock, index) => {
    const number = index + 1;
    const base = 30000 + number * 10;
    const red: [number, number, number] = [base + 1, base + 2, base + 3];
    const blue: [number, number, number] = [base + 4, base + 5, base + 6];
    if (marks.ours?.[number] === 'red') red[1] = OURS;
    if (marks.ours?.[number] === 'blue') blue[2] = OURS;
    const started = marks.started?.[number];
    return {
      id: `${marks.level ?? 'qualification'}-${number}`,
      level: marks.level ?? 'qualification',
      number,
      scheduledStart: clock.includes('T') ? clock : t(clock),
      startedAt: started === undefined ? null : started.includes('T') ? started : t(started),
      red,
      blue,
    };
  });
}

export const settings = (override: Partial<TimelineSettings> = {}): TimelineSettings => ({
  ...TIMELINE_DEFAULTS,
  teamNumber: OURS,
  ...override,
});

export const projections = (result: ReturnType<typeof computeTimeline>) => result.matches.map((m) => m.projectedStart);

// A 7-minute cycle from 09:00: match n is scheduled at 09:00 + 7 × (n − 1).
export const SEVEN = ['09:00', '09:07', '09:14', '09:21', '09:28', '09:35', '09:42', '09:49', '09:56', '10:03', '10:10', '10:17'];
