import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { compareUrgency, placeByUrgency, REPAIR_SEVERITIES, urgencyOf, type UrgencyTicket } from '../../../shared/domain/repair-urgency';

// Urgency is the product's own rule (DESIGN §4.5), not a published formula: these cases are worked by hand.
const NOW = new Date('2026-03-14T15:00:00Z');
const inMinutes = (minutes: number) => new Date(NOW.getTime() + minutes * 60_000).toISOString();

function ticket(overrides: Partial<UrgencyTicket> = {}): UrgencyTicket {
  return {
    id: 't1',
    severity: 'blocks_match',
    status: 'reported',
    estimateMinutes: null,
    timeSpentMinutes: 0,
    reportedAt: '2026-03-14T14:00:00Z',
    ...overrides,
  };
}

describe('urgencyOf', () => {
  it('is needed by the next queue call, with the whole minutes left rounded down', () => {
    expect(urgencyOf(ticket(), inMinutes(18.9), NOW)).toEqual({ neededBy: inMinutes(18.9), minutesLeft: 18, remainingMinutes: null, late: false });
  });

  it('counts the work left as the estimate less the time spent, never below zero', () => {
    expect(urgencyOf(ticket({ estimateMinutes: 30, timeSpentMinutes: 12 }), inMinutes(40), NOW).remainingMinutes).toBe(18);
    expect(urgencyOf(ticket({ estimateMinutes: 10, timeSpentMinutes: 25 }), inMinutes(40), NOW).remainingMinutes).toBe(0);
  });

  it('flags a blocking ticket late when its work left is longer than the minutes left', () => {
    expect(urgencyOf(ticket({ estimateMinutes: 25 }), inMinutes(20), NOW).late).toBe(true);
    expect(urgencyOf(ticket({ estimateMinutes: 20 }), inMinutes(20), NOW).late).toBe(false);
  });

  it('flags a blocking ticket late once the queue call has come, estimate or not', () => {
    expect(urgencyOf(ticket(), inMinutes(0), NOW)).toMatchObject({ minutesLeft: 0, late: true });
    expect(urgencyOf(ticket(), inMinutes(-3), NOW)).toMatchObject({ minutesLeft: -3, late: true });
  });

  it('never flags a degraded or cosmetic ticket late: the robot can still play', () => {
    for (const severity of ['degraded', 'cosmetic'] as const) {
      expect(urgencyOf(ticket({ severity, estimateMinutes: 90 }), inMinutes(5), NOW)).toMatchObject({ minutesLeft: 5, late: false });
    }
  });

  it('has no needed-by when done, or when no match of ours is ahead', () => {
    expect(urgencyOf(ticket({ status: 'done', estimateMinutes: 30 }), inMinutes(5), NOW)).toEqual({ neededBy: null, minutesLeft: null, remainingMinutes: 30, late: false });
    expect(urgencyOf(ticket(), null, NOW)).toEqual({ neededBy: null, minutesLeft: null, remainingMinutes: null, late: false });
  });
});

describe('compareUrgency', () => {
  it('puts blocking before degraded before cosmetic, whatever the work left', () => {
    const blocking = ticket({ id: 'a', severity: 'blocks_match' });
    const degraded = ticket({ id: 'b', severity: 'degraded', estimateMinutes: 60 });
    const cosmetic = ticket({ id: 'c', severity: 'cosmetic', estimateMinutes: 90 });
    expect([cosmetic, blocking, degraded].sort(compareUrgency).map((t) => t.id)).toEqual(['a', 'b', 'c']);
  });

  it('within a severity, puts the one with more work left first: it has the least slack to the same queue call', () => {
    const quick = ticket({ id: 'quick', estimateMinutes: 5 });
    const long = ticket({ id: 'long', estimateMinutes: 40, timeSpentMinutes: 10 });
    const unknown = ticket({ id: 'unknown' });
    expect([quick, unknown, long].sort(compareUrgency).map((t) => t.id)).toEqual(['long', 'quick', 'unknown']);
  });

  it('then the one reported earlier, then by id, so the order is total', () => {
    const early = ticket({ id: 'z', reportedAt: '2026-03-14T13:00:00Z' });
    const late = ticket({ id: 'a', reportedAt: '2026-03-14T14:30:00Z' });
    expect(compareUrgency(early, late)).toBeLessThan(0);
    expect(compareUrgency(ticket({ id: 'a' }), ticket({ id: 'b' }))).toBeLessThan(0);
    expect(compareUrgency(ticket({ id: 'a' }), ticket({ id: 'a' }))).toBe(0);
  });
});

