// createApp(): the whole HTTP application without listening. Order matters: request id and
// logging first, security headers, the raw-body routes (the processor's webhooks: no JSON
// parsing, session or CSRF), body parsing (JSON only), session, CSRF, then routes, 404,
// errors. The route table is built before the logger so the logger knows the token routes.
import express from 'express';
import type { Express } from 'express';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { Env } from './config/env.js';
import type { ServiceDeps } from './deps.js';
import { createCsrf } from './http/csrf.js';
import { createRequireJsonBody } from './http/client-errors.js';
import { apiNotFound, errorHandler } from './http/error-handler.js';
import { tokenRoutePatterns } from './http/log-redaction.js';
import { createHttpLogger, createLogger } from './http/logging.js';
import { RouteTable } from './http/route-table.js';
import type { RouteEntry } from './http/route-table.js';
import { apiNoStore, createSecurityHeaders } from './http/security.js';
import { createSessionMiddleware, createSessionStore } from './http/session.js';
import type { SessionStore } from './http/session.js';
import { serveWebApp } from './http/web-app.js';
import { createMailer } from './mail/mailer.js';
import { registerProcessorWebhookRoutes } from './modules/processor/webhook.routes.js';
import type { Mailer } from './mail/mailer.js';
import type { PlannerPool } from './planner/planner-pool.js';
import { registerApiRoutes } from './routes.js';
import { createLocalDiskStorage } from './modules/uploads/upload-storage.js';
import type { FileStorage } from './modules/uploads/upload-storage.js';

export interface AppDeps {
  env: Env;
  sequelize: Sequelize;
  /** Defaults to SMTP from `env`. */
  mailer?: Mailer;
  logger?: Logger;
  /** Defaults to a store without the background sweep (the server passes its own). */
  sessionStore?: SessionStore;
  /** Owned by the caller, who closes it on shutdown (`createPlannerPool(env.planner)`). */
  plannerPool: PlannerPool;
  /** Defaults to the local disk under `env.uploadsDir`. */
  storage?: FileStorage;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express's own augmentation point
  namespace Express {
    interface Locals {
      /** Every API route, for the tenant-isolation test and documentation. */
      apiRoutes: RouteEntry[];
    }
  }
}

export function createApp(deps: AppDeps): Express {
  const { env, sequelize } = deps;
  const logger = deps.logger ?? createLogger(env.logLevel);
  const services: ServiceDeps = {
    env,
    sequelize,
    logger,
    mailer: deps.mailer ?? createMailer(env.smtp),
    plannerPool: deps.plannerPool,
    storage: deps.storage ?? createLocalDiskStorage(env.uploadsDir),
  };
  const store = deps.sessionStore ?? createSessionStore(sequelize, 0);
  const csrf = createCsrf(env);

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', env.trustProxy);
  app.set('query parser', 'extended');
  const routes = new RouteTable('/api');
  registerApiRoutes(routes, services, csrf.issueToken);
  // Routes that read their own raw body and carry their own credential (a signature).
  const rawRoutes = new RouteTable('/api');
  registerProcessorWebhookRoutes(rawRoutes, services);
  const allRoutes = [...rawRoutes.entries, ...routes.entries];
  app.locals.apiRoutes = allRoutes;

  app.use(createHttpLogger(logger, tokenRoutePatterns(allRoutes.map((r) => r.path))));
  app.use(createSecurityHeaders(env.cookieSecure));

  app.use('/api', rawRoutes.router);

  app.use(
    '/api',
    apiNoStore,
    express.json({ limit: '1mb' }),
    createRequireJsonBody(routes.multipartPaths),
    createSessionMiddleware(env, store),
    csrf.verify,
    routes.router,
  );
  app.use('/api', apiNotFound);
  if (env.webDistDir) serveWebApp(app, env.webDistDir);
  app.use(errorHandler);
  return app;
}
