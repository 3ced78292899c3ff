import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createCompanyHandlers } from './company.handlers.js';
import { createCompanyService } from './company.service.js';

export function registerCompanyRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createCompanyHandlers(createCompanyService(deps.sequelize));
  routes.add('get', '/company', { access: 'tenant', permission: 'company.read' }, handlers.get);
  routes.add(
    'patch',
    '/company',
    { access: 'tenant', permission: 'company.manage' },
    handlers.update,
  );
}
