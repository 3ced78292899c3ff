// Slows password guessing: after `maxFailures` failed sign-ins for one IP + e-mail within the
// window, answer 429 with Retry-After. Successful sign-ins do not count and clear the counter.
// The counter lives in process memory: with several API processes each keeps its own, which
// still bounds guessing per process; a shared store can replace it without touching callers.
import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Env } from '../../config/env.js';
import { AppError } from '../../errors.js';

function loginKey(req: Request): string {
  const body: unknown = req.body;
  const email =
    typeof body === 'object' && body !== null && 'email' in body && typeof body.email === 'string'
      ? body.email.trim().toLowerCase()
      : '';
  return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`;
}

export function createLoginLimiter(login: Env['login']) {
  const limiter = rateLimit({
    windowMs: login.windowMs,
    limit: login.maxFailures,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: loginKey,
    handler: (_req, _res, next) => {
      next(new AppError('RATE_LIMITED', 'Too many failed sign-ins; wait a while and try again'));
    },
  });
  return {
    middleware: limiter,
    /** Forget earlier failures after a successful sign-in. */
    reset: (req: Request) => limiter.resetKey(loginKey(req)),
  };
}
