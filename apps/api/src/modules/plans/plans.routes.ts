import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { previewJobPlanHandler, previewPlanHandler } from './plans.handlers.js';

export function registerPlansRoutes(routes: RouteTable, deps: ServiceDeps): void {
  routes.add(
    'post',
    '/plans/preview',
    { access: 'tenant', permission: 'plans.preview' },
    previewPlanHandler(deps.plannerPool),
  );
  routes.add(
    'post',
    '/plans/job-preview',
    { access: 'tenant', permission: 'plans.preview' },
    previewJobPlanHandler(deps.plannerPool),
  );
}
