// Slows guessing the current password from a session left open: after `maxFailures` wrong
// current passwords for one user within the window (the sign-in limits), answer 429 with
// Retry-After. Only a wrong current password counts; a weak new password does not. The
// counters share the sign-in limiter's MariaDB store, so every API process sees them.
import type { Request, Response } from 'express';
import type { Sequelize } from 'sequelize';
import { rateLimit } from 'express-rate-limit';
import type { Env } from '../../config/env.js';
import { AppError } from '../../errors.js';
import { DatabaseRateLimitStore } from '../auth/rate-limit.repository.js';

/** Set by the handler when the current password was wrong, so only those answers count. */
export function markWrongCurrentPassword(res: Response): void {
  res.locals.wrongCurrentPassword = true;
}

export function createPasswordChangeLimiter(limits: Env['login'], sequelize: Sequelize) {
  return rateLimit({
    windowMs: limits.windowMs,
    limit: limits.maxFailures,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    // The route is signed-in only, so the session always carries the user.
    keyGenerator: (req: Request) => `password-change|${req.session.userId ?? 'none'}`,
    skipSuccessfulRequests: true,
    requestWasSuccessful: (_req, res) => res.locals.wrongCurrentPassword !== true,
    store: new DatabaseRateLimitStore(sequelize),
    handler: (_req, _res, next) => {
      next(
        new AppError(
          'RATE_LIMITED',
          'Too many wrong current passwords; wait a while and try again',
        ),
      );
    },
  });
}
