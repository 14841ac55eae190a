import { describe, expect, it } from 'vitest';
import { createTemplateSchema, markSchema, updateTemplateSchema } from '../../shared/schemas/checks';

const tick = { label: 'Main breaker on', kind: 'tick', required: true };
const issuesOf = (result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  (result.error?.issues ?? []).map((issue) => [issue.path.join('.'), issue.message]);

describe('template schemas', () => {
  it('fills the optional item fields with their empty values', () => {
    const parsed = createTemplateSchema.parse({ name: ' Before the match ', phase: 'pre_match', items: [tick] });
    expect(parsed).toEqual({
      name: 'Before the match',
      phase: 'pre_match',
      items: [{ label: 'Main breaker on', kind: 'tick', required: true, help: null, min: null, max: null, unit: null, options: [], role: null, purpose: null }],
    });
  });

  it('refuses limits on a tick, a choice without two options, min above max and a bad bumper item', () => {
    const result = createTemplateSchema.safeParse({
      name: 'x',
      phase: 'pre_match',
      items: [
        { ...tick, min: 1 },
        { label: 'Colour', kind: 'choice', required: true, options: ['Red'] },
        { label: 'Air', kind: 'number', required: true, min: 120, max: 60 },
        { label: 'Bumpers', kind: 'choice', required: true, options: ['Green', 'Gold'], purpose: 'bumper_colour' },
      ],
    });
    expect(issuesOf(result)).toEqual([
      ['items.0.min', 'Only a number item has limits and a unit'],
      ['items.1.options', 'A choice needs at least two options'],
      ['items.2.max', 'Must not be below the minimum'],
      ['items.3.purpose', 'A bumper colour item is a choice with the options Red and Blue'],
    ]);
  });

  it('refuses an empty list, an unknown phase and a repeated item id', () => {
    expect(issuesOf(createTemplateSchema.safeParse({ name: 'x', phase: 'lunch', items: [] }))).toEqual([
      ['phase', 'One of: pre_match, post_match, inspection, load_in, pack_out'],
      ['items', 'A checklist needs at least one item'],
    ]);
    expect(issuesOf(updateTemplateSchema.safeParse({ items: [{ ...tick, id: 'a' }, { ...tick, id: 'a' }] }))).toEqual([['items', 'An item id is listed twice']]);
  });
});

describe('markSchema', () => {
  it('takes true, a number or a text, and nothing else', () => {
    expect(markSchema.parse({ value: 95 })).toEqual({ value: 95, note: null });
    expect(markSchema.safeParse({ value: null }).success).toBe(false);
    expect(markSchema.safeParse({ value: { a: 1 } }).success).toBe(false);
    expect(markSchema.safeParse({ value: true, extra: 1 }).success).toBe(false);
  });
});
