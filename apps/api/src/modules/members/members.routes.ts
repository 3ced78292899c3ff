import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createMembersHandlers } from './members.handlers.js';
import { createMembersService } from './members.service.js';

export function registerMembersRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createMembersHandlers(createMembersService(deps.sequelize));
  routes.add('get', '/members', { access: 'tenant', permission: 'members.read' }, handlers.list);
  routes.add(
    'patch',
    '/members/:id',
    { access: 'tenant', permission: 'members.manage' },
    handlers.update,
  );
  routes.add(
    'delete',
    '/members/:id',
    { access: 'tenant', permission: 'members.manage' },
    handlers.remove,
  );
}
