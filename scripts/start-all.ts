// Purpose: `npm start` — set up and run everything for local use: the project's MariaDB,
// migrations, demo data (once), the web build, the mail sink, the payment-processor fake and
// the API serving the web app. Ctrl-C stops every process it started.
// Usage: pnpm exec tsx scripts/start-all.ts (normally through `npm start`).
// Safe in production? No — it is for a developer's or evaluator's machine.
import { startFakeProcessor } from '@seamwright/fake-processor';
import { apiEnv } from './lib/api-env.js';
import { instances } from './lib/instances.js';
import { fail, say } from './lib/log.js';
import { startMailSink } from './lib/maildev.js';
import { ensureDatabase, startMariadb } from './lib/mariadb.js';
import { runStep, startService, stopService, waitForHttp } from './lib/processes.js';
import { buildWebIfChanged } from './lib/web-build.js';

const settings = instances.dev;
const db = await startMariadb('dev', settings.db.port);
ensureDatabase(db, settings.db);

const env = apiEnv('dev');
if (runStep('pnpm', ['exec', 'tsx', 'scripts/migrate-db.ts', 'dev'], env) !== 0)
  fail('db', 'migrations failed');
if (runStep('pnpm', ['exec', 'tsx', 'scripts/seed-demo.ts', 'dev'], env) !== 0)
  fail('seed', 'demo data failed');
if (!buildWebIfChanged()) fail('web', 'the web build failed');

const mail = await startMailSink('dev', settings.smtpPort, settings.mailWebPort);
// The keys are the API's development defaults; events go to the API's webhook route.
const processor = await startFakeProcessor(settings.processorPort, {
  webhookUrl: `http://127.0.0.1:${settings.apiPort}/api/webhooks/processor`,
});
say('pay', `payment-processor fake on ${processor.url}`);

const api = startService('pnpm', ['exec', 'tsx', 'apps/api/src/server.ts'], env);
const appUrl = `http://127.0.0.1:${settings.apiPort}`;

let stopping = false;
async function stopAll(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    say('stop', 'stopping the API, mail sink, processor fake and MariaDB');
    await stopService(api);
    await mail.stop();
    await processor.stop();
    if (db.startedHere) db.stop();
  }
  process.exit(code);
}
process.on('SIGINT', () => void stopAll(0));
process.on('SIGTERM', () => void stopAll(0));
api.on('exit', (code) => {
  if (!stopping) {
    console.error(`[api] exited with code ${code ?? 'unknown'}`);
    void stopAll(1);
  }
});

try {
  await waitForHttp(`${appUrl}/api/health`, 60_000, api);
} catch (error) {
  console.error(`[api] ${(error as Error).message}`);
  await stopAll(1);
}

console.log(`
  Seamwright is running.

    App          ${appUrl}
    Mail inbox   ${mail.webUrl}   (every e-mail the app sends lands here)
    Processor    ${processor.url}   (local payment-processor fake)

  Demo sign-ins (password: turf-demo-2026)
    owner        owner@demo.seamwright.test
    office       office@demo.seamwright.test
    bookkeeper   books@demo.seamwright.test
    crew lead    crew@demo.seamwright.test

  Press Ctrl-C to stop everything.
`);
