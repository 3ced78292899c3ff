// An app whose log lines are kept in memory, for tests that read what the API logs.
import { Writable } from 'node:stream';
import { PlannerPool, createApp, createLogger, createSequelize, loadEnv } from '@seamwright/api';
import type { App } from '../../fixtures/app.js';

export interface LoggedApp {
  app: App;
  /** Every line written so far, as one string. */
  output(): string;
  close(): Promise<void>;
}

export function createLoggedApp(level: 'info' | 'error'): LoggedApp {
  const lines: string[] = [];
  const sink = new Writable({
    write(chunk: Buffer, _encoding, done) {
      lines.push(chunk.toString('utf8'));
      done();
    },
  });
  const env = loadEnv();
  const sequelize = createSequelize(env.db);
  const plannerPool = new PlannerPool(env.planner);
  const app = createApp({ env, sequelize, logger: createLogger(level, sink), plannerPool });
  const close = async () => {
    await plannerPool.close();
    await sequelize.close();
  };
  return { app, output: () => lines.join(''), close };
}
