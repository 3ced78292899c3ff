// The environment the API process expects (see apps/api/src/config/env.ts), for one instance.
import { join } from 'node:path';
import { instances, type InstanceName } from './instances.js';
import { dataRoot } from './paths.js';
import { webDistDir } from './web-build.js';

/**
 * V8 flags the API process runs with (docs/PERFORMANCE.md, "Memory"). The live heap after a
 * full collection under the 50-connection bench is about 53 MB (a heap snapshot), but with
 * Node's defaults V8 let the heap grow to 200 MB of garbage before collecting it, and the
 * resident size peaked at 264 to 339 MB. A 160 MB old space makes it collect sooner (peak
 * 198 MB over the same routes); a 2 MB semi-space (default up to 16 MB, three of them) keeps the
 * young generation small. As NODE_OPTIONS: worker threads refuse V8 flags in their argv.
 */
export const apiNodeOptions = '--max-semi-space-size=2 --max-old-space-size=160';

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
    NODE_OPTIONS: [process.env.NODE_OPTIONS, apiNodeOptions].filter(Boolean).join(' '),
  };
}
