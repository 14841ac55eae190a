import { expect, it } from 'vitest';
import { demoSchedule } from '../../server/db/seed/demo-schedule';

const now = new Date('2027-03-06T16:00:00.000Z');
const schedule = demoSchedule({ now, ourNumber: 28417 });

it('has 80 matches in order, six different invented five-digit teams above 20000 each', () => {
  expect(schedule).toHaveLength(80);
  for (const [index, match] of schedule.entries()) {
    expect(match.number).toBe(index + 1);
    const lineup = [...match.red, ...match.blue];
    expect(new Set(lineup).size).toBe(6);
    for (const team of lineup) expect(team).toBeGreaterThan(20000);
    for (const team of lineup) expect(team).toBeLessThan(100000);
    if (index > 0) expect(match.scheduledStart.getTime()).toBeGreaterThan(schedule[index - 1].scheduledStart.getTime());
  }
});

it('puts our team in 10 to 12 matches, on both alliances', () => {
  const ours = schedule.filter((match) => [...match.red, ...match.blue].includes(28417));
  expect(ours.length).toBeGreaterThanOrEqual(10);
  expect(ours.length).toBeLessThanOrEqual(12);
  expect(ours.some((match) => match.red.includes(28417))).toBe(true);
  expect(ours.some((match) => match.blue.includes(28417))).toBe(true);
});

it('has a lunch break and a night between the days, 7 minutes apart otherwise', () => {
  const gaps = schedule.slice(1).map((match, index) => (match.scheduledStart.getTime() - schedule[index].scheduledStart.getTime()) / 60_000);
  expect(gaps.filter((gap) => gap === 7)).toHaveLength(77);
  expect(gaps.filter((gap) => gap === 67)).toHaveLength(1); // lunch: one hour plus a cycle
  expect(gaps.filter((gap) => gap === 907)).toHaveLength(1); // the night: 15 hours plus a cycle
});

it('has the field partway through day one, running late, with the next match due about now', () => {
  const started = schedule.filter((match) => match.startedAt !== null);
  expect(started.map((match) => match.number)).toEqual(Array.from({ length: 20 }, (_, index) => index + 1));
  for (const match of started) expect(match.startedAt!.getTime()).toBeGreaterThanOrEqual(match.scheduledStart.getTime());
  // Match 21 was due 4 minutes ago: 20 cycles after a start 20 cycles and 4 minutes before now.
  expect(schedule[20].scheduledStart.toISOString()).toBe('2027-03-06T15:56:00.000Z');
});

it('has a match of ours played and the next one still to come, which the demo checklists use', () => {
  const ours = schedule.filter((match) => [...match.red, ...match.blue].includes(28417));
  expect(ours.filter((match) => match.startedAt !== null).at(-1)?.number).toBe(17);
  expect(ours.find((match) => match.startedAt === null)?.number).toBe(24);
});
