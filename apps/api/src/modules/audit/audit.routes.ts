import type { RouteTable } from '../../http/route-table.js';
import { listAuditEventsHandler } from './audit.handlers.js';

export function registerAuditRoutes(routes: RouteTable): void {
  routes.add(
    'get',
    '/audit-events',
    { access: 'tenant', permission: 'audit.read' },
    listAuditEventsHandler,
  );
}
