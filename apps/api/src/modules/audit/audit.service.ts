import type { AuditEventView, ListResponse } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { listAuditEvents } from './audit.repository.js';

export async function listAuditEventsPage(
  ctx: RequestContext,
  query: { page: number; pageSize: number },
): Promise<ListResponse<AuditEventView>> {
  const { rows, total } = await listAuditEvents(ctx, {
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return {
    data: rows.map((r) => ({
      id: r.id,
      userId: r.userId,
      userName: r.userName,
      action: r.action,
      entity: r.entity,
      entityId: r.entityId,
      data: r.data,
      createdAt: r.createdAt.toISOString(),
    })),
    meta: { page: query.page, pageSize: query.pageSize, total },
  };
}
