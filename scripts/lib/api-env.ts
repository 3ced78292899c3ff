// The environment the API process expects (see apps/api/src/config/env.ts), for one instance.
import { instances, type InstanceName } from './instances.js';
import { webDistDir } from './web-build.js';

/**
 * V8 flags the API process runs with. A 2 MB semi-space (Node 20's default grows to 16 MB, so
 * the young generation alone can hold 48 MB) kept the API's resident size at 188 MB idle and
 * 231 MB at its peak under the 50-connection bench, against 230 and 275 MB with the default
 * (docs/PERFORMANCE.md, "Memory"). As NODE_OPTIONS: worker threads refuse V8 flags in argv.
 */
export const apiNodeOptions = '--max-semi-space-size=2';

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
    LOG_LEVEL: process.env.LOG_LEVEL ?? (name === 'test' ? 'warn' : 'info'),
    NODE_OPTIONS: [process.env.NODE_OPTIONS, apiNodeOptions].filter(Boolean).join(' '),
  };
}
