import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createCustomersHandlers } from './customers.handlers.js';
import { createCustomersService } from './customers.service.js';

export function registerCustomersRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createCustomersHandlers(createCustomersService(deps.sequelize));
  const read = { access: 'tenant', permission: 'customers.read' } as const;
  const write = { access: 'tenant', permission: 'customers.write' } as const;
  routes.add('get', '/customers', read, handlers.list);
  routes.add('post', '/customers', write, handlers.create);
  routes.add('get', '/customers/:id', read, handlers.get);
  routes.add('patch', '/customers/:id', write, handlers.update);
  routes.add('delete', '/customers/:id', write, handlers.remove);
}
