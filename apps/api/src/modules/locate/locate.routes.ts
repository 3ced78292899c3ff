import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createLocateHandlers } from './locate.handlers.js';
import { createLocateService } from './locate.service.js';

export function registerLocateRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createLocateHandlers(createLocateService(deps));
  const read = { access: 'tenant', permission: 'locate.read' } as const;
  const write = { access: 'tenant', permission: 'locate.write' } as const;
  routes.add('get', '/jobs/:id/locate-tickets', read, handlers.listForJob);
  routes.add('post', '/jobs/:id/locate-tickets', write, handlers.create);
  routes.add('patch', '/locate-tickets/:id', write, handlers.updateStatus);
}
