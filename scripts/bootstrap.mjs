#!/usr/bin/env node
// Purpose: the entry of `npm start` and `npm test` on a fresh machine with only Node.js and npm.
// Installs the pinned pnpm when missing, installs the workspace, then hands over to the
// TypeScript script that does the rest (start-all.ts or run-tests.ts).
// Usage: node scripts/bootstrap.mjs start|test. Safe to run repeatedly; changes nothing outside
// the project except installing pnpm globally.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const mode = process.argv[2];
if (mode !== 'start' && mode !== 'test') {
  console.error('usage: node scripts/bootstrap.mjs start|test');
  process.exit(2);
}

const { packageManager } = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
const pnpmVersion = packageManager.split('@')[1];

// Caches stay inside the project (git-ignored) so CI runs leave nothing behind.
const tmp = join(root, '.tmp');
mkdirSync(tmp, { recursive: true });
const env = { ...process.env, TMPDIR: tmp, PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: '1' };

function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { cwd: root, stdio: 'inherit', env, ...options });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

function installedPnpmVersion() {
  const result = spawnSync('pnpm', ['--version'], { encoding: 'utf8', env });
  return result.status === 0 ? result.stdout.trim() : null;
}

if (installedPnpmVersion() !== pnpmVersion) {
  console.log(`[setup] installing pnpm ${pnpmVersion}`);
  if (
    run('npm', [
      'install',
      '--global',
      '--silent',
      '--no-fund',
      '--no-audit',
      `pnpm@${pnpmVersion}`,
    ]) !== 0
  ) {
    console.error(
      `[setup] could not install pnpm ${pnpmVersion}; install it with: npm i -g pnpm@${pnpmVersion}`,
    );
    process.exit(1);
  }
}

console.log('[setup] installing workspace packages');
const frozen = process.env.CI ? ['--frozen-lockfile'] : [];
if (run('pnpm', ['install', '--reporter=append-only', ...frozen]) !== 0) {
  console.error('[setup] pnpm install failed');
  process.exit(1);
}

const script = mode === 'start' ? 'scripts/start-all.ts' : 'scripts/run-tests.ts';
// Ctrl-C reaches every process in the terminal's group. The script stops what it started in
// its own handler, so this process waits for it instead of dying first, and the script runs
// under node itself (tsx as a loader) with no wrapper process that could cut its clean-up short.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => {});
process.exit(run(process.execPath, ['--import', 'tsx', script, ...process.argv.slice(3)]));
