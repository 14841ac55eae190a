import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ConnectionError, UniqueConstraintError } from 'sequelize';
import { ZodError } from 'zod';
import { HttpError } from '../errors';

/** Maps zod issues to `{field: message}`, first message per field. */
export function fieldsOf(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const name of issue.keys) fields[[...issue.path, name].join('.')] ??= 'Not a field of this request';
      continue;
    }
    const key = issue.path.length ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export const apiNotFound: RequestHandler = (req) => {
  throw new HttpError(404, 'not_found', `No such API route: ${req.method} ${req.path}`);
};

/** Every failure leaves as `{error: {code, message, fields?}}`; a stack trace never does. */
export const errorHandler: ErrorRequestHandler = (error, req, res, next) => {
  if (res.headersSent) return next(error);
  if (error instanceof ZodError) {
    // A body that is not an object at all (an array, a number) has no fields to name.
    if (error.issues.every((issue) => issue.path.length === 0 && issue.code === 'invalid_type')) {
      res.status(400).json({ error: { code: 'invalid', message: 'Send a JSON object as the request body' } });
      return;
    }
    const fields = fieldsOf(error);
    const names = Object.keys(fields).join(', ');
    res.status(400).json({ error: { code: 'invalid', message: `Check these fields: ${names}`, fields } });
    return;
  }
  if (error instanceof HttpError) {
    res.status(error.status).json({ error: { code: error.code, message: error.message, ...error.extra } });
    return;
  }
  // Commands check for duplicates under a row lock; two creates with one client id in different
  // teams or events hold different locks, and the key itself then refuses the second.
  if (error instanceof UniqueConstraintError) {
    res.status(409).json({ error: { code: 'id_taken', message: 'This record already exists: reload and try again' } });
    return;
  }
  if (error instanceof ConnectionError) {
    res.status(503).json({ error: { code: 'db_unavailable', message: 'The database is not reachable: try again shortly' } });
    return;
  }
  // body-parser and csrf-sync errors carry a status and a type or code of their own.
  const status = typeof error?.status === 'number' ? error.status : 500;
  if (error?.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'malformed_json', message: 'The request body is not valid JSON' } });
  } else if (error?.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'too_large', message: 'The request body is larger than 1 MB' } });
  } else if (error?.code === 'EBADCSRFTOKEN') {
    res.status(403).json({ error: { code: 'csrf', message: 'Missing or stale x-csrf-token header: reload and try again' } });
  } else if (status >= 400 && status < 500) {
    res.status(status).json({ error: { code: 'bad_request', message: error.expose ? error.message : 'Bad request' } });
  } else {
    console.error(`[${req.method} ${req.originalUrl}]`, error);
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server' } });
  }
};
