// Builds the web app only when its sources changed since the last build, so a second
// `npm start` is up in seconds.
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { projectRoot } from './paths.js';
import { runStep } from './processes.js';
import { say } from './log.js';

export const webDistDir = join(projectRoot, 'apps', 'web', 'dist');
const stampFile = join(webDistDir, '.source-stamp');
const inputs = ['apps/web', 'packages/shared/src', 'packages/takeoff/src', 'pnpm-lock.yaml'];
const skipped = new Set(['node_modules', 'dist']);

function listFiles(path: string, out: string[]): void {
  if (!existsSync(path)) return;
  if (statSync(path).isFile()) {
    out.push(path);
    return;
  }
  for (const entry of readdirSync(path, { withFileTypes: true })) {
    if (skipped.has(entry.name)) continue;
    listFiles(join(path, entry.name), out);
  }
}

function sourceStamp(): string {
  const files: string[] = [];
  for (const input of inputs) listFiles(join(projectRoot, input), files);
  const hash = createHash('sha256');
  for (const file of files.sort()) {
    const stat = statSync(file);
    hash.update(`${relative(projectRoot, file)}:${stat.size}:${stat.mtimeMs}\n`);
  }
  return hash.digest('hex');
}

/** Builds apps/web into apps/web/dist unless the sources are unchanged; returns false on failure. */
export function buildWebIfChanged(): boolean {
  const stamp = sourceStamp();
  if (existsSync(stampFile) && readFileSync(stampFile, 'utf8') === stamp) {
    say('web', 'web app unchanged since the last build');
    return true;
  }
  say('web', 'building the web app');
  if (runStep('pnpm', ['--filter', '@seamwright/web', 'run', 'build']) !== 0) return false;
  writeFileSync(stampFile, stamp);
  return true;
}
