/**
 * "12,6" as typed on a keypad set to a comma locale reads as 12.6. An empty field is left out
 * (the schema says "Required" where it must be given); text that is no number becomes NaN,
 * which gets the schema's own range message.
 */
export function readDecimal(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : NaN;
}
