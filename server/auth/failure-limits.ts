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

export const RESET_REQUESTS_PER_ADDRESS = 20;

/**
 * Password-reset requests per client address, every request counted: each one may send an
 * e-mail. (Per e-mail address the request command itself stops sending after a few an hour.)
 */
export function passwordResetLimiter() {
  return rateLimit({
    windowMs: 60 * 60_000,
    limit: RESET_REQUESTS_PER_ADDRESS,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: tooMany('password reset requests'),
  });
}

/**
 * Failed uses of one-time links: unknown tokens per client address, wrong passwords per link
 * (an invite to an existing account is accepted with that account's password).
 */
export function accountLinkLimiters() {
  const common = { ...failuresOnly, handler: tooMany('failed attempts') };
  return [
    rateLimit({ ...common, limit: MAX_FAILURES_PER_ADDRESS }),
    rateLimit({ ...common, limit: MAX_FAILURES_PER_EMAIL, keyGenerator: (req) => `link:${String(req.body?.token ?? '')}` }),
  ];
}
