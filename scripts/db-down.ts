// Purpose: stop the project's MariaDB instance. Usage: pnpm exec tsx scripts/db-down.ts [dev|test].
// Safe: data stays in .data/<instance>.
import { instances } from './lib/instances.js';
import { startMariadb } from './lib/mariadb.js';

const which = process.argv[2] === 'test' ? 'test' : 'dev';
const db = await startMariadb(which, instances[which].db.port);
db.stop();
console.log(`MariaDB ${which} stopped`);
