// Slows password guessing: after `maxFailures` failed sign-ins for one IP + e-mail within the
// window, answer 429 with Retry-After. Successful sign-ins do not count and clear the counter.
// The counters live in MariaDB, so any number of API processes share them.
import type { Request } from 'express';
import type { Sequelize } from 'sequelize';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Env } from '../../config/env.js';
import { AppError } from '../../errors.js';
import { DatabaseRateLimitStore } from './rate-limit.repository.js';

function loginKey(req: Request): string {
  const body: unknown = req.body;
  const email =
    typeof body === 'object' && body !== null && 'email' in body && typeof body.email === 'string'
      ? body.email.trim().toLowerCase()
      : '';
  return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`;
}

export function createLoginLimiter(login: Env['login'], sequelize: Sequelize) {
  const limiter = rateLimit({
    windowMs: login.windowMs,
    limit: login.maxFailures,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: loginKey,
    store: new DatabaseRateLimitStore(sequelize),
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
