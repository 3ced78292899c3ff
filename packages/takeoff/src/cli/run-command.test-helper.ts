// Runs one of this folder's commands as a user would (Node with tsx, JSON on standard input),
// for the command tests.
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '../../../..');

export interface CommandResult {
  status: number | null;
  stdout: string;
  stderr: string;
}

/** Runs `cli/<name>.ts` from the repository root with `input` on standard input. */
export function runCommand(name: 'plan-layout' | 'plan-job', input: string): CommandResult {
  const result = spawnSync(process.execPath, ['--import', 'tsx', join(here, `${name}.ts`)], {
    cwd: root,
    input,
    encoding: 'utf8',
  });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}
