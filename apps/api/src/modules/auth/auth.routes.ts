import type { Request, Response } from 'express';
import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createAuthHandlers } from './auth.handlers.js';
import { createAuthService } from './auth.service.js';
import { createLoginLimiter } from './login-limiter.js';
import { createPasswordResetService } from './password-reset.service.js';

export function registerAuthRoutes(
  routes: RouteTable,
  deps: ServiceDeps,
  issueCsrfToken: (req: Request, res: Response) => string,
): void {
  const limiter = createLoginLimiter(deps.env.login, deps.sequelize);
  const handlers = createAuthHandlers({
    env: deps.env,
    auth: createAuthService(deps),
    passwordReset: createPasswordResetService(deps),
    issueCsrfToken,
    onLoginSucceeded: limiter.reset,
  });
  routes.add('get', '/auth/csrf', { access: 'public' }, handlers.csrf);
  routes.add('post', '/auth/signup', { access: 'public' }, handlers.signup);
  routes.add('post', '/auth/login', { access: 'public' }, limiter.middleware, handlers.login);
  routes.add('post', '/auth/logout', { access: 'public' }, handlers.logout);
  routes.add('post', '/auth/password-reset', { access: 'public' }, handlers.requestPasswordReset);
  routes.add(
    'post',
    '/auth/password-reset/:token',
    { access: 'public' },
    handlers.completePasswordReset,
  );
}
