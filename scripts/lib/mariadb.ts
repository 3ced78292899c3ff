// The project's own MariaDB instance: data, socket, pid and tmp under .data/<name>/mariadb,
// listening on 127.0.0.1 only. Never touches the system service.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, openSync, writeFileSync } from 'node:fs';
import { userInfo } from 'node:os';
import { join } from 'node:path';
import { ensureDebianPackages } from './apt.js';
import { dataRoot } from './paths.js';
import { fail, say } from './log.js';

export interface MariadbInstance {
  host: string;
  port: number;
  socket: string;
  /** True when this call started the server (so the caller should stop it). */
  startedHere: boolean;
  stop(): void;
}

export interface DatabaseCredentials {
  database: string;
  user: string;
  password: string;
}

function paths(name: string) {
  const dir = join(dataRoot, name, 'mariadb');
  return {
    dir,
    data: join(dir, 'data'),
    tmp: join(dir, 'tmp'),
    config: join(dir, 'my.cnf'),
    socket: join(dir, 'mariadb.sock'),
    pid: join(dir, 'mariadb.pid'),
    log: join(dir, 'mariadb.log'),
  };
}

function isAlive(socket: string): boolean {
  if (!existsSync(socket)) return false;
  const result = spawnSync('mariadb-admin', ['--socket', socket, '--user=root', 'ping'], {
    stdio: 'ignore',
  });
  return result.status === 0;
}

function writeConfig(name: string, port: number): void {
  const p = paths(name);
  writeFileSync(
    p.config,
    [
      '[mariadbd]',
      `user=${userInfo().username}`,
      `datadir=${p.data}`,
      `socket=${p.socket}`,
      `pid-file=${p.pid}`,
      `log-error=${p.log}`,
      `tmpdir=${p.tmp}`,
      `port=${port}`,
      'bind-address=127.0.0.1',
      'skip-name-resolve',
      'character-set-server=utf8mb4',
      'collation-server=utf8mb4_unicode_ci',
      'innodb_buffer_pool_size=128M',
      // Test and demo data are disposable; trade durability for speed on small machines.
      'innodb_flush_log_at_trx_commit=2',
      'skip-log-bin',
      '',
    ].join('\n'),
  );
}

async function waitUntilAlive(socket: string, timeoutMs: number): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (isAlive(socket)) return true;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return false;
}

/** Stops the instance called `name` if it is running; returns whether it was. */
export function stopMariadb(name: string): boolean {
  const p = paths(name);
  if (!isAlive(p.socket)) return false;
  spawnSync('mariadb-admin', ['--socket', p.socket, '--user=root', 'shutdown'], {
    stdio: 'ignore',
  });
  return true;
}

/** Starts (or reuses) the instance called `name` on `port`. */
export async function startMariadb(name: string, port: number): Promise<MariadbInstance> {
  ensureDebianPackages('mariadbd', ['mariadb-server', 'mariadb-client']);
  const p = paths(name);
  const stop = () => {
    stopMariadb(name);
  };
  if (isAlive(p.socket)) {
    say('db', `reusing MariaDB "${name}" on 127.0.0.1:${port}`);
    return { host: '127.0.0.1', port, socket: p.socket, startedHere: false, stop };
  }
  mkdirSync(p.tmp, { recursive: true });
  writeConfig(name, port);
  if (!existsSync(join(p.data, 'mysql'))) {
    say('db', `initialising MariaDB "${name}" in .data/${name}/mariadb`);
    const init = spawnSync(
      'mariadb-install-db',
      [`--defaults-file=${p.config}`, '--skip-test-db', '--auth-root-authentication-method=socket'],
      { encoding: 'utf8' },
    );
    if (init.status !== 0) fail('db', `mariadb-install-db failed:\n${init.stderr || init.stdout}`);
  }
  const logFd = openSync(join(p.dir, 'mariadbd.out'), 'a');
  const child = spawn('mariadbd', [`--defaults-file=${p.config}`], {
    stdio: ['ignore', logFd, logFd],
    detached: true,
  });
  child.unref();
  if (!(await waitUntilAlive(p.socket, 30_000))) {
    fail('db', `MariaDB "${name}" did not start; see .data/${name}/mariadb/mariadb.log`);
  }
  say('db', `MariaDB "${name}" up on 127.0.0.1:${port}`);
  return { host: '127.0.0.1', port, socket: p.socket, startedHere: true, stop };
}

function sql(socket: string, statement: string): void {
  const result = spawnSync('mariadb', ['--socket', socket, '--user=root', '-e', statement], {
    encoding: 'utf8',
  });
  if (result.status !== 0)
    fail('db', `SQL failed (${statement.split(' ')[0]}): ${result.stderr.trim()}`);
}

const identifier = /^[a-z0-9_]+$/;

/** Creates the database and an application user limited to it (idempotent). */
export function ensureDatabase(instance: MariadbInstance, creds: DatabaseCredentials): void {
  if (!identifier.test(creds.database) || !identifier.test(creds.user)) {
    fail('db', 'database and user names must be lower-case letters, digits and underscores');
  }
  const password = creds.password.replace(/'/g, "''");
  sql(
    instance.socket,
    [
      `CREATE DATABASE IF NOT EXISTS \`${creds.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
      `CREATE USER IF NOT EXISTS '${creds.user}'@'127.0.0.1' IDENTIFIED BY '${password}';`,
      `ALTER USER '${creds.user}'@'127.0.0.1' IDENTIFIED BY '${password}';`,
      `GRANT ALL PRIVILEGES ON \`${creds.database}\`.* TO '${creds.user}'@'127.0.0.1';`,
    ].join(' '),
  );
}

/** Drops and recreates the database (tests start from an empty schema). */
export function recreateDatabase(instance: MariadbInstance, creds: DatabaseCredentials): void {
  sql(instance.socket, `DROP DATABASE IF EXISTS \`${creds.database}\`;`);
  ensureDatabase(instance, creds);
}