describe('placeByUrgency', () => {
  const card = (id: string, severity: UrgencyTicket['severity'], placedByHand = false) => ({ ...ticket({ id, severity }), placedByHand });

  it('goes before the first less urgent card', () => {
    const column = [card('b1', 'blocks_match'), card('d1', 'degraded'), card('c1', 'cosmetic')];
    expect(placeByUrgency(column, ticket({ id: 'new', severity: 'degraded', reportedAt: '2026-03-14T14:59:00Z' }))).toEqual({ afterId: 'd1', beforeId: 'c1' });
  });

  it('goes to the top of a column of less urgent cards, and to the end when none is less urgent', () => {
    expect(placeByUrgency([card('c1', 'cosmetic')], ticket({ id: 'new' }))).toEqual({ afterId: null, beforeId: 'c1' });
    expect(placeByUrgency([card('b1', 'blocks_match')], ticket({ id: 'new', severity: 'cosmetic' }))).toEqual({ afterId: 'b1', beforeId: null });
    expect(placeByUrgency([], ticket())).toEqual({ afterId: null, beforeId: null });
  });

  it('passes over a card a lead placed by hand, which keeps its place', () => {
    const column = [card('pinned-cosmetic', 'cosmetic', true), card('d1', 'degraded')];
    expect(placeByUrgency(column, ticket({ id: 'new', severity: 'blocks_match' }))).toEqual({ afterId: 'pinned-cosmetic', beforeId: 'd1' });
  });

  it('ignores the ticket itself when it is already in the column (re-placed after an edit)', () => {
    const column = [card('t1', 'cosmetic'), card('d1', 'degraded')];
    expect(placeByUrgency(column, ticket({ id: 't1', severity: 'blocks_match' }))).toEqual({ afterId: null, beforeId: 'd1' });
  });

  const arbitraryTicket = fc.record({
    id: fc.uuid(),
    severity: fc.constantFrom(...REPAIR_SEVERITIES),
    status: fc.constant('reported' as const),
    estimateMinutes: fc.option(fc.integer({ min: 0, max: 120 }), { nil: null }),
    timeSpentMinutes: fc.integer({ min: 0, max: 120 }),
    reportedAt: fc.integer({ min: 0, max: 600 }).map((minutes) => new Date(Date.UTC(2026, 2, 14, 8) + minutes * 60_000).toISOString()),
  });

  it('keeps a column in urgency order when every card is placed by it, one card at a time (property)', () => {
    fc.assert(
      fc.property(fc.uniqueArray(arbitraryTicket, { selector: (t) => t.id, maxLength: 25 }), (tickets) => {
        const column: (UrgencyTicket & { placedByHand: boolean })[] = [];
        for (const next of tickets) {
          const { afterId } = placeByUrgency(column, next);
          const index = afterId === null ? 0 : column.findIndex((c) => c.id === afterId) + 1;
          column.splice(index, 0, { ...next, placedByHand: false });
        }
        expect(column.map((c) => c.id)).toEqual([...tickets].sort(compareUrgency).map((t) => t.id));
      }),
    );
  });

  it('never moves a card placed by hand relative to the others placed by hand (property)', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.tuple(arbitraryTicket, fc.boolean()), { selector: ([t]) => t.id, minLength: 1, maxLength: 20 }), arbitraryTicket, (cards, next) => {
        fc.pre(!cards.some(([t]) => t.id === next.id));
        const column = cards.map(([t, byHand]) => ({ ...t, placedByHand: byHand }));
        const { afterId, beforeId } = placeByUrgency(column, next);
        const afterIndex = afterId === null ? -1 : column.findIndex((c) => c.id === afterId);
        const beforeIndex = beforeId === null ? column.length : column.findIndex((c) => c.id === beforeId);
        // The place is a real gap between neighbours, and never in front of a card it is less urgent than (unless placed by hand).
        expect(beforeIndex).toBe(afterIndex + 1);
        for (const passed of column.slice(0, afterIndex + 1)) {
          if (!passed.placedByHand) expect(compareUrgency(next, passed)).toBeGreaterThanOrEqual(0);
        }
      }),
    );
  });
});
