import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createBookingsHandlers } from './bookings.handlers.js';
import { createBookingsService } from './bookings.service.js';

export function registerBookingsRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createBookingsHandlers(createBookingsService(deps));
  const read = { access: 'tenant', permission: 'bookings.read' } as const;
  const write = { access: 'tenant', permission: 'bookings.write' } as const;
  routes.add('get', '/bookings', read, handlers.list);
  routes.add('post', '/bookings', write, handlers.create);
  routes.add('patch', '/bookings/:id', write, handlers.update);
  routes.add('delete', '/bookings/:id', write, handlers.remove);
}
