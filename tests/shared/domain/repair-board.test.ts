import { describe, expect, it } from 'vitest';
import {
  columnOf,
  columnsOf,
  compareBoardOrder,
  keyBetween,
  landingOf,
  movedTicket,
  positionIn,
  type BoardCard,
  type BoardTicket,
} from '../../../shared/domain/repair-board';
import type { RepairStatus } from '../../../shared/domain/repair-urgency';

// Board order and placement are the product's own rules: these cases are worked by hand. The keys
// fractional-indexing makes are its documented ones: "a0" first, "a1" after, "Zz" before "a0",
// "a0V" between "a0" and "a1".
const NOW = new Date('2026-03-14T15:00:00Z');

const card = (id: string, status: RepairStatus, orderKey: string): BoardCard => ({ id, status, orderKey });

function ticket(id: string, status: RepairStatus, orderKey: string, overrides: Partial<BoardTicket> = {}): BoardTicket {
  return {
    id,
    status,
    orderKey,
    severity: 'degraded',
    estimateMinutes: null,
    timeSpentMinutes: 0,
    reportedAt: '2026-03-14T14:00:00Z',
    placedByHand: false,
    doneAt: null,
    ...overrides,
  };
}

const ids = (cards: readonly { id: string }[]) => cards.map((each) => each.id);

describe('compareBoardOrder', () => {
  it('compares order keys by code unit: digits, then capitals, then "_", then small letters', () => {
    // localeCompare ignores case and puts punctuation first: it would say a_, a0, ab, aV, aZ.
    const column = [card('1', 'reported', 'ab'), card('2', 'reported', 'a_'), card('3', 'reported', 'aZ'), card('4', 'reported', 'a0'), card('5', 'reported', 'aV')];
    expect(column.sort(compareBoardOrder).map((each) => each.orderKey)).toEqual(['a0', 'aV', 'aZ', 'a_', 'ab']);
  });

  it('orders by column first, whatever the keys: reported, in progress, needs test, done', () => {
    const cards = [card('d', 'done', 'a0'), card('n', 'needs_test', 'a0'), card('r', 'reported', 'z'), card('p', 'in_progress', 'Zz')];
    expect(ids(cards.sort(compareBoardOrder))).toEqual(['r', 'p', 'n', 'd']);
  });

  it('breaks a tie of keys by id, also by code unit', () => {
    const cards = [card('b', 'reported', 'a1'), card('a', 'reported', 'a1'), card('B', 'reported', 'a1')];
    expect(ids(cards.sort(compareBoardOrder))).toEqual(['B', 'a', 'b']);
  });
});

describe('columnOf and columnsOf', () => {
  const cards = [card('p2', 'in_progress', 'a1'), card('r1', 'reported', 'a0'), card('p1', 'in_progress', 'aV'), card('p3', 'in_progress', 'a_')];

  it('lists the cards of one column only, in board order', () => {
    expect(ids(columnOf(cards, 'in_progress'))).toEqual(['p2', 'p1', 'p3']);
    expect(ids(columnOf(cards, 'reported'))).toEqual(['r1']);
    expect(columnOf(cards, 'done')).toEqual([]);
  });

  it('gives every column, an empty one too', () => {
    const columns = columnsOf(cards);
    expect(Object.keys(columns)).toEqual(['reported', 'in_progress', 'needs_test', 'done']);
    expect(ids(columns.in_progress)).toEqual(['p2', 'p1', 'p3']);
    expect(columns.needs_test).toEqual([]);
  });
});

