/**
 * Median of a list of numbers: the middle value, or the mean of the two middle values for an
 * even count; null for an empty list. A median, not a mean, because one field fault or one
 * long replay must not move the projected cycle for everyone.
 */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  // Sort a copy: callers pass their own arrays and expect them unchanged.
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}
