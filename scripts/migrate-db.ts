// Purpose: apply pending database migrations to the dev or test instance.
// Usage: pnpm exec tsx scripts/migrate-db.ts [dev|test]
// Safe in production: only applies migrations not yet recorded in schema_migrations; never drops.
import { createSequelize, migrateDatabase } from '@seamwright/api';
import { instances } from './lib/instances.js';
import { fail, say } from './lib/log.js';

const which = process.argv[2] === 'test' ? 'test' : 'dev';
const { db } = instances[which];
const sequelize = createSequelize({ host: '127.0.0.1', port: db.port, name: db.database, user: db.user, password: db.password });
try {
  const { applied } = await migrateDatabase(sequelize);
  say('migrate', applied.length ? `applied ${applied.join(', ')} to ${db.database}` : `${db.database} is up to date`);
} catch (error) {
  fail('migrate', `migration failed: ${error instanceof Error ? error.message : String(error)}`);
} finally {
  await sequelize.close();
}
