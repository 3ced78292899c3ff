// Purpose: `npm test` — set up a separate test MariaDB, then typecheck, lint, unit tests, API
// tests against the real database, and end-to-end tests in Debian's Chromium; exits non-zero on
// any failure and ends with one summary line.
// Usage: pnpm exec tsx scripts/run-tests.ts [--only=typecheck,lint,unit,api,bundle,e2e] [--spec=name,…] (normally
// through `npm test`; `--only` runs just the named steps, for a quick check while working).
// Safe in production? It only touches the git-ignored .data/test and .tmp folders.
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { startFakeProcessor } from '@seamwright/fake-processor';
import { apiEnv } from './lib/api-env.js';
import { ensureDebianPackages } from './lib/apt.js';
import { instances } from './lib/instances.js';
import { say } from './lib/log.js';
import { startMailSink } from './lib/maildev.js';
import { ensureDatabase, recreateDatabase, startMariadb } from './lib/mariadb.js';
import { projectRoot } from './lib/paths.js';
import { runStep, runStepAsync, startService, stopService, waitForHttp } from './lib/processes.js';
import {
  addCounts,
  readPlaywrightCounts,
  readVitestCounts,
  zeroCounts,
  type Counts,
} from './lib/test-report.js';
import { routeWeights } from './lib/bundle-budget.js';
import { buildWebIfChanged, webDistDir } from './lib/web-build.js';

const settings = instances.test;
const e2eDatabase = 'seamwright_e2e';
const reportDir = join(projectRoot, '.tmp', 'reports');
rmSync(reportDir, { recursive: true, force: true });

// A system font too: pages use the shipped web fonts, but Chromium wants a fallback to start.
ensureDebianPackages('chromium', ['chromium', 'fonts-liberation']);
const db = await startMariadb('test', settings.db.port);
ensureDatabase(db, settings.db);

const stepKeys = ['typecheck', 'lint', 'unit', 'api', 'bundle', 'e2e'] as const;
type StepKey = (typeof stepKeys)[number];
const onlyArg = process.argv.find((arg) => arg.startsWith('--only='));
const chosen = new Set(onlyArg ? onlyArg.slice('--only='.length).split(',') : stepKeys);
for (const key of chosen) {
  if (!(stepKeys as readonly string[]).includes(key)) {
    console.error(`[test] unknown step "${key}" in --only; choose from ${stepKeys.join(', ')}`);
    process.exit(2);
  }
}

// `--spec=estimate-acceptance,job-areas` runs just those e2e specs (names as Playwright filters).
const specArg = process.argv.find((arg) => arg.startsWith('--spec='));
const specs = specArg ? specArg.slice('--spec='.length).split(',').filter(Boolean) : [];

const results: { step: string; ok: boolean; seconds: number }[] = [];
let counts: Counts = zeroCounts;

function step(
  key: StepKey,
  name: string,
  action: () => boolean | Promise<boolean>,
): Promise<boolean> {
  return (async () => {
    if (!chosen.has(key)) return true;
    say('test', `── ${name}`);
    const started = Date.now();
    let ok = false;
    try {
      ok = await action();
    } catch (error) {
      console.error(`[test] ${name}: ${(error as Error).message}`);
    }
    results.push({ step: name, ok, seconds: (Date.now() - started) / 1000 });
    return ok;
  })();
}

function vitest(project: string[], report: string): boolean {
  const file = join(reportDir, report);
  const args = ['exec', 'vitest', 'run', ...project.flatMap((p) => ['--project', p])];
  const code = runStep('pnpm', [
    ...args,
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${file}`,
  ]);
  counts = addCounts(counts, readVitestCounts(file));
  return code === 0;
}

await step('typecheck', 'typecheck', () => runStep('pnpm', ['run', 'typecheck']) === 0);
await step('lint', 'lint and format', () => runStep('pnpm', ['run', 'lint']) === 0);
await step('unit', 'unit tests', () => vitest(['unit', 'web'], 'unit.json'));
await step('api', 'API tests (MariaDB)', () => vitest(['api'], 'api.json'));
await step('bundle', 'web build size budget', () => {
  if (!buildWebIfChanged()) return false;
  const weights = routeWeights(webDistDir);
  for (const w of weights)
    say(
      'bundle',
      `${w.kb > w.budgetKb ? 'OVER' : 'ok  '} ${w.kb.toFixed(1).padStart(6)} KB gzip (budget ${w.budgetKb}) ${w.route}`,
    );
  return weights.length > 0 && weights.every((w) => w.kb <= w.budgetKb);
});
await step('e2e', 'end-to-end tests (Chromium)', async () => {
  if (!buildWebIfChanged()) return false;
  const e2eDb = { ...settings.db, database: e2eDatabase };
  recreateDatabase(db, e2eDb);
  // Every spec signs up from 127.0.0.1 within one rate-limit window; the per-IP sign-up limit
  // (10) is lifted here, as the API tests' env does, and the per-e-mail limits stay.
  const env = { ...apiEnv('test', { database: e2eDatabase }), RATE_LIMIT_SIGNUP_PER_IP: '1000' };
  if (runStep('pnpm', ['exec', 'tsx', 'scripts/migrate-db.ts', 'test'], env) !== 0) return false;
  const mail = await startMailSink('test-e2e', settings.smtpPort, settings.mailWebPort);
  const processor = await startFakeProcessor(settings.processorPort, {
    webhookUrl: `http://127.0.0.1:${settings.apiPort}/api/webhooks/processor`,
    retryDelaysMs: [100, 500, 2000],
  });
  const api = startService('pnpm', ['exec', 'tsx', 'apps/api/src/server.ts'], env);
  const baseUrl = `http://127.0.0.1:${settings.apiPort}`;
  try {
    await waitForHttp(`${baseUrl}/api/health`, 60_000, api);
    const file = join(reportDir, 'e2e.json');
    const code = await runStepAsync(
      'pnpm',
      ['--filter', '@seamwright/tests', 'run', 'e2e', '--reporter=list,json', ...specs],
      {
        ...process.env,
        E2E_BASE_URL: baseUrl,
        E2E_MAIL_URL: mail.webUrl,
        PLAYWRIGHT_JSON_OUTPUT_NAME: file,
      },
    );
    counts = addCounts(counts, readPlaywrightCounts(file));
    return code === 0;
  } finally {
    await stopService(api);
    await mail.stop();
    await processor.stop();
  }
});

if (db.startedHere) db.stop();

console.log('\n  Test run summary');
for (const r of results) {
  console.log(
    `    ${r.ok ? 'ok  ' : 'FAIL'}  ${r.step.padEnd(30)} ${r.seconds.toFixed(1).padStart(6)} s`,
  );
}
const allOk = results.every((r) => r.ok);
console.log(`\n  ${allOk ? 'All steps passed.' : 'Some steps failed.'}`);
console.log(`tests: ${counts.passed} passed, ${counts.failed} failed, ${counts.skipped} skipped`);
process.exit(allOk ? 0 : 1);
