import { Op } from 'sequelize';
import type { Role } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { CompanyModel, InvitationModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export function listInvitations(ctx: RequestContext) {
  return scoped(ctx, InvitationModel).findAll({
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
  });
}

export function findInvitation(ctx: RequestContext, id: string, tx: Tx) {
  return scoped(ctx, InvitationModel).findById(id, { tx, lock: true });
}

export function createInvitation(
  ctx: RequestContext,
  values: { email: string; role: Role; tokenHash: string; expiresAt: Date },
  tx: Tx,
) {
  return scoped(ctx, InvitationModel).create(
    { ...values, acceptedAt: null, invitedBy: ctx.userId },
    tx,
  );
}

/** Drops earlier unaccepted invitations to the same address, so only the newest link works. */
export function deletePendingInvitationsFor(ctx: RequestContext, email: string, tx: Tx) {
  return scoped(ctx, InvitationModel).destroy({ email, acceptedAt: null }, tx);
}

export function deleteInvitation(ctx: RequestContext, id: string, tx: Tx) {
  return scoped(ctx, InvitationModel).destroy({ id }, tx);
}

/**
 * Unscoped on purpose: the invitee is not yet a member, so the token (whose hash only the
 * e-mailed link can produce) is what identifies the company.
 */
export async function unsafeFindOpenInvitationByTokenHash(tokenHash: string, now: Date, tx?: Tx) {
  const row = await InvitationModel.findOne({
    where: { tokenHash, acceptedAt: null, expiresAt: { [Op.gt]: now } },
    unscopedReason: 'the invitation token identifies the company',
    ...(tx ? { transaction: tx, lock: tx.LOCK.UPDATE } : {}),
  });
  if (!row) return null;
  const company = await CompanyModel.findByPk(row.companyId, {
    attributes: ['name'],
    ...(tx ? { transaction: tx } : {}),
  });
  return { ...row.get({ plain: true }), companyName: company?.name ?? '' };
}

export async function markInvitationAccepted(
  ctx: RequestContext,
  id: string,
  now: Date,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, InvitationModel).update(id, { acceptedAt: now }, tx);
}