describe('keyBetween', () => {
  const column = [card('A', 'in_progress', 'a0'), card('B', 'in_progress', 'a1'), card('C', 'in_progress', 'a2')];

  it('makes a key between two neighbours', () => {
    expect(keyBetween(column, { afterId: 'A', beforeId: 'B' })).toBe('a0V');
  });

  it('makes a key before the first card and after the last', () => {
    expect(keyBetween(column, { afterId: null, beforeId: 'A' })).toBe('Zz');
    expect(keyBetween(column, { afterId: 'C', beforeId: null })).toBe('a3');
  });

  it('makes the first key of an empty column', () => {
    expect(keyBetween([], { afterId: null, beforeId: null })).toBe('a0');
  });

  it('is null for a neighbour not in the column', () => {
    expect(keyBetween(column, { afterId: 'gone', beforeId: 'B' })).toBeNull();
    expect(keyBetween(column, { afterId: 'A', beforeId: 'gone' })).toBeNull();
  });

  it('is null when a stale cache has the neighbours out of order or on one key', () => {
    expect(keyBetween(column, { afterId: 'B', beforeId: 'A' })).toBeNull();
    const tied = [card('A', 'in_progress', 'a1'), card('B', 'in_progress', 'a1')];
    expect(keyBetween(tied, { afterId: 'A', beforeId: 'B' })).toBeNull();
  });
});

// The board below: in progress holds a blocking, a degraded and a cosmetic card (no estimates).
// The moving ticket T is degraded with 30 minutes of work: less urgent than the blocking card,
// more urgent than the degraded one (more work left), so urgency puts it between P1 and P2.
const R1 = ticket('R1', 'reported', 'a0', { severity: 'blocks_match' });
const R2 = ticket('R2', 'reported', 'a1', { severity: 'cosmetic' });
const T = ticket('T', 'reported', 'a2', { estimateMinutes: 30 });
const P1 = ticket('P1', 'in_progress', 'a0', { severity: 'blocks_match' });
const P2 = ticket('P2', 'in_progress', 'a1');
const P3 = ticket('P3', 'in_progress', 'a2', { severity: 'cosmetic' });
const board = [R1, R2, T, P1, P2, P3];

describe('movedTicket', () => {
  it("puts a crew member's move where urgency does, with a key between those neighbours", () => {
    expect(movedTicket(board, T, 'in_progress', null, NOW)).toEqual({ ...T, status: 'in_progress', orderKey: 'a0V', placedByHand: false });
  });

  it('passes over a card a lead placed, as urgency does', () => {
    const placed = { ...P2, placedByHand: true };
    expect(movedTicket([R1, R2, T, P1, placed, P3], T, 'in_progress', null, NOW).orderKey).toBe('a1V');
  });

  it("puts a lead's move between the neighbours chosen, and marks it placed by hand", () => {
    expect(movedTicket(board, T, 'in_progress', { afterId: 'P3', beforeId: null }, NOW)).toMatchObject({ status: 'in_progress', orderKey: 'a3', placedByHand: true });
    // In its own column, the moving card is not its own neighbour: the top is before R1's "a0".
    expect(movedTicket(board, T, 'reported', { afterId: null, beforeId: 'R1' }, NOW)).toMatchObject({ status: 'reported', orderKey: 'Zz', placedByHand: true });
  });

  it('takes the first key of an empty column', () => {
    expect(movedTicket(board, T, 'needs_test', null, NOW).orderKey).toBe('a0');
  });

  it('keeps its old key when the neighbours give none: the answer will place it', () => {
    expect(movedTicket(board, T, 'in_progress', { afterId: 'gone', beforeId: null }, NOW).orderKey).toBe('a2');
  });

  it('sets doneAt on reaching done, keeps it within done, clears it on leaving', () => {
    expect(movedTicket(board, T, 'done', null, NOW).doneAt).toBe('2026-03-14T15:00:00.000Z');
    const done = ticket('D', 'done', 'a0', { doneAt: '2026-03-14T14:30:00.000Z' });
    const other = ticket('E', 'done', 'a1');
    expect(movedTicket([done, other], done, 'done', { afterId: 'E', beforeId: null }, NOW).doneAt).toBe('2026-03-14T14:30:00.000Z');
    expect(movedTicket([done], done, 'needs_test', null, NOW).doneAt).toBeNull();
    expect(movedTicket(board, T, 'in_progress', null, NOW).doneAt).toBeNull();
  });
});

describe('positionIn', () => {
  it('gives the 1-based place and the length of the column', () => {
    expect(positionIn([P1, P2, P3], 'P2')).toEqual({ position: 2, of: 3 });
    expect(positionIn([P1, P2, P3], 'P1')).toEqual({ position: 1, of: 3 });
  });
});

