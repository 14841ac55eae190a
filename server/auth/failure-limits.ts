import type { Request, Response } from 'express';
import { rateLimit } from 'express-rate-limit';

const WINDOW_MS = 15 * 60_000;
export const MAX_FAILURES_PER_EMAIL = 10;
// A whole pit may sign in from behind one address.
export const MAX_FAILURES_PER_ADDRESS = 100;

const tooMany = (what: string) => (_req: Request, res: Response) => {
  const seconds = Number(res.getHeader('Retry-After') ?? WINDOW_MS / 1000);
  res.status(429).json({
    error: { code: 'rate_limited', message: `Too many ${what}: try again in ${Math.ceil(seconds / 60)} min` },
  });
};

const emailKey = (req: Request) =>
  `email:${String(req.body?.email ?? '')
    .trim()
    .toLowerCase()}`;

const failuresOnly = { windowMs: WINDOW_MS, skipSuccessfulRequests: true, standardHeaders: 'draft-7', legacyHeaders: false } as const;

/** Counts failed sign-ins only: per e-mail and per client address, over 15 minutes. */
export function signInLimiters() {
  const common = { ...failuresOnly, handler: tooMany('failed sign-ins') };
  return [
    rateLimit({ ...common, limit: MAX_FAILURES_PER_ADDRESS }),
    rateLimit({ ...common, limit: MAX_FAILURES_PER_EMAIL, keyGenerator: emailKey }),
  ];
}

/** Wrong current passwords per account: an unattended signed-in tablet is no guessing machine. */
export function passwordChangeLimiter() {
  return rateLimit({
    ...failuresOnly,
    limit: MAX_FAILURES_PER_EMAIL,
    keyGenerator: (req) => `user:${req.user?.id ?? ''}`,
    handler: tooMany('wrong passwords'),
  });
}
