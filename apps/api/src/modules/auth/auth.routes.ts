import type { Request, Response } from 'express';
import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createAuthHandlers } from './auth.handlers.js';
import { createAuthService } from './auth.service.js';
import { createLoginLimiter } from './login-limiter.js';
import { createPasswordResetService } from './password-reset.service.js';
import { byBodyEmail, byTokenParam, createFlowLimits } from './rate-limits.js';

export function registerAuthRoutes(
  routes: RouteTable,
  deps: ServiceDeps,
  issueCsrfToken: (req: Request, res: Response) => string,
): void {
  const { env, sequelize } = deps;
  const { windowMs } = env.rateLimits;
  const loginLimiter = createLoginLimiter(env.login, env.rateLimits, sequelize);
  const signupLimits = createFlowLimits(sequelize, {
    name: 'signup',
    limits: env.rateLimits.signup,
    windowMs,
    account: byBodyEmail,
    message: 'Too many sign-ups; wait a while and try again',
  });
  const resetRequestLimits = createFlowLimits(sequelize, {
    name: 'password-reset-request',
    limits: env.rateLimits.passwordResetRequest,
    windowMs,
    account: byBodyEmail,
    message: 'Too many reset requests; wait a while and try again',
  });
  const resetLimits = createFlowLimits(sequelize, {
    name: 'password-reset',
    limits: env.rateLimits.passwordReset,
    windowMs,
    account: byTokenParam,
    message: 'Too many attempts with reset links; wait a while and try again',
  });
  const handlers = createAuthHandlers({
    env,
    auth: createAuthService(deps),
    passwordReset: createPasswordResetService(deps),
    issueCsrfToken,
    onLoginSucceeded: loginLimiter.reset,
  });
  routes.add('get', '/auth/csrf', { access: 'public' }, handlers.csrf);
  routes.add('post', '/auth/signup', { access: 'public' }, ...signupLimits, handlers.signup);
  routes.add(
    'post',
    '/auth/login',
    { access: 'public' },
    ...loginLimiter.middleware,
    handlers.login,
  );
  routes.add('post', '/auth/logout', { access: 'public' }, handlers.logout);
  routes.add(
    'post',
    '/auth/password-reset',
    { access: 'public' },
    ...resetRequestLimits,
    handlers.requestPasswordReset,
  );
  routes.add(
    'post',
    '/auth/password-reset/:token',
    { access: 'public' },
    ...resetLimits,
    handlers.completePasswordReset,
  );
}
