import { z } from 'zod';
import './messages';

/** A missing field says "Required" (see messages.ts); a wrong one says what to send instead. */
export const requiredOr = (message: string) => ({ error: (issue: { input?: unknown }) => (issue.input === undefined ? 'Required' : message) });

/** A client may choose a record's id so that resending a create cannot make a duplicate. */
export const clientId = z.uuid({ message: 'Must be a UUID' });

/** Body of every error answer: `{error: {code, message, fields?}}`. */
export interface ApiError {
  error: { code: string; message: string; fields?: Record<string, string> };
}

/** Optimistic-locking token carried by records that several tablets edit at once. */
export const versionField = z
  .number({ message: 'The version number you loaded' })
  .int({ message: 'The version number you loaded' })
  .nonnegative({ message: 'The version number you loaded' });
