import { pageQuerySchema } from './list.js';

/** `GET /api/audit-events` query: paging only, newest first. */
export const auditEventListQuerySchema = pageQuerySchema;

/** One recorded change in a company. */
export interface AuditEventView {
  id: string;
  userId: string | null;
  /** Name of the acting user at read time, or null (system or deleted user). */
  userName: string | null;
  /** e.g. `customer.created`, `member.role_changed`. */
  action: string;
  entity: string;
  entityId: string | null;
  data: Record<string, unknown> | null;
  createdAt: string;
}
