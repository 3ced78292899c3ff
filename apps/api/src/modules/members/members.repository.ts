import type { Role } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { MembershipModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped, scopedSql } from '../../db/tenant-scope.js';

interface MemberPageRow {
  total: number | bigint;
  id: string | null;
  userId: string;
  role: Role;
  createdAt: Date;
  name: string;
  email: string;
}

/**
 * One page of the company's members, oldest first, with their names and e-mails, and the
 * total, in one statement (the total sits in a one-row table the page is left-joined to, so an
 * empty page still carries it). `where` narrows to one member.
 */
export async function listMembers(
  ctx: RequestContext,
  page: { limit: number; offset: number },
  where: { id?: string } = {},
) {
  const byId = where.id === undefined ? '' : 'AND id = :id';
  const rows = await scopedSql(ctx, MembershipModel.sequelize!).select<MemberPageRow>(
    `SELECT t.total, p.id, p.userId, p.role, p.createdAt, p.name, p.email
     FROM (SELECT COUNT(*) AS total FROM memberships WHERE company_id = :companyId ${byId}) t
     LEFT JOIN (
       SELECT m.id, m.user_id AS userId, m.role, m.created_at AS createdAt, u.name, u.email
       FROM memberships m JOIN users u ON u.id = m.user_id
       WHERE m.company_id = :companyId ${byId.replace('id', 'm.id')}
       ORDER BY m.created_at, m.id
       LIMIT :limit OFFSET :offset
     ) p ON TRUE
     ORDER BY p.createdAt, p.id`,
    { ...where, limit: page.limit, offset: page.offset },
  );
  const members = rows
    .filter((row): row is MemberPageRow & { id: string } => row.id !== null)
    .map(({ total: _total, ...member }) => member);
  return { rows: members, total: Number(rows[0]?.total ?? 0) };
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
