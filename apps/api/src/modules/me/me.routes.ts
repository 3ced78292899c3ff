import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import {
  createProfileHandlers,
  getMeHandler,
  listMyCompaniesHandler,
  switchCompanyHandler,
} from './me.handlers.js';
import { createPasswordChangeLimiter } from './password-change-limiter.js';
import { createProfileService } from './profile.service.js';

// Every role may read and change its own profile: the user is always the session's own.
export function registerMeRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const profile = createProfileHandlers(createProfileService(deps));
  const limiter = createPasswordChangeLimiter(deps.env.login, deps.sequelize);
  routes.add('get', '/me', { access: 'tenant' }, getMeHandler);
  routes.add('patch', '/me', { access: 'tenant' }, profile.updateProfile);
  routes.add('post', '/me/password', { access: 'tenant' }, limiter, profile.changePassword);
  // Signed in is enough: after access to the active company ended, these let the person choose.
  routes.add('get', '/me/companies', { access: 'signed-in' }, listMyCompaniesHandler);
  routes.add('post', '/me/company', { access: 'signed-in' }, switchCompanyHandler);
}
