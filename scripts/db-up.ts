// Purpose: start (or reuse) the project's MariaDB for development or tests and create the
// database. Usage: pnpm exec tsx scripts/db-up.ts [dev|test]. Safe to repeat; local data only.
import { instances } from './lib/instances.js';
import { ensureDatabase, startMariadb } from './lib/mariadb.js';

const which = process.argv[2] === 'test' ? 'test' : 'dev';
const settings = instances[which];
const db = await startMariadb(which, settings.db.port);
ensureDatabase(db, settings.db);
console.log(`MariaDB ${which}: 127.0.0.1:${settings.db.port} database ${settings.db.database}`);
