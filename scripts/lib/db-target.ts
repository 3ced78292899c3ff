// Which database a database command works on: the dev or test instance (started if it is not
// running, and stopped again afterwards), and optionally another database on it (--database).
import type { DumpTarget } from './backup.js';
import { instances } from './instances.js';
import { ensureDatabase, startMariadb } from './mariadb.js';

/** `--name=value` from the arguments, if given. */
export function optionValue(args: readonly string[], name: string): string | undefined {
  const prefix = `--${name}=`;
  return args.find((arg) => arg.startsWith(prefix))?.slice(prefix.length);
}

export async function dbTargetFromArgs(args: readonly string[]): Promise<{
  target: DumpTarget;
  instance: { release(): void };
}> {
  const name = args.includes('test') ? 'test' : 'dev';
  const { db } = instances[name];
  const mariadb = await startMariadb(name, db.port);
  const creds = { ...db, database: optionValue(args, 'database') ?? db.database };
  // Creates the database and the app user's grant when missing (a restore into a new database).
  ensureDatabase(mariadb, creds);
  return {
    target: { host: '127.0.0.1', ...creds },
    instance: {
      release: () => {
        if (mariadb.startedHere) mariadb.stop();
      },
    },
  };
}
