// Starts the API: connects, migrates when asked, listens, and shuts down gracefully on
// SIGTERM/SIGINT (stop accepting, finish in-flight requests, stop the session sweep and the
// planner threads, close the database pool). Run directly with `tsx src/server.ts`, or call startServer() from a script.
import type { Server } from 'node:http';
import { fileURLToPath } from 'node:url';
import { createApp } from './app.js';
import { loadEnv } from './config/env.js';
import type { Env } from './config/env.js';
import { migrateDatabase } from './db/migrate.js';
import { createSequelize } from './db/sequelize.js';
import { createLogger } from './http/logging.js';
import { answerMalformedRequests } from './http/malformed-requests.js';
import { createSessionStore } from './http/session.js';
import { createMailer } from './mail/mailer.js';
import { createReminderWorker } from './modules/reminders/reminder-worker.js';
import { PlannerPool } from './planner/planner-pool.js';

export interface RunningServer {
  server: Server;
  url: string;
  stop(): Promise<void>;
}

export interface StartServerOptions {
  env?: Env;
  /** Apply pending migrations before listening (default true). */
  migrate?: boolean;
  /** Install SIGTERM/SIGINT handlers (default true). */
  handleSignals?: boolean;
}

const sessionSweepIntervalMs = 15 * 60 * 1000;

export async function startServer(options: StartServerOptions = {}): Promise<RunningServer> {
  const env = options.env ?? loadEnv();
  const logger = createLogger(env.logLevel);
  const sequelize = createSequelize(env.db);
  if (options.migrate ?? true) {
    const { applied } = await migrateDatabase(sequelize);
    if (applied.length) logger.info({ applied }, 'migrations applied');
  }
  const sessionStore = createSessionStore(sequelize, sessionSweepIntervalMs);
  const mailer = createMailer(env.smtp);
  const plannerPool = new PlannerPool(env.planner);
  plannerPool.warm();
  const app = createApp({ env, sequelize, logger, mailer, sessionStore, plannerPool });
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(env.port, '127.0.0.1', () => resolve(s));
  });
  answerMalformedRequests(server);
  // Payment reminders run in every API process; the row locks keep them apart (reminder-worker.ts).
  const fixedClock = env.reminders.fixedClock;
  const reminderWorker = env.reminders.worker
    ? createReminderWorker(
        { env, sequelize, mailer, logger },
        fixedClock ? { now: () => fixedClock } : {},
      )
    : null;
  reminderWorker?.start();
  const url = `http://127.0.0.1:${env.port}`;
  logger.info({ url }, 'Seamwright API listening');

  let stopping: Promise<void> | null = null;
  const stop = () => {
    stopping ??= (async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await reminderWorker?.stop();
      sessionStore.stopExpiringSessions();
      mailer.close();
      await plannerPool.close();
      await sequelize.close();
      logger.info('Seamwright API stopped');
    })();
    return stopping;
  };
  if (options.handleSignals ?? true) {
    for (const signal of ['SIGTERM', 'SIGINT'] as const) {
      process.once(signal, () => {
        // Idle keep-alive connections would hold close() open; end them after a grace period.
        setTimeout(() => server.closeAllConnections(), 5000).unref();
        void stop().then(() => process.exit(0));
      });
    }
  }
  return { server, url, stop };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  startServer().catch((error: unknown) => {
    console.error(error);
    process.exit(1);
  });
}
