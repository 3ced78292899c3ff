import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createProfileHandlers, getMeHandler, switchCompanyHandler } from './me.handlers.js';
import { createPasswordChangeLimiter } from './password-change-limiter.js';
import { createProfileService } from './profile.service.js';

// Every role may read and change its own profile: the user is always the session's own.
export function registerMeRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const profile = createProfileHandlers(createProfileService(deps));
  const limiter = createPasswordChangeLimiter(deps.env.login, deps.sequelize);
  routes.add('get', '/me', { access: 'tenant' }, getMeHandler);
  routes.add('patch', '/me', { access: 'tenant' }, profile.updateProfile);
  routes.add('post', '/me/company', { access: 'tenant' }, switchCompanyHandler);
  routes.add('post', '/me/password', { access: 'tenant' }, limiter, profile.changePassword);
}
