/**
 * The demo event's invented qualification schedule: 60 teams, 80 matches over two days with a
 * lunch break on each, our team in 11 of them, and the field partway through the first day,
 * running a few minutes late. Anchored to "now" so the board is alive whenever the demo starts.
 */
const TEAM_COUNT = 60;
const MATCH_COUNT = 80;
const CYCLE_MS = 7 * 60_000;
const LUNCH_MS = 60 * 60_000;
const NIGHT_MS = 15 * 60 * 60_000;
// Matches before lunch and after it on day one; the rest is day two's morning.
const DAY_ONE_MORNING = 26;
const DAY_ONE_TOTAL = 56;
const MATCHES_PLAYED = 20;
const RUNNING_LATE_MS = 4 * 60_000;
// Our matches, by number: about every seventh, as a real draw spreads a team out.
const OUR_MATCHES = [3, 10, 17, 24, 31, 38, 45, 52, 59, 66, 73];

export interface DemoMatch {
  number: number;
  scheduledStart: Date;
  startedAt: Date | null;
  red: [number, number, number];
  blue: [number, number, number];
}

/** A small seeded generator: the same demo on every machine. */
function generator(seed: number) {
  let state = seed;
  return () => {
    state = (state * 1_103_515_245 + 12_345) % 2_147_483_648;
    return state / 2_147_483_648;
  };
}

/** Invented five-digit team numbers above 20000, ours among them. */
function teamNumbers(ourNumber: number, random: () => number): number[] {
  const numbers = new Set<number>([ourNumber]);
  while (numbers.size < TEAM_COUNT) numbers.add(20001 + Math.floor(random() * 79_998));
  return [...numbers];
}

function startOffsetMs(index: number): number {
  if (index < DAY_ONE_MORNING) return index * CYCLE_MS;
  if (index < DAY_ONE_TOTAL) return index * CYCLE_MS + LUNCH_MS;
  return index * CYCLE_MS + LUNCH_MS + NIGHT_MS;
}

/** Builds the schedule so that match MATCHES_PLAYED + 1 is due about now. */
export function demoSchedule({ now, ourNumber }: { now: Date; ourNumber: number }): DemoMatch[] {
  const random = generator(28_417);
  const teams = teamNumbers(ourNumber, random);
  const others = teams.filter((team) => team !== ourNumber);
  // Whole minutes, as a printed schedule has.
  const dayStart = Math.floor(now.getTime() / 60_000) * 60_000 - MATCHES_PLAYED * CYCLE_MS - RUNNING_LATE_MS;
  let next = 0;
  const draw = () => others[next++ % others.length];

  return Array.from({ length: MATCH_COUNT }, (_, index) => {
    const number = index + 1;
    const lineup = [draw(), draw(), draw(), draw(), draw(), draw()];
    const ours = OUR_MATCHES.indexOf(number);
    // Alternate our colour so the demo shows both.
    if (ours >= 0) lineup[ours % 2 === 0 ? 1 : 4] = ourNumber;
    const scheduledStart = new Date(dayStart + startOffsetMs(index));
    const started = index < MATCHES_PLAYED;
    return {
      number,
      scheduledStart,
      startedAt: started ? new Date(scheduledStart.getTime() + Math.round((index / MATCHES_PLAYED) * RUNNING_LATE_MS)) : null,
      red: [lineup[0], lineup[1], lineup[2]],
      blue: [lineup[3], lineup[4], lineup[5]],
    };
  });
}
