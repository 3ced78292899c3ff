// Purpose: back up one of the project's databases to a gzip-compressed SQL dump, in one
// consistent snapshot (the API may keep running).
// Usage: pnpm db:backup [dev|test] [--database=NAME] [--out=FILE]
//   (default: the dev database, into .data/backups/<database>-<UTC time>.sql.gz)
// Safe in production? Yes: it only reads the database and writes a new file.
import { mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { dumpDatabase, listTables } from './lib/backup.js';
import { dbTargetFromArgs, optionValue } from './lib/db-target.js';
import { fail, say } from './lib/log.js';
import { dataRoot } from './lib/paths.js';

const { target, instance } = await dbTargetFromArgs(process.argv.slice(2));
const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const out = resolve(
  optionValue(process.argv.slice(2), 'out') ??
    join(dataRoot, 'backups', `${target.database}-${stamp}.sql.gz`),
);
try {
  const tables = await listTables(target);
  if (tables.length === 0) fail('backup', `database ${target.database} has no tables to back up`);
  mkdirSync(dirname(out), { recursive: true });
  await dumpDatabase(target, out);
  say('backup', `${tables.length} tables of ${target.database} → ${out}`);
} catch (error) {
  fail('backup', error instanceof Error ? error.message : String(error));
} finally {
  instance.release();
}
