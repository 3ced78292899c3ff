// Plain SQL for scripts and tests that check the database directly (the app uses models, and
// scopedSql in tenant-scope.ts on measured hot paths).
// Typed queries only: Sequelize 6's raw-query path trips over the mariadb driver's metadata.
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';

export function selectRows<T extends object = Record<string, unknown>>(
  sequelize: Sequelize,
  sql: string,
  replacements: unknown[] = [],
): Promise<T[]> {
  return sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });
}

/** Runs an UPDATE/DELETE/INSERT statement. */
export async function executeSql(
  sequelize: Sequelize,
  sql: string,
  replacements: unknown[] = [],
): Promise<void> {
  await sequelize.query(sql, { replacements, type: QueryTypes.UPDATE });
}
