// Applies pending migrations with umzug, recording them in the `schema_migrations` table.
import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from './migrations/index.js';

export interface MigrationResult {
  applied: string[];
}

/** Runs every pending migration on `sequelize`'s database; safe to call repeatedly. */
export async function migrateDatabase(sequelize: Sequelize): Promise<MigrationResult> {
  const umzug = new Umzug({
    migrations,
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
  const applied = await umzug.up();
  return { applied: applied.map((m) => m.name) };
}
