// Purpose: stop the project's MariaDB instance. Usage: pnpm exec tsx scripts/db-down.ts [dev|test].
// Safe: data stays in .data/<instance>; does nothing when the instance is not running.
import { stopMariadb } from './lib/mariadb.js';

const which = process.argv[2] === 'test' ? 'test' : 'dev';
console.log(stopMariadb(which) ? `MariaDB ${which} stopped` : `MariaDB ${which} was not running`);
