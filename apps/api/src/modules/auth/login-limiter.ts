// Slows password guessing: after `maxFailures` failed sign-ins for one IP + e-mail within the
// window, answer 429 with Retry-After. Successful sign-ins do not count and clear that counter.
// A second counter takes failed sign-ins of one IP across every e-mail, so one address cannot
// try many accounts; a success does not clear it. The counters live in MariaDB, so any number
// of API processes share them.
import type { Request, RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Env } from '../../config/env.js';
import { AppError } from '../../errors.js';
import { DatabaseRateLimitStore } from './rate-limit.repository.js';
import { byIp, createRateLimit } from './rate-limits.js';

const message = 'Too many failed sign-ins; wait a while and try again';

function loginKey(req: Request): string {
  const body: unknown = req.body;
  const email =
    typeof body === 'object' && body !== null && 'email' in body && typeof body.email === 'string'
      ? body.email.trim().toLowerCase()
      : '';
  return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`;
}

export function createLoginLimiter(
  login: Env['login'],
  limits: Env['rateLimits'],
  sequelize: Sequelize,
) {
  const perIpAndEmail = rateLimit({
    windowMs: login.windowMs,
    limit: login.maxFailures,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: loginKey,
    store: new DatabaseRateLimitStore(sequelize),
    handler: (_req, _res, next) => {
      next(new AppError('RATE_LIMITED', message));
    },
  });
  const perIp = createRateLimit(sequelize, {
    name: 'login-failures:ip',
    limit: limits.loginFailuresPerIp,
    windowMs: limits.windowMs,
    key: byIp,
    message,
    count: 'failures',
  });
  const middleware: RequestHandler[] = [perIp, perIpAndEmail];
  return {
    middleware,
    /** Forget earlier failures of this IP + e-mail after a successful sign-in. */
    reset: (req: Request) => perIpAndEmail.resetKey(loginKey(req)),
  };
}
