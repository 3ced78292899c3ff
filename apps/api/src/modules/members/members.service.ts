import type { MemberView, Role } from '@seamwright/shared';
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
  async function list(ctx: RequestContext): Promise<MemberView[]> {
    const rows = await listMembers(ctx);
    return rows.map((m) => ({
      id: m.id,
      userId: m.userId,
      name: m.name,
      email: m.email,
      role: m.role,
      createdAt: m.createdAt.toISOString(),
    }));
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
    const updated = (await list(ctx)).find((m) => m.id === id);
    if (!updated) throw notFound('Member');
    return updated;
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