describe('landingOf', () => {
  const shown = columnsOf(board);

  it("leaves a crew member's drop in its own column where it is: nothing to send", () => {
    expect(landingOf({ tickets: board, shown, ticket: T, target: { status: 'reported', index: 0 }, byHandAllowed: false })).toEqual({
      status: 'reported', index: 2, byHand: null, unchanged: true, position: 3, of: 3,
    });
  });

  it("lands a crew member's card in another column at urgency's place, wherever it was dropped", () => {
    expect(landingOf({ tickets: board, shown, ticket: T, target: { status: 'in_progress', index: 3 }, byHandAllowed: false })).toEqual({
      status: 'in_progress', index: 1, byHand: null, unchanged: false, position: 2, of: 4,
    });
  });

  it("sends no neighbours for a lead's drop into another column at urgency's place", () => {
    expect(landingOf({ tickets: board, shown, ticket: T, target: { status: 'in_progress', index: 1 }, byHandAllowed: true })).toEqual({
      status: 'in_progress', index: 1, byHand: null, unchanged: false, position: 2, of: 4,
    });
  });

  it("sends the neighbours of a lead's drop anywhere else", () => {
    const at = (index: number) => landingOf({ tickets: board, shown, ticket: T, target: { status: 'in_progress', index }, byHandAllowed: true });
    expect(at(0)).toMatchObject({ index: 0, byHand: { afterId: null, beforeId: 'P1' }, position: 1, of: 4 });
    expect(at(2)).toMatchObject({ index: 2, byHand: { afterId: 'P2', beforeId: 'P3' }, position: 3, of: 4 });
    expect(at(3)).toMatchObject({ index: 3, byHand: { afterId: 'P3', beforeId: null }, position: 4, of: 4 });
    // Past the last card is the bottom.
    expect(at(9)).toMatchObject({ index: 3, byHand: { afterId: 'P3', beforeId: null } });
  });

  it("places a lead's drop in its own column by hand, even at urgency's place", () => {
    // Urgency puts T between R1 and R2 (index 1); in its own column only a hand reorders.
    expect(landingOf({ tickets: board, shown, ticket: T, target: { status: 'reported', index: 1 }, byHandAllowed: true })).toEqual({
      status: 'reported', index: 1, byHand: { afterId: 'R1', beforeId: 'R2' }, unchanged: false, position: 2, of: 3,
    });
    expect(landingOf({ tickets: board, shown, ticket: T, target: { status: 'reported', index: 2 }, byHandAllowed: true })).toMatchObject({ byHand: null, unchanged: true });
  });

  describe('with a filter hiding cards', () => {
    // U, cosmetic with 30 minutes of work, goes after P2 and before P3 in the whole column.
    const U = ticket('U', 'reported', 'a3', { severity: 'cosmetic', estimateMinutes: 30 });
    const tickets = [...board, U];
    const hidingP2 = { ...columnsOf(tickets), in_progress: [P1, P3] };
    const hidingP1 = { ...columnsOf(tickets), in_progress: [P2, P3] };

    it("counts urgency's place among the cards shown", () => {
      // Before P3: of the cards before it (P1, P2) only P1 is shown.
      expect(landingOf({ tickets, shown: hidingP2, ticket: U, target: { status: 'in_progress', index: 0 }, byHandAllowed: false })).toEqual({
        status: 'in_progress', index: 1, byHand: null, unchanged: false, position: 2, of: 3,
      });
      // T goes before P2: the hidden P1 before it does not count.
      expect(landingOf({ tickets, shown: hidingP1, ticket: T, target: { status: 'in_progress', index: 2 }, byHandAllowed: false })).toMatchObject({ index: 0, position: 1, of: 3 });
    });

    it("leaves a lead's drop at that place to urgency, and names shown neighbours elsewhere", () => {
      expect(landingOf({ tickets, shown: hidingP2, ticket: U, target: { status: 'in_progress', index: 1 }, byHandAllowed: true }).byHand).toBeNull();
      expect(landingOf({ tickets, shown: hidingP2, ticket: U, target: { status: 'in_progress', index: 2 }, byHandAllowed: true }).byHand).toEqual({ afterId: 'P3', beforeId: null });
    });
  });
});
