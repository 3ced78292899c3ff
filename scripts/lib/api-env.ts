// The environment the API process expects (see apps/api/src/config/env.ts), for one instance.
import { join } from 'node:path';
import { instances, type InstanceName } from './instances.js';
import { dataRoot } from './paths.js';
import { webDistDir } from './web-build.js';

export function apiEnv(
  name: InstanceName,
  overrides: { database?: string } = {},
): NodeJS.ProcessEnv {
  const settings = instances[name];
  return {
    ...process.env,
    NODE_ENV: name === 'test' ? 'test' : 'development',
    PORT: String(settings.apiPort),
    APP_URL: `http://127.0.0.1:${settings.apiPort}`,
    DB_HOST: '127.0.0.1',
    DB_PORT: String(settings.db.port),
    DB_NAME: overrides.database ?? settings.db.database,
    DB_USER: settings.db.user,
    DB_PASSWORD: settings.db.password,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(settings.smtpPort),
    MAIL_FROM: 'Seamwright <no-reply@seamwright.test>',
    PROCESSOR_URL: `http://127.0.0.1:${settings.processorPort}`,
    WEB_DIST_DIR: webDistDir,
    UPLOADS_DIR: join(dataRoot, 'uploads', name),
    LOG_LEVEL: process.env.LOG_LEVEL ?? (name === 'test' ? 'warn' : 'info'),
  };
}
