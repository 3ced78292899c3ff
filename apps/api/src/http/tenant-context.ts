// Builds RequestContext from the session only, re-checking the membership on every request so
// a removed member loses access at once.
import type { Request, RequestHandler } from 'express';
import type { Action } from '@seamwright/shared';
import { can } from '@seamwright/shared';
import type { RequestContext } from '../context.js';
import { AppError } from '../errors.js';
import { findFirstMembershipOfUser, findMembershipOfUser } from '../modules/me/me.repository.js';
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
  return findMembershipOfUser(userId, companyId);
}

/** Requires a signed-in member of the session's active company; sets `req.ctx`. */
export const requireTenant: RequestHandler = async (req, _res, next) => {
  const { userId, companyId } = req.session;
  if (!userId || !companyId) return next(new AppError('UNAUTHENTICATED', 'Sign in to continue'));
  let membership = await currentMembership(req, userId, companyId);
  if (!membership) {
    // Removed from the active company: fall back to another company they still belong to.
    membership = await findFirstMembershipOfUser(userId);
    if (!membership) {
      await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
      return next(new AppError('UNAUTHENTICATED', 'Your access to this company has ended'));
    }
    req.session.companyId = membership.companyId;
    await saveSession(req);
  }
  req.ctx = { userId, companyId: membership.companyId, role: membership.role };
  next();
};

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
