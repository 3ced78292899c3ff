import type { HealthView } from '@seamwright/shared';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';

const databaseTimeoutMs = 2000;
// A SELECT-typed query: raw queries trip over the mariadb driver's result metadata in Sequelize 6.

/** Pings the database with a short timeout so a hung pool cannot hang the health check. */
export async function checkHealth(sequelize: Sequelize): Promise<HealthView> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new Error('database ping timed out')), databaseTimeoutMs);
  });
  try {
    await Promise.race([sequelize.query('SELECT 1 AS ok', { type: QueryTypes.SELECT }), timeout]);
    return { status: 'ok', api: 'ok', database: 'ok' };
  } catch {
    return { status: 'degraded', api: 'ok', database: 'down' };
  } finally {
    clearTimeout(timer);
  }
}
