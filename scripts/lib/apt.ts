// Installs Debian packages the project needs when their command is missing.
import { execFileSync, spawnSync } from 'node:child_process';
import { fail, say } from './log.js';

function hasCommand(command: string): boolean {
  return spawnSync('sh', ['-c', `command -v ${command}`], { stdio: 'ignore' }).status === 0;
}

let aptUpdated = false;

/**
 * Makes sure `command` exists, installing `packages` with apt-get when it does not.
 * Exits with a clear message when that is impossible (no apt-get, not root).
 */
export function ensureDebianPackages(command: string, packages: string[]): void {
  if (hasCommand(command)) return;
  const isRoot = process.getuid?.() === 0;
  if (!hasCommand('apt-get') || !isRoot) {
    fail(
      'setup',
      `${command} is missing. Install it as root with: apt-get install -y ${packages.join(' ')}` +
        (isRoot ? '' : ' (this script is not running as root, so it cannot do it for you)'),
    );
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    say('setup', 'apt-get update');
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
    aptUpdated = true;
  }
  say('setup', `installing ${packages.join(' ')} from Debian`);
  execFileSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...packages], {
    stdio: 'inherit',
    env,
  });
  if (!hasCommand(command))
    fail('setup', `${command} is still missing after installing ${packages.join(' ')}`);
}
