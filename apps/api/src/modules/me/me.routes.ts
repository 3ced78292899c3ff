import type { RouteTable } from '../../http/route-table.js';
import { getMeHandler, listMyCompaniesHandler, switchCompanyHandler } from './me.handlers.js';

export function registerMeRoutes(routes: RouteTable): void {
  routes.add('get', '/me', { access: 'tenant' }, getMeHandler);
  // Signed in is enough: after access to the active company ended, these let the person choose.
  routes.add('get', '/me/companies', { access: 'signed-in' }, listMyCompaniesHandler);
  routes.add('post', '/me/company', { access: 'signed-in' }, switchCompanyHandler);
}
