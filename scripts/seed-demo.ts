// Purpose: load the invented demo company, its four users (one per role) and a dozen customers
// with sites into the dev database. Idempotent: does nothing when the demo company exists.
// Usage: pnpm exec tsx scripts/seed-demo.ts [dev]   (runs migrations first)
// Not for production: it creates users with a published password.
import {
  createSequelize,
  loadEnv,
  migrateDatabase,
  PlannerPool,
  seedDemoData,
} from '@seamwright/api';
import { instances } from './lib/instances.js';
import { fail, say } from './lib/log.js';

if (process.argv[2] && process.argv[2] !== 'dev')
  fail('seed', 'only the dev instance takes demo data: seed-demo.ts [dev]');
const { db } = instances.dev;
const env = loadEnv({ NODE_ENV: 'development' });
const plannerPool = new PlannerPool(env.planner);
const sequelize = createSequelize({
  host: '127.0.0.1',
  port: db.port,
  name: db.database,
  user: db.user,
  password: db.password,
});
try {
  await migrateDatabase(sequelize);
  const result = await seedDemoData(sequelize, env, plannerPool);
  say(
    'seed',
    result.created
      ? `created "${result.companyName}"`
      : `"${result.companyName}" already exists; nothing changed`,
  );
  say('seed', `sign in with password "${result.password}" as:`);
  for (const user of result.users) say('seed', `  ${user.role.padEnd(10)} ${user.email}`);
  for (const link of result.customerLinks)
    say(
      'seed',
      `customer's page of "${link.jobTitle}": http://127.0.0.1:${instances.dev.apiPort}${link.path}`,
    );
  for (const link of result.payLinks)
    say(
      'seed',
      `pay page of "${link.jobTitle}": http://127.0.0.1:${instances.dev.apiPort}${link.path}`,
    );
} catch (error) {
  fail('seed', `seeding failed: ${error instanceof Error ? error.message : String(error)}`);
} finally {
  await plannerPool.close();
  await sequelize.close();
}
