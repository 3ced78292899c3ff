import type { Role } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { MembershipModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped, scopedSql } from '../../db/tenant-scope.js';

/** The company's members with their names and e-mails, oldest first, in one statement. */
export function listMembers(ctx: RequestContext) {
  return scopedSql(ctx, MembershipModel.sequelize!).select<{
    id: string;
    userId: string;
    role: Role;
    createdAt: Date;
    name: string;
    email: string;
  }>(
    `SELECT m.id, m.user_id AS userId, m.role, m.created_at AS createdAt, u.name, u.email
     FROM memberships m JOIN users u ON u.id = m.user_id
     WHERE m.company_id = :companyId
     ORDER BY m.created_at, m.id`,
  );
}

export function findMember(ctx: RequestContext, id: string, tx: Tx) {
  return scoped(ctx, MembershipModel).findById(id, { tx, lock: true });
}

/** Locks the company's owner rows so two concurrent demotions cannot both pass the last-owner check. */
export async function lockOwners(ctx: RequestContext, tx: Tx): Promise<number> {
  const owners = await scoped(ctx, MembershipModel).findAll({
    where: { role: 'owner' },
    tx,
    lock: true,
  });
  return owners.length;
}

export function findMembershipOfUserInCompany(ctx: RequestContext, userId: string, tx: Tx) {
  return scoped(ctx, MembershipModel).findAll({ where: { userId }, tx });
}

export function addMember(ctx: RequestContext, userId: string, role: Role, tx: Tx) {
  return scoped(ctx, MembershipModel).create({ userId, role }, tx);
}

export function updateMemberRole(ctx: RequestContext, id: string, role: Role, tx: Tx) {
  return scoped(ctx, MembershipModel).update(id, { role }, tx);
}

export function deleteMember(ctx: RequestContext, id: string, tx: Tx) {
  return scoped(ctx, MembershipModel).destroy({ id }, tx);
}
