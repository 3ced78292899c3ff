import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { Env } from './config/env.js';
import type { Mailer } from './mail/mailer.js';
import type { FileStorage } from './modules/uploads/upload-storage.js';
import type { PlannerPool } from './planner/planner-pool.js';

/** What services need from the outside world, built once in createApp. */
export interface ServiceDeps {
  env: Env;
  sequelize: Sequelize;
  mailer: Mailer;
  logger: Logger;
  /** The layout planner's worker threads; every server-side plan goes through it. */
  plannerPool: PlannerPool;
  /** Where uploaded files' bytes live (modules/uploads/upload-storage.ts). */
  storage: FileStorage;
}
