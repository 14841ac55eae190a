import { HttpError } from '../errors';

// Tablet clocks drift; a minute ahead of the server is still "now".
const FUTURE_TOLERANCE_MS = 60_000;

export const invalidField = (field: string, message: string) =>
  new HttpError(400, 'invalid', `Check these fields: ${field}`, { fields: { [field]: message } });

/** 400 naming the field when the instant is ahead of the server's clock, or before `notBefore`. */
export function assertInstant(field: string, at: Date, { notBefore, what }: { notBefore?: Date; what?: string } = {}) {
  if (at.getTime() > Date.now() + FUTURE_TOLERANCE_MS) throw invalidField(field, 'Must not be in the future');
  if (notBefore && at < notBefore) throw invalidField(field, `Must not be before ${what} (${notBefore.toISOString()})`);
}

/** 400 naming every field in `fields` (field → message), in the order given; nothing when empty. */
export function assertNoInvalidFields(fields: Record<string, string>) {
  const names = Object.keys(fields);
  if (names.length > 0) throw new HttpError(400, 'invalid', `Check these fields: ${names.join(', ')}`, { fields });
}
