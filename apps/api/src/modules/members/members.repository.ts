import type { Role } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { MembershipModel, UserModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

/** One page of the company's members, oldest first, with their names; `where` narrows to one. */
export async function listMembers(
  ctx: RequestContext,
  page: { limit: number; offset: number },
  where: { id?: string } = {},
) {
  const memberships = scoped(ctx, MembershipModel);
  const [rows, total] = await Promise.all([
    memberships.findAll({
      where,
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: page.limit,
      offset: page.offset,
    }),
    memberships.count(where),
  ]);
  const users = rows.length
    ? await UserModel.findAll({
        where: { id: rows.map((m) => m.userId) },
        attributes: ['id', 'name', 'email'],
      })
    : [];
  const byId = new Map(users.map((u) => [u.id, u]));
  const members = rows.map((m) => ({
    ...m,
    name: byId.get(m.userId)?.name ?? '',
    email: byId.get(m.userId)?.email ?? '',
  }));
  return { rows: members, total };
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
