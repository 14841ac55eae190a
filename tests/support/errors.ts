/** The error bodies the API answers, written out so that a test states what it expects. */
export const UNAUTHENTICATED = { error: { code: 'unauthenticated', message: 'Sign in first' } };
export const FORBIDDEN = { error: { code: 'forbidden', message: 'Your role does not allow this' } };

/** A 400 answer naming exactly these fields, in this order. */
export const invalid = (fields: Record<string, string>) => ({
  error: { code: 'invalid', message: `Check these fields: ${Object.keys(fields).join(', ')}`, fields },
});
