// The owner's dashboard. Owner only: pipeline, margins and crew use are the owner's business.
import type { Request, Response } from 'express';
import { dashboardQuerySchema } from '@seamwright/shared';
import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { contextOf } from '../../http/tenant-context.js';
import { parseInput } from '../../http/validate.js';
import { getDashboard } from './dashboard.service.js';

export function registerDashboardRoutes(routes: RouteTable, deps: ServiceDeps): void {
  routes.add(
    'get',
    '/reports/dashboard',
    { access: 'tenant', permission: 'dashboard.read' },
    async (req: Request, res: Response): Promise<void> => {
      const query = parseInput(dashboardQuerySchema, req.query);
      res.json({ data: await getDashboard(contextOf(req), deps.sequelize, query) });
    },
  );
}
