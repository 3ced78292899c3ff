// Purpose: restore one of the project's databases from a dump made by `pnpm db:backup`: its
// tables are dropped and replaced by the dump's. Stop the API first.
// Usage: pnpm db:restore FILE [dev|test] [--database=NAME] [--dry-run]
// Safe in production? No: it replaces every table. --dry-run says what would be replaced and
// changes nothing.
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { listTables, restoreDatabase, tableChecksums } from './lib/backup.js';
import { dbTargetFromArgs } from './lib/db-target.js';
import { fail, say } from './lib/log.js';

const args = process.argv.slice(2);
const file = args.find((arg) => !arg.startsWith('--') && arg !== 'dev' && arg !== 'test');
if (!file) fail('restore', 'name the dump to restore: pnpm db:restore FILE [dev|test]');
const dump = resolve(file);
if (!existsSync(dump)) fail('restore', `no such file: ${dump}`);
const { target, instance } = await dbTargetFromArgs(args);
try {
  const before = await listTables(target);
  if (args.includes('--dry-run')) {
    say(
      'restore',
      `dry run: would drop ${before.length} tables of ${target.database} and load ${dump}`,
    );
  } else {
    await restoreDatabase(target, dump);
    const after = await tableChecksums(target);
    say('restore', `${target.database}: ${Object.keys(after).length} tables loaded from ${dump}`);
  }
} catch (error) {
  fail('restore', error instanceof Error ? error.message : String(error));
} finally {
  instance.release();
}
