// CSRF protection: a signed double-submit token, independent of the session.
//
// `GET /api/auth/csrf` sets an httpOnly cookie holding a random secret and answers
// `{ data: { token } }`, where token = HMAC(SESSION_SECRET, secret). Every POST/PATCH/PUT/DELETE
// must send the token in `x-csrf-token`. Another site can neither read the cookie nor compute
// the HMAC, and SameSite=Lax keeps the cookie off cross-site form posts as a second layer.
// Because the secret is not stored in the session, the token stays valid across sign-in
// (session regeneration) and sign-out: the web client fetches it once at start-up and again
// only after a 403 CSRF_INVALID. (Written here rather than taken from a package because the
// maintained packages bind the token to the session id, which sign-in regenerates.)
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import type { Env } from '../config/env.js';
import { AppError } from '../errors.js';

export const csrfCookieName = 'sw.csrf';
export const csrfHeaderName = 'x-csrf-token';
const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);
const secretPattern = /^[a-f0-9]{64}$/;

function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const index = part.indexOf('=');
    if (index > 0 && part.slice(0, index).trim() === name)
      return decodeURIComponent(part.slice(index + 1).trim());
  }
  return undefined;
}

function tokenFor(secret: string, key: string): string {
  return createHmac('sha256', key).update(`csrf:${secret}`).digest('base64url');
}

function safeEqual(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}

export function createCsrf(env: Env) {
  const cookieOptions = {
    httpOnly: true,
    sameSite: 'lax' as const,
    secure: env.cookieSecure,
    path: '/',
  };

  /** Returns the token for the caller's secret, creating and setting the secret if needed. */
  function issueToken(req: Request, res: Response): string {
    let secret = readCookie(req, csrfCookieName);
    if (!secret || !secretPattern.test(secret)) {
      secret = randomBytes(32).toString('hex');
      res.cookie(csrfCookieName, secret, cookieOptions);
    }
    return tokenFor(secret, env.sessionSecret);
  }

  /** Rejects state-changing requests without a matching token. */
  const verify: RequestHandler = (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const secret = readCookie(req, csrfCookieName);
    const sent = req.get(csrfHeaderName);
    if (
      !secret ||
      !secretPattern.test(secret) ||
      !sent ||
      !safeEqual(sent, tokenFor(secret, env.sessionSecret))
    ) {
      return next(
        new AppError(
          'CSRF_INVALID',
          'Missing or invalid CSRF token; fetch GET /api/auth/csrf and send it in x-csrf-token',
        ),
      );
    }
    next();
  };

  return { issueToken, verify };
}
