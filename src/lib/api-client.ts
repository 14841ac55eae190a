import type { ApiError as ApiErrorBody } from '@shared/schemas/common';
import { noteServerDate } from './server-clock';

const NETWORK_MESSAGE = 'Cannot reach the Pitwright server. Check the Wi-Fi, then try again.';

/** A failed call, carrying the server's `{error: {code, message, fields?}}` answer. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string>;
  /** The whole error object, for answers that carry more than code and message (a 409's `current`). */
  readonly details: Record<string, unknown>;
  /** From a 429's Retry-After header. */
  readonly retryAfterSeconds: number | null;

  constructor(init: {
    status: number;
    code: string;
    message: string;
    fields?: Record<string, string>;
    details?: Record<string, unknown>;
    retryAfterSeconds?: number | null;
  }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? {};
    this.details = init.details ?? {};
    this.retryAfterSeconds = init.retryAfterSeconds ?? null;
  }
}

export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

/** A 404: the record is not (or no longer) there, e.g. removed by a send whose answer was lost. */
export const isNotFound = (error: unknown) => isApiError(error) && error.status === 404;

/**
 * What the client needs from the session without importing the session feature: the app wires
 * these in at start-up (src/app/api-wiring.ts).
 */
export interface SessionHooks {
  csrfToken: () => string | undefined;
  /** Asks the server for a fresh session; resolves to its CSRF token, or undefined when signed out. */
  refreshCsrfToken: () => Promise<string | undefined>;
  /** A call other than reading the session or signing in answered 401: the session is over. */
  sessionEnded: () => void;
}

let hooks: SessionHooks = {
  csrfToken: () => undefined,
  refreshCsrfToken: async () => undefined,
  sessionEnded: () => {},
};

export function connectSession(sessionHooks: SessionHooks): void {
  hooks = sessionHooks;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

interface RequestOptions {
  body?: unknown;
  signal?: AbortSignal;
}

async function readError(response: Response): Promise<ApiError> {
  const retryAfter = Number(response.headers.get('retry-after'));
  const retryAfterSeconds = Number.isFinite(retryAfter) && retryAfter > 0 ? retryAfter : null;
  let body: Partial<ApiErrorBody> | null = null;
  try {
    body = (await response.json()) as Partial<ApiErrorBody>;
  } catch {
    // A proxy or a crashed server may answer with HTML or nothing; fall through to a generic message.
  }
  const error = body?.error;
  if (error && typeof error.code === 'string' && typeof error.message === 'string') {
    return new ApiError({
      status: response.status,
      code: error.code,
      message: error.message,
      fields: error.fields,
      details: error as unknown as Record<string, unknown>,
      retryAfterSeconds,
    });
  }
  return new ApiError({
    status: response.status,
    code: `http_${response.status}`,
    message: `The server could not answer (error ${response.status}). Try again in a moment.`,
    retryAfterSeconds,
  });
}

async function send<T>(method: Method, path: string, options: RequestOptions, isRetry: boolean): Promise<T> {
  // Signing in is the one write made before there is a session, hence before there is a token.
  const needsCsrf = method !== 'GET' && !(method === 'POST' && path === '/api/session');
  const headers: Record<string, string> = { accept: 'application/json' };
  // A FormData body (a file upload) sets its own multipart content type, boundary included.
  const isForm = options.body instanceof FormData;
  if (options.body !== undefined && !isForm) headers['content-type'] = 'application/json';
  const token = needsCsrf ? hooks.csrfToken() : undefined;
  if (token) headers['x-csrf-token'] = token;

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body: options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (cause) {
    if (options.signal?.aborted) throw cause;
    throw new ApiError({ status: 0, code: 'network', message: NETWORK_MESSAGE });
  }
  // Every answer, error or not, tells the server's time: countdowns read against it.
  noteServerDate(response.headers.get('date'));

  if (response.ok) {
    if (response.status === 204) return undefined as T;
    const text = await response.text();
    return (text ? JSON.parse(text) : undefined) as T;
  }

  const error = await readError(response);
  if (error.status === 403 && error.code === 'csrf' && needsCsrf && !isRetry) {
    // The token went stale (the session was renewed elsewhere): fetch a new one and try once more.
    const fresh = await hooks.refreshCsrfToken();
    if (fresh) return send<T>(method, path, options, true);
  }
  // A 401 means the session is over, except from asking for the session (answered as "signed
  // out") and from signing in (a wrong password). A wrong current password on a password change
  // is a 400, so a 401 there, or on a team switch, also ends the session.
  const asksForSession = path === '/api/session' && (method === 'GET' || method === 'POST');
  if (error.status === 401 && !asksForSession) hooks.sessionEnded();
  throw error;
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => send<T>('GET', path, { signal }, false),
  post: <T>(path: string, body?: unknown) => send<T>('POST', path, { body }, false),
  put: <T>(path: string, body?: unknown) => send<T>('PUT', path, { body }, false),
  patch: <T>(path: string, body?: unknown) => send<T>('PATCH', path, { body }, false),
  delete: <T = void>(path: string) => send<T>('DELETE', path, {}, false),
};
