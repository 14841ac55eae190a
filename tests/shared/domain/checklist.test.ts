import { describe, expect, it } from 'vitest';
import { describeLimits, evaluateMark, progressOf, valueProblem, type ChecklistItem } from '../../../shared/domain/checklist';

function item(overrides: Partial<ChecklistItem>): ChecklistItem {
  return { id: 'i1', label: 'Item', help: null, kind: 'tick', required: true, min: null, max: null, unit: null, options: [], role: null, purpose: null, ...overrides };
}
const pressure = item({ kind: 'number', min: 60, max: 120, unit: 'psi' });

describe('valueProblem', () => {
  it('accepts only the value that fits the kind', () => {
    expect(valueProblem(item({}), true)).toBeNull();
    expect(valueProblem(item({}), false)).toMatch(/un-mark/);
    expect(valueProblem(pressure, 95.5)).toBeNull();
    expect(valueProblem(pressure, '95')).toBe('Give a number');
    expect(valueProblem(pressure, Number.NaN)).toBe('Give a number');
    const choice = item({ kind: 'choice', options: ['Red', 'Blue'] });
    expect(valueProblem(choice, 'Blue')).toBeNull();
    expect(valueProblem(choice, 'blue')).toBe('Pick one of: Red, Blue');
    const text = item({ kind: 'text' });
    expect(valueProblem(text, 'v2.3.1')).toBeNull();
    expect(valueProblem(text, '   ')).toMatch(/Write something/);
    expect(valueProblem(text, 'x'.repeat(501))).toBe('At most 500 characters');
  });
});

describe('evaluateMark', () => {
  it('a number on a limit is within it; beyond it is failed and not done', () => {
    expect(evaluateMark(pressure, 60)).toEqual({ done: true, failed: false });
    expect(evaluateMark(pressure, 120)).toEqual({ done: true, failed: false });
    expect(evaluateMark(pressure, 120.5)).toEqual({ done: false, failed: true });
    expect(evaluateMark(pressure, 59)).toEqual({ done: false, failed: true });
  });

  it('a limit left empty does not bind', () => {
    const atLeast = item({ kind: 'number', min: 12.5, unit: 'V' });
    expect(evaluateMark(atLeast, 1000)).toEqual({ done: true, failed: false });
    expect(evaluateMark(atLeast, 12.4)).toEqual({ done: false, failed: true });
  });

  it('an unmarked item is neither done nor failed; any other mark is done', () => {
    expect(evaluateMark(pressure, null)).toEqual({ done: false, failed: false });
    expect(evaluateMark(item({}), true)).toEqual({ done: true, failed: false });
    expect(evaluateMark(item({ kind: 'text' }), 'ok')).toEqual({ done: true, failed: false });
  });
});

describe('describeLimits', () => {
  it('says the limits the way the crew reads them', () => {
    expect(describeLimits(pressure)).toBe('60 – 120 psi');
    expect(describeLimits({ min: 12.5, max: null, unit: 'V' })).toBe('at least 12.5 V');
    expect(describeLimits({ min: null, max: 3, unit: null })).toBe('at most 3');
    expect(describeLimits({ min: null, max: null, unit: 'psi' })).toBeNull();
  });
});

describe('progressOf', () => {
  it('counts done, required, required done and failed', () => {
    const items = [
      { required: true, value: true, done: true, failed: false },
      { required: true, value: 130, done: false, failed: true },
      { required: true, value: null, done: false, failed: false },
      { required: false, value: true, done: true, failed: false },
    ];
    expect(progressOf(items)).toEqual({ total: 4, done: 2, required: 3, requiredDone: 1, failed: 1 });
  });
});
