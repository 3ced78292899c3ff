// Sessions live in MariaDB (connect-session-sequelize, with a leaner read: http/session-store.ts),
// so any number of API processes can serve the same users. The cookie holds only the session id;
// its name comes from the environment (`__Host-sw.sid` on https, see config/env.ts).
import type { Request, RequestHandler, Response } from 'express';
import session from 'express-session';
import type { Sequelize } from 'sequelize';
import type { Env } from '../config/env.js';
import { LeanSessionStore } from './session-store.js';

declare module 'express-session' {
  interface SessionData {
    userId: string;
    companyId: string;
    /** When the session's expiry was last pushed forward (ms since epoch); see below. */
    refreshedAt: number;
  }
}

const sessionMaxAgeMs = 14 * 24 * 60 * 60 * 1000;
/**
 * A signed-in session's 14 days start again on activity, but its row and cookie are rewritten
 * at most once per this interval rather than on every request (`rolling` would UPDATE the same
 * row on every request, which serialises a user's concurrent requests on its row lock).
 */
export const sessionRefreshIntervalMs = 10 * 60 * 1000;
/** Routes that never read the session, so a request to them does not look it up. */
const sessionlessPaths = new Set(['/health', '/auth/csrf']);

export type SessionStore = LeanSessionStore;

/**
 * The store. `checkExpirationInterval` 0 disables the background sweep (tests); the server
 * passes a real interval and calls `stopExpiringSessions()` on shutdown.
 */
export function createSessionStore(
  sequelize: Sequelize,
  checkExpirationIntervalMs: number,
): SessionStore {
  return new LeanSessionStore(sequelize, sessionMaxAgeMs, checkExpirationIntervalMs);
}

/** Marks the session changed once per interval, so express-session saves it and re-sends the cookie. */
const refreshNowAndThen: RequestHandler = (req, _res, next) => {
  const current = req.session as Partial<typeof req.session> | undefined;
  if (current?.userId && !(Date.now() - (current.refreshedAt ?? 0) < sessionRefreshIntervalMs))
    req.session.refreshedAt = Date.now();
  next();
};

export function createSessionMiddleware(env: Env, store: SessionStore): RequestHandler[] {
  const load = session({
    name: env.cookieNames.session,
    secret: env.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: env.cookieSecure,
      maxAge: sessionMaxAgeMs,
      path: '/',
    },
  });
  const loadUnlessSessionless: RequestHandler = (req, res, next) =>
    sessionlessPaths.has(req.path) ? next() : load(req, res, next);
  return [loadUnlessSessionless, refreshNowAndThen];
}

/** Starts a fresh session (new id, defeating fixation) for the user in the given company. */
export async function signIn(req: Request, userId: string, companyId: string): Promise<void> {
  await new Promise<void>((resolve, reject) =>
    req.session.regenerate((err) => (err ? reject(err as Error) : resolve())),
  );
  req.session.userId = userId;
  req.session.companyId = companyId;
  req.session.refreshedAt = Date.now();
  await saveSession(req);
}

export function saveSession(req: Request): Promise<void> {
  return new Promise<void>((resolve, reject) =>
    req.session.save((err) => (err ? reject(err as Error) : resolve())),
  );
}

/** Destroys the session row and clears the cookie. */
export async function signOut(req: Request, res: Response, env: Env): Promise<void> {
  await new Promise<void>((resolve, reject) =>
    req.session.destroy((err) => (err ? reject(err as Error) : resolve())),
  );
  res.clearCookie(env.cookieNames.session, {
    httpOnly: true,
    sameSite: 'lax',
    secure: env.cookieSecure,
    path: '/',
  });
}
