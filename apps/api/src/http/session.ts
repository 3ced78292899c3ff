// Sessions live in MariaDB (connect-session-sequelize), so any number of API processes can
// serve the same users. The cookie holds only the session id; its name comes from the
// environment (`__Host-sw.sid` on https, see config/env.ts).
import type { Request, RequestHandler, Response } from 'express';
import session from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import type { Sequelize } from 'sequelize';
import type { Env } from '../config/env.js';

declare module 'express-session' {
  interface SessionData {
    userId: string;
    companyId: string;
  }
}

const sessionMaxAgeMs = 14 * 24 * 60 * 60 * 1000;

const SequelizeStore = connectSessionSequelize(session.Store);
export type SessionStore = InstanceType<typeof SequelizeStore>;

/**
 * The store. `checkExpirationInterval` 0 disables the background sweep (tests); the server
 * passes a real interval and calls `stopExpiringSessions()` on shutdown.
 */
export function createSessionStore(
  sequelize: Sequelize,
  checkExpirationIntervalMs: number,
): SessionStore {
  return new SequelizeStore({
    db: sequelize,
    table: 'Session',
    checkExpirationInterval: checkExpirationIntervalMs,
    expiration: sessionMaxAgeMs,
    // Copy the user id into its own column so a password reset can end that user's sessions.
    extendDefaultFields: (defaults, data: { userId?: string }) => ({
      ...defaults,
      userId: data.userId ?? null,
    }),
  });
}

export function createSessionMiddleware(env: Env, store: SessionStore): RequestHandler {
  return session({
    name: env.cookieNames.session,
    secret: env.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: env.cookieSecure,
      maxAge: sessionMaxAgeMs,
      path: '/',
    },
  });
}

/** Starts a fresh session (new id, defeating fixation) for the user in the given company. */
export async function signIn(req: Request, userId: string, companyId: string): Promise<void> {
  await new Promise<void>((resolve, reject) =>
    req.session.regenerate((err) => (err ? reject(err as Error) : resolve())),
  );
  req.session.userId = userId;
  req.session.companyId = companyId;
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
