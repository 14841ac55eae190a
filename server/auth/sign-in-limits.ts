import type { Request, Response } from 'express';
import { rateLimit } from 'express-rate-limit';

const WINDOW_MS = 15 * 60_000;
export const MAX_FAILURES_PER_EMAIL = 10;
// A whole pit may sign in from behind one address.
export const MAX_FAILURES_PER_ADDRESS = 100;

function tooMany(_req: Request, res: Response) {
  const seconds = Number(res.getHeader('Retry-After') ?? WINDOW_MS / 1000);
  res.status(429).json({
    error: { code: 'rate_limited', message: `Too many failed sign-ins: try again in ${Math.ceil(seconds / 60)} min` },
  });
}

const emailKey = (req: Request) =>
  `email:${String(req.body?.email ?? '')
    .trim()
    .toLowerCase()}`;

/** Counts failed sign-ins only: per e-mail and per client address, over 15 minutes. */
export function signInLimiters() {
  const common = { windowMs: WINDOW_MS, skipSuccessfulRequests: true, standardHeaders: 'draft-7', legacyHeaders: false, handler: tooMany } as const;
  return [
    rateLimit({ ...common, limit: MAX_FAILURES_PER_ADDRESS }),
    rateLimit({ ...common, limit: MAX_FAILURES_PER_EMAIL, keyGenerator: emailKey }),
  ];
}
