import type { z } from 'zod';
import { isApiError } from './api-client';

/** One message per field name. */
export type FieldErrors = Record<string, string>;

type Parsed<T> = { ok: true; data: T } | { ok: false; errors: FieldErrors };

/** Checks form values with the same zod schema the server uses, keeping the first message per field. */
export function parseForm<S extends z.ZodType>(schema: S, values: unknown): Parsed<z.output<S>> {
  const result = schema.safeParse(values);
  if (result.success) return { ok: true, data: result.data };
  const errors: FieldErrors = {};
  for (const issue of result.error.issues) {
    // Every shared schema names the field of each issue (refinements set a path), so the first
    // path segment is the input to mark.
    errors[String(issue.path[0])] ??= issue.message;
  }
  return { ok: false, errors };
}

/** The browser's own findings, overlaid with what the server said about each field. */
export function mergeFieldErrors(client: FieldErrors, mutationError: unknown): FieldErrors {
  return { ...client, ...(isApiError(mutationError) ? mutationError.fields : {}) };
}
