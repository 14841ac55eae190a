/** An error that becomes a 4xx answer `{error: {code, message, fields?, ...extra}}`. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export const notFound = (what = 'Record') => new HttpError(404, 'not_found', `${what} not found`);
export const forbidden = () => new HttpError(403, 'forbidden', 'Your role does not allow this');
export const unauthenticated = () => new HttpError(401, 'unauthenticated', 'Sign in first');
export const stale = (current: unknown) =>
  new HttpError(409, 'stale', 'Someone else changed this record since you loaded it', { current });
