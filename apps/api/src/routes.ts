// The list of API modules. Every route goes through the RouteTable (see http/route-table.ts).
import type { Request, Response } from 'express';
import type { ServiceDeps } from './deps.js';
import type { RouteTable } from './http/route-table.js';
import { registerAreasRoutes } from './modules/areas/areas.routes.js';
import { registerAuditRoutes } from './modules/audit/audit.routes.js';
import { registerAuthRoutes } from './modules/auth/auth.routes.js';
import { registerCompanyRoutes } from './modules/company/company.routes.js';
import { registerBookingsRoutes } from './modules/bookings/bookings.routes.js';
import { registerCrewsRoutes } from './modules/crews/crews.routes.js';
import { registerCustomersRoutes } from './modules/customers/customers.routes.js';
import { registerEstimatesRoutes } from './modules/estimates/estimates.routes.js';
import { registerEstimatingSettingsRoutes } from './modules/estimating-settings/estimating-settings.routes.js';
import { registerHealthRoutes } from './modules/health/health.routes.js';
import { registerInvitationsRoutes } from './modules/invitations/invitations.routes.js';
import { registerInvoicesRoutes } from './modules/invoices/invoices.routes.js';
import { registerJobsRoutes } from './modules/jobs/jobs.routes.js';
import { registerLocateRoutes } from './modules/locate/locate.routes.js';
import { registerMeRoutes } from './modules/me/me.routes.js';
import { registerMembersRoutes } from './modules/members/members.routes.js';
import { registerPlansRoutes } from './modules/plans/plans.routes.js';
import { registerReceivablesRoutes } from './modules/receivables/receivables.routes.js';
import { registerDashboardRoutes } from './modules/dashboard/dashboard.routes.js';
import { registerPriceBookRoutes } from './modules/price-book/price-book.routes.js';
import { registerRemindersRoutes } from './modules/reminders/reminders.routes.js';
import { registerSitesRoutes } from './modules/sites/sites.routes.js';
import { registerStockRoutes } from './modules/stock/stock.routes.js';

export function registerApiRoutes(
  routes: RouteTable,
  deps: ServiceDeps,
  issueCsrfToken: (req: Request, res: Response) => string,
): void {
  registerHealthRoutes(routes, deps);
  registerAuthRoutes(routes, deps, issueCsrfToken);
  registerMeRoutes(routes, deps);
  registerCompanyRoutes(routes, deps);
  registerMembersRoutes(routes, deps);
  registerInvitationsRoutes(routes, deps);
  registerCustomersRoutes(routes, deps);
  registerSitesRoutes(routes, deps);
  registerJobsRoutes(routes, deps);
  registerAreasRoutes(routes, deps);
  registerStockRoutes(routes, deps);
  registerLocateRoutes(routes, deps);
  registerAuditRoutes(routes);
  registerPlansRoutes(routes, deps);
  registerPriceBookRoutes(routes, deps);
  registerEstimatingSettingsRoutes(routes, deps);
  registerEstimatesRoutes(routes, deps);
  registerInvoicesRoutes(routes, deps);
  registerRemindersRoutes(routes, deps);
  registerCrewsRoutes(routes, deps);
  registerBookingsRoutes(routes, deps);
  registerReceivablesRoutes(routes, deps);
  registerDashboardRoutes(routes, deps);
}
