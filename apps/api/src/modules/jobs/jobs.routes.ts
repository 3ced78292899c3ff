import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createJobsHandlers } from './jobs.handlers.js';
import { createJobsService } from './jobs.service.js';

export function registerJobsRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createJobsHandlers(createJobsService(deps.sequelize));
  const read = { access: 'tenant', permission: 'jobs.read' } as const;
  const write = { access: 'tenant', permission: 'jobs.write' } as const;
  routes.add('get', '/jobs', read, handlers.list);
  routes.add('post', '/jobs', write, handlers.create);
  routes.add('get', '/jobs/:id', read, handlers.get);
  routes.add('patch', '/jobs/:id', write, handlers.update);
}
