import { describe, expect, it } from 'vitest';
import { median } from '../../../shared/domain/median';

describe('median', () => {
  it('is the middle value, the mean of the two middle ones for an even count, null for none', () => {
    expect(median([16, 7, 8])).toBe(8);
    expect(median([63, 7])).toBe(35);
    expect(median([])).toBeNull();
    const input = [3, 1, 2];
    median(input);
    expect(input).toEqual([3, 1, 2]); // left as the caller passed it
  });
});
