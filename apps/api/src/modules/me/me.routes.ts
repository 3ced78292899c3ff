import type { RouteTable } from '../../http/route-table.js';
import { getMeHandler, switchCompanyHandler } from './me.handlers.js';

export function registerMeRoutes(routes: RouteTable): void {
  routes.add('get', '/me', { access: 'tenant' }, getMeHandler);
  routes.add('post', '/me/company', { access: 'tenant' }, switchCompanyHandler);
}
