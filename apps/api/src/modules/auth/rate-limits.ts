// Rate limits for the sign-in flows, on the same MariaDB-backed store as failed sign-ins, so
// every API process shares the counts. Each flow is limited per IP (generous: an office shares
// one address) and per account (the e-mail, the link token or the signed-in user, strict), so
// neither one address trying many accounts nor many addresses trying one account gets far.
import type { Request, RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { FlowLimit } from '../../config/env.js';
import { AppError } from '../../errors.js';
import { DatabaseRateLimitStore } from './rate-limit.repository.js';

/** What one counter counts; `null` skips the request (e.g. no e-mail given: validation answers). */
export type LimitKey = (req: Request) => string | null;

export interface LimitRule {
  /** Names the counter, so two rules never share one. */
  name: string;
  limit: number;
  windowMs: number;
  key: LimitKey;
  /** The problem detail of the 429. */
  message: string;
  /** `failures`: only answers of 400 and up count; `successes`: only answers below 400. */
  count?: 'all' | 'failures' | 'successes';
}

export const byIp: LimitKey = (req) => ipKeyGenerator(req.ip ?? 'unknown');

export const byBodyEmail: LimitKey = (req) => {
  const body: unknown = req.body;
  const email =
    typeof body === 'object' && body !== null && 'email' in body && typeof body.email === 'string'
      ? body.email.trim().toLowerCase()
      : '';
  return email || null;
};

export const byTokenParam: LimitKey = (req) => {
  const token = req.params.token;
  return typeof token === 'string' && token ? token : null;
};

/** After requireTenant only. */
export const bySignedInUser: LimitKey = (req) => req.ctx?.userId ?? null;
export const byActiveCompany: LimitKey = (req) => req.ctx?.companyId ?? null;

/** One express-rate-limit middleware answering 429 RATE_LIMITED with Retry-After. */
export function createRateLimit(sequelize: Sequelize, rule: LimitRule): RequestHandler {
  return rateLimit({
    windowMs: rule.windowMs,
    limit: rule.limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipFailedRequests: rule.count === 'successes',
    skipSuccessfulRequests: rule.count === 'failures',
    skip: (req) => rule.key(req) === null,
    keyGenerator: (req) => `${rule.name}|${rule.key(req) ?? ''}`,
    // A store per limiter: express-rate-limit refuses to share one between limiters.
    store: new DatabaseRateLimitStore(sequelize),
    handler: (_req, _res, next) => {
      next(new AppError('RATE_LIMITED', rule.message));
    },
  });
}

/** The per-IP and the per-account limit of one flow, in that order. */
export function createFlowLimits(
  sequelize: Sequelize,
  flow: {
    name: string;
    limits: FlowLimit;
    windowMs: number;
    account: LimitKey;
    message: string;
  },
): RequestHandler[] {
  const { name, limits, windowMs, account, message } = flow;
  return [
    createRateLimit(sequelize, {
      name: `${name}:ip`,
      limit: limits.perIp,
      windowMs,
      key: byIp,
      message,
    }),
    createRateLimit(sequelize, {
      name: `${name}:account`,
      limit: limits.perAccount,
      windowMs,
      key: account,
      message,
    }),
  ];
}
