import type { Request, Response } from 'express';
import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { checkHealth } from './health.service.js';

export function registerHealthRoutes(routes: RouteTable, deps: ServiceDeps): void {
  routes.add('get', '/health', { access: 'public' }, async (_req: Request, res: Response) => {
    const health = await checkHealth(deps.sequelize);
    res.status(health.database === 'ok' ? 200 : 503).json({ data: health });
  });
}
