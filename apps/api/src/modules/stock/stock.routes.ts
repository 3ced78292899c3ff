import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createReservationsService } from './reservations.service.js';
import { createRollsService } from './rolls.service.js';
import { createStockHandlers } from './stock.handlers.js';

export function registerStockRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createStockHandlers(createRollsService(deps), createReservationsService(deps));
  const read = { access: 'tenant', permission: 'inventory.read' } as const;
  const write = { access: 'tenant', permission: 'inventory.write' } as const;
  // A job's reservation is part of the job: read with the job's own access.
  const readJob = { access: 'tenant', permission: 'jobs.read' } as const;
  routes.add('get', '/rolls', read, handlers.listRolls);
  routes.add('post', '/rolls', write, handlers.createRoll);
  routes.add('post', '/rolls/deliveries', write, handlers.receiveDelivery);
  routes.add('get', '/rolls/:id', read, handlers.getRoll);
  routes.add('patch', '/rolls/:id', write, handlers.updateRoll);
  routes.add('get', '/jobs/:id/reservations', readJob, handlers.getReservation);
  routes.add('post', '/jobs/:id/reservations', write, handlers.reserve);
  routes.add('delete', '/jobs/:id/reservations', write, handlers.release);
  routes.add('post', '/jobs/:id/remnants', write, handlers.returnRemnants);
}
