import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createEstimatingSettingsHandlers } from './estimating-settings.handlers.js';
import { createEstimatingSettingsService } from './estimating-settings.service.js';

export function registerEstimatingSettingsRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createEstimatingSettingsHandlers(
    createEstimatingSettingsService(deps.sequelize),
  );
  // Markup and tax are money: readable by whoever may read the price book.
  routes.add(
    'get',
    '/estimating-settings',
    { access: 'tenant', permission: 'pricebook.read' },
    handlers.get,
  );
  routes.add(
    'patch',
    '/estimating-settings',
    { access: 'tenant', permission: 'estimating.manage' },
    handlers.update,
  );
}
