import type { ListResponse, MemberView, Role } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import {
  deleteMember,
  findMember,
  listMembers,
  lockOwners,
  updateMemberRole,
} from './members.repository.js';

export function createMembersService(sequelize: Sequelize) {
  type MemberRow = Awaited<ReturnType<typeof listMembers>>['rows'][number];
  const toView = (m: MemberRow): MemberView => ({
    id: m.id,
    userId: m.userId,
    name: m.name,
    email: m.email,
    role: m.role,
    createdAt: m.createdAt.toISOString(),
  });

  async function list(
    ctx: RequestContext,
    query: { page: number; pageSize: number },
  ): Promise<ListResponse<MemberView>> {
    const { rows, total } = await listMembers(ctx, {
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    });
    return { data: rows.map(toView), meta: { page: query.page, pageSize: query.pageSize, total } };
  }

  /** Refuses a change that would leave the company without an owner. */
  async function assertNotLastOwner(ctx: RequestContext, currentRole: Role, tx: Tx): Promise<void> {
    if (currentRole !== 'owner') return;
    if ((await lockOwners(ctx, tx)) <= 1) {
      throw new AppError(
        'CONFLICT',
        'A company needs at least one owner; make someone else an owner first',
      );
    }
  }

  async function changeRole(ctx: RequestContext, id: string, role: Role): Promise<MemberView> {
    await inTransaction(sequelize, async (tx) => {
      const member = await findMember(ctx, id, tx);
      if (!member) throw notFound('Member');
      if (member.role === role) return;
      if (role !== 'owner') await assertNotLastOwner(ctx, member.role, tx);
      await updateMemberRole(ctx, id, role, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'member.role_changed',
          entity: 'member',
          entityId: id,
          data: { from: member.role, to: role },
        },
        tx,
      );
    });
    const { rows } = await listMembers(ctx, { limit: 1, offset: 0 }, { id });
    if (!rows[0]) throw notFound('Member');
    return toView(rows[0]);
  }

  async function remove(ctx: RequestContext, id: string): Promise<void> {
    await inTransaction(sequelize, async (tx) => {
      const member = await findMember(ctx, id, tx);
      if (!member) throw notFound('Member');
      await assertNotLastOwner(ctx, member.role, tx);
      await deleteMember(ctx, id, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'member.removed',
          entity: 'member',
          entityId: id,
          data: { userId: member.userId, role: member.role },
        },
        tx,
      );
    });
  }

  return { list, changeRole, remove };
}
