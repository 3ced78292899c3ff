// Builds RequestContext from the session only, re-checking the membership on every request so
// a removed member loses access at once (403 COMPANY_ACCESS_ENDED, or 401 without any company).
import type { Request, RequestHandler } from 'express';
import type { Action } from '@seamwright/shared';
import { can } from '@seamwright/shared';
import type { RequestContext } from '../context.js';
import { AppError } from '../errors.js';
import {
  unsafeFindFirstMembershipOfUser,
  unsafeFindMembershipOfUser,
} from '../modules/me/me.repository.js';
import type { UserMembership } from '../modules/me/me.repository.js';
import { saveSession } from './session.js';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express's own augmentation point
  namespace Express {
    interface Request {
      ctx?: RequestContext;
    }
  }
}

/**
 * The member's role in the company, as read together with the session on this request (one
 * statement; see session-store.ts), or read now when the session did not come from the store.
 */
async function currentMembership(
  req: Request,
  userId: string,
  companyId: string,
): Promise<UserMembership | null> {
  const loaded = req.sessionMembership;
  if (loaded?.userId === userId && loaded.companyId === companyId)
    return loaded.role ? { companyId, role: loaded.role } : null;
  return unsafeFindMembershipOfUser(userId, companyId);
}

/** Requires a signed-in member of the session's active company; sets `req.ctx`. */
export const requireTenant: RequestHandler = async (req, _res, next) => {
  const { userId, companyId } = req.session;
  if (!userId) return next(new AppError('UNAUTHENTICATED', 'Sign in to continue'));
  const membership = companyId ? await currentMembership(req, userId, companyId) : null;
  if (!membership) return next(await endCompanyAccess(req, userId));
  req.ctx = { userId, companyId: membership.companyId, role: membership.role };
  next();
};

/**
 * No longer a member of the active company (or none chosen since). Never falls back to
 * another company on its own: that would serve the other company's data to a screen opened
 * for this one. With a company left, the session stays without an active company and the
 * person must choose one (POST /api/me/company); with none, the session ends.
 */
async function endCompanyAccess(req: Request, userId: string): Promise<AppError> {
  if (await unsafeFindFirstMembershipOfUser(userId)) {
    if (req.session.companyId) {
      delete req.session.companyId;
      await saveSession(req);
    }
    return new AppError(
      'COMPANY_ACCESS_ENDED',
      'Your access to this company has ended; choose one of your companies to continue',
    );
  }
  await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
  return new AppError('UNAUTHENTICATED', 'Your access to this company has ended');
}

/** Requires only a signed-in person, with or without an active company (choosing one). */
export const requireSignedIn: RequestHandler = (req, _res, next) => {
  if (!req.session.userId) return next(new AppError('UNAUTHENTICATED', 'Sign in to continue'));
  next();
};

/** The signed-in user's id, on routes behind `requireSignedIn`. */
export function signedInUserOf(req: Request): string {
  const { userId } = req.session;
  if (!userId) throw new Error('Route is missing requireSignedIn');
  return userId;
}

/** The context set by `requireTenant`; a programming error if the route forgot it. */
export function contextOf(req: Request): RequestContext {
  if (!req.ctx) throw new Error('Route is missing requireTenant');
  return req.ctx;
}

/** One check for the permission table. */
export function requirePermission(action: Action): RequestHandler {
  return (req, _res, next) => {
    const ctx = contextOf(req);
    if (!can(ctx.role, action)) return next(new AppError('FORBIDDEN', 'Your role cannot do this'));
    next();
  };
}
