// CSRF protection: a signed double-submit token, independent of the session, plus an origin
// check.
//
// `GET /api/auth/csrf` sets an httpOnly cookie holding a random secret and answers
// `{ data: { token } }`, where token = HMAC(SESSION_SECRET, secret). Every POST/PATCH/PUT/DELETE
// must send the token in `x-csrf-token`. Another site can neither read the cookie nor compute
// the HMAC, and SameSite=Lax keeps the cookie off cross-site form posts as a second layer.
// Because the secret is not stored in the session, the token stays valid across sign-in
// (session regeneration) and sign-out: the web client fetches it once at start-up and again
// only after a 403 CSRF_INVALID. (Written here rather than taken from a package because the
// maintained packages bind the token to the session id, which sign-in regenerates.)
//
// The origin check is a third layer that needs no state: a browser names the page that sent a
// request in `Origin` (or, from some older browsers, only in `Sec-Fetch-Site`), so a write
// whose Origin is not ours, or that the browser calls `cross-site`, is refused even with a
// valid token. Requests with neither header (scripts, curl, supertest) rely on the token.
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { parse as parseCookies } from 'cookie';
import type { Request, RequestHandler, Response } from 'express';
import type { Env } from '../config/env.js';
import { AppError } from '../errors.js';

export const csrfHeaderName = 'x-csrf-token';
const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);
const secretPattern = /^[a-f0-9]{64}$/;

/** A cookie's value; the `cookie` package leaves a value it cannot percent-decode as sent. */
function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  return header ? parseCookies(header)[name] : undefined;
}

function tokenFor(secret: string, key: string): string {
  return createHmac('sha256', key).update(`csrf:${secret}`).digest('base64url');
}

function safeEqual(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}

/** Why the sending page is not ours, or undefined when it is (or the client did not say). */
function foreignOrigin(req: Request, trustedOrigins: readonly string[]): string | undefined {
  const origin = req.get('origin');
  if (origin !== undefined) {
    return trustedOrigins.includes(origin)
      ? undefined
      : `Origin "${origin.slice(0, 200)}" is not this site's`;
  }
  return req.get('sec-fetch-site') === 'cross-site'
    ? 'The browser marked this request as sent from another site (Sec-Fetch-Site: cross-site)'
    : undefined;
}

export function createCsrf(env: Env) {
  const cookieName = env.cookieNames.csrf;
  const cookieOptions = {
    httpOnly: true,
    sameSite: 'lax' as const,
    secure: env.cookieSecure,
    path: '/',
  };

  /** Returns the token for the caller's secret, creating and setting the secret if needed. */
  function issueToken(req: Request, res: Response): string {
    let secret = readCookie(req, cookieName);
    if (!secret || !secretPattern.test(secret)) {
      secret = randomBytes(32).toString('hex');
      res.cookie(cookieName, secret, cookieOptions);
    }
    return tokenFor(secret, env.sessionSecret);
  }

  /** Rejects state-changing requests from another origin or without a matching token. */
  const verify: RequestHandler = (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const foreign = foreignOrigin(req, env.trustedOrigins);
    if (foreign) {
      return next(
        new AppError('CSRF_INVALID', `${foreign}; changes are accepted only from ${env.appUrl}`),
      );
    }
    const secret = readCookie(req, cookieName);
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
