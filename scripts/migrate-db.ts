// Purpose: apply pending database migrations to the dev or test instance.
// Usage: pnpm exec tsx scripts/migrate-db.ts [dev|test]  (DB_NAME in the environment picks another
// database on that instance, e.g. the end-to-end run's own database)
// Safe in production: only applies migrations not yet recorded in schema_migrations; never drops.
import { createSequelize, migrateDatabase } from '@seamwright/api';
import { instances } from './lib/instances.js';
import { fail, say } from './lib/log.js';

const which = process.argv[2] === 'test' ? 'test' : 'dev';
const { db } = instances[which];
const database = process.env.DB_NAME ?? db.database;
const sequelize = createSequelize({
  host: '127.0.0.1',
  port: db.port,
  name: database,
  user: db.user,
  password: db.password,
});
try {
  const { applied } = await migrateDatabase(sequelize);
  say(
    'migrate',
    applied.length ? `applied ${applied.join(', ')} to ${database}` : `${database} is up to date`,
  );
} catch (error) {
  fail('migrate', `migration failed: ${error instanceof Error ? error.message : String(error)}`);
} finally {
  await sequelize.close();
}
