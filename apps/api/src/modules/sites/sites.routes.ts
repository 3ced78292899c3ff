import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createSitesHandlers } from './sites.handlers.js';
import { createSitesService } from './sites.service.js';

export function registerSitesRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createSitesHandlers(createSitesService(deps.sequelize));
  const read = { access: 'tenant', permission: 'sites.read' } as const;
  const write = { access: 'tenant', permission: 'sites.write' } as const;
  routes.add('get', '/customers/:id/sites', read, handlers.listForCustomer);
  routes.add('post', '/customers/:id/sites', write, handlers.create);
  routes.add('get', '/sites/:id', read, handlers.get);
  routes.add('patch', '/sites/:id', write, handlers.update);
  routes.add('delete', '/sites/:id', write, handlers.remove);
}
