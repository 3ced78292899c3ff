// Backup and restore of one database with MariaDB's own tools: mariadb-dump in one consistent
// snapshot (--single-transaction, so the API can keep writing), gzip-compressed, and the mariadb
// client to load it back. The password goes through a private options file, never argv, so it
// does not show in the process list.
import { spawn, spawnSync } from 'node:child_process';
import { createReadStream, createWriteStream, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { createGunzip, createGzip } from 'node:zlib';

export interface DumpTarget {
  host: string;
  port: number;
  database: string;
  user: string;
  password: string;
}

const identifier = /^[a-z0-9_]+$/;

function checkTarget(target: DumpTarget): void {
  if (!identifier.test(target.database))
    throw new Error(
      `database "${target.database}": use lower-case letters, digits and underscores`,
    );
}

/** Runs `work` with a 0600 options file holding the connection (removed afterwards). */
async function withOptionsFile<T>(
  target: DumpTarget,
  work: (file: string) => Promise<T>,
): Promise<T> {
  const dir = mkdtempSync(join(tmpdir(), 'sw-db-'));
  const file = join(dir, 'client.cnf');
  const quoted = target.password.replace(/\\/g, '\\\\').replace(/"/g, '\\"');
  writeFileSync(
    file,
    `[client]\nhost=${target.host}\nport=${target.port}\nuser=${target.user}\npassword="${quoted}"\nprotocol=TCP\n`,
    { mode: 0o600 },
  );
  try {
    return await work(file);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Collects a child's stderr and rejects with it when the child fails. */
function exited(child: ReturnType<typeof spawn>, what: string): Promise<void> {
  let stderr = '';
  child.stderr?.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
  return new Promise((resolve, reject) => {
    child.once('error', reject);
    child.once('close', (code) =>
      code === 0 ? resolve() : reject(new Error(`${what} failed (exit ${code}): ${stderr.trim()}`)),
    );
  });
}

/**
 * Dumps every table of the database (schema, rows, triggers) into `outFile`, gzip-compressed.
 * One transaction gives a consistent picture of InnoDB tables without locking out writers.
 */
export async function dumpDatabase(target: DumpTarget, outFile: string): Promise<void> {
  checkTarget(target);
  await withOptionsFile(target, async (options) => {
    const child = spawn(
      'mariadb-dump',
      [
        `--defaults-extra-file=${options}`,
        '--single-transaction',
        '--quick',
        '--triggers',
        '--hex-blob',
        '--default-character-set=utf8mb4',
        '--no-tablespaces',
        '--skip-dump-date',
        target.database,
      ],
      { stdio: ['ignore', 'pipe', 'pipe'] },
    );
    const done = exited(child, 'mariadb-dump');
    if (!child.stdout) throw new Error('mariadb-dump gave no output stream');
    await Promise.all([pipeline(child.stdout, createGzip(), createWriteStream(outFile)), done]);
  });
}

/** Runs one statement with the mariadb client and returns its tab-separated rows. */
async function query(target: DumpTarget, statement: string): Promise<string[][]> {
  return withOptionsFile(target, (options) => {
    const result = spawnSync(
      'mariadb',
      [`--defaults-extra-file=${options}`, '--batch', '--skip-column-names', target.database],
      { input: statement, encoding: 'utf8' },
    );
    if (result.status !== 0) throw new Error(`mariadb failed: ${result.stderr.trim()}`);
    const rows = result.stdout.split('\n').filter((line) => line !== '');
    return Promise.resolve(rows.map((line) => line.split('\t')));
  });
}

export async function listTables(target: DumpTarget): Promise<string[]> {
  checkTarget(target);
  return (await query(target, 'SHOW FULL TABLES WHERE Table_type = "BASE TABLE";')).map(
    ([name]) => name ?? '',
  );
}

/** `CHECKSUM TABLE` of every table, by name: equal checksums mean equal rows. */
export async function tableChecksums(target: DumpTarget): Promise<Record<string, string>> {
  const tables = await listTables(target);
  if (tables.length === 0) return {};
  const rows = await query(target, `CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(', ')};`);
  return Object.fromEntries(
    rows.map(([name, checksum]) => [(name ?? '').split('.').pop() ?? '', checksum ?? '']),
  );
}

/**
 * Replaces the database's tables with the dump's: every existing table is dropped first (so a
 * table the dump does not have is gone too), then the dump is loaded. Not one transaction (DDL
 * commits on its own in MariaDB): stop the API before restoring.
 */
export async function restoreDatabase(target: DumpTarget, dumpFile: string): Promise<void> {
  checkTarget(target);
  const tables = await listTables(target);
  if (tables.length > 0)
    await query(
      target,
      `SET FOREIGN_KEY_CHECKS = 0; DROP TABLE ${tables.map((t) => `\`${t}\``).join(', ')};`,
    );
  await withOptionsFile(target, async (options) => {
    const child = spawn(
      'mariadb',
      [`--defaults-extra-file=${options}`, '--default-character-set=utf8mb4', target.database],
      { stdio: ['pipe', 'ignore', 'pipe'] },
    );
    const done = exited(child, 'mariadb (restore)');
    if (!child.stdin) throw new Error('mariadb gave no input stream');
    await Promise.all([pipeline(createReadStream(dumpFile), createGunzip(), child.stdin), done]);
  });
}
