import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createCrewsHandlers } from './crews.handlers.js';
import { createCrewsService } from './crews.service.js';

export function registerCrewsRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createCrewsHandlers(createCrewsService(deps));
  const read = { access: 'tenant', permission: 'crews.read' } as const;
  const manage = { access: 'tenant', permission: 'crews.manage' } as const;
  routes.add('get', '/crews', read, handlers.list);
  routes.add('post', '/crews', manage, handlers.create);
  routes.add('get', '/crews/:id', read, handlers.get);
  routes.add('patch', '/crews/:id', manage, handlers.update);
  routes.add('delete', '/crews/:id', manage, handlers.remove);
}
