import type { RequestContext } from '../../context.js';
import { AuditEventModel, UserModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export interface AuditEntry {
  action: string;
  entity: string;
  entityId: string | null;
  data?: Record<string, unknown>;
  /** Who acted, when not the context's user: null for the customer on their estimate page. */
  userId?: string | null;
}

/** Appends an audit event for the acting user in their company, inside the caller's transaction. */
export async function recordAuditEvent(
  ctx: RequestContext,
  entry: AuditEntry,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, AuditEventModel).create(
    {
      userId: entry.userId === undefined ? ctx.userId : entry.userId,
      action: entry.action,
      entity: entry.entity,
      entityId: entry.entityId,
      data: entry.data ?? null,
    },
    tx,
  );
}

export async function listAuditEvents(
  ctx: RequestContext,
  page: { limit: number; offset: number },
) {
  const events = scoped(ctx, AuditEventModel);
  const [rows, total] = await Promise.all([
    events.findAll({
      order: [
        ['createdAt', 'DESC'],
        ['id', 'ASC'],
      ],
      limit: page.limit,
      offset: page.offset,
    }),
    events.count(),
  ]);
  const userIds = [...new Set(rows.map((r) => r.userId).filter((id): id is string => id !== null))];
  const users = userIds.length
    ? await UserModel.findAll({ where: { id: userIds }, attributes: ['id', 'name'] })
    : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  return {
    rows: rows.map((r) => ({ ...r, userName: r.userId ? (names.get(r.userId) ?? null) : null })),
    total,
  };
}
