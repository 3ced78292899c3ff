// Child processes of the operational scripts: run a step to completion, or keep a service
// running and stop it (and its children) on exit.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { projectRoot } from './paths.js';

/** Runs a command in the project root with inherited output; returns its exit code. */
export function runStep(
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv = process.env,
): number {
  const result = spawnSync(command, args, { cwd: projectRoot, stdio: 'inherit', env });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

/** Starts a long-running service in its own process group so it can be stopped whole. */
export function startService(
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv,
): ChildProcess {
  return spawn(command, args, { cwd: projectRoot, stdio: 'inherit', env, detached: true });
}

/** Stops a service started by startService: SIGTERM to its group, SIGKILL after a grace period. */
export async function stopService(child: ChildProcess, graceMs = 5000): Promise<void> {
  if (child.exitCode !== null || child.pid === undefined) return;
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  try {
    process.kill(-child.pid, 'SIGTERM');
  } catch {
    return;
  }
  const timer = setTimeout(() => {
    try {
      if (child.pid !== undefined) process.kill(-child.pid, 'SIGKILL');
    } catch {
      // already gone
    }
  }, graceMs);
  await exited;
  clearTimeout(timer);
}

/** Polls `url` until it answers 2xx, or fails after `timeoutMs`. */
export async function waitForHttp(
  url: string,
  timeoutMs: number,
  child?: ChildProcess,
): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child && child.exitCode !== null)
      throw new Error(`process exited (code ${child.exitCode}) before ${url} answered`);
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
}

/**
 * Like runStep, but keeps this process's event loop running while the command works, for steps
 * that talk to services hosted in this process (the mail sink, the processor fake).
 */
export function runStepAsync(
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv = process.env,
): Promise<number> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd: projectRoot, stdio: 'inherit', env });
    child.once('error', reject);
    child.once('exit', (code) => resolve(code ?? 1));
  });
}
