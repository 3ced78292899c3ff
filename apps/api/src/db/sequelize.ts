// Creates the Sequelize connection and registers every model. Schema changes live in
// migrations only; nothing here calls sync().
import { Sequelize } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { Env } from '../config/env.js';
import { initModels } from './models/index.js';

export type DbOptions = Env['db'] & { logging?: boolean };

/** Opens a pool to MariaDB and registers the models. Call `close()` when done. */
export function createSequelize(db: DbOptions): Sequelize {
  const sequelize = new Sequelize(db.name, db.user, db.password, {
    host: db.host,
    port: db.port,
    dialect: 'mariadb',
    logging: db.logging ? console.log : false,
    // Store and read every DATETIME as UTC.
    timezone: '+00:00',
    // A database that is down or unreachable must fail a request fast (503 DATABASE_UNAVAILABLE
    // within 2 s, http/database-errors.ts), not hold it: a refused connection fails at once, one
    // that hangs after 1.5 s, and a request waiting for a free pooled connection after 2 s.
    dialectOptions: { connectTimeout: 1500 },
    pool: { max: 10, min: 0, idle: 10_000, acquire: 2000 },
    define: { underscored: true },
  });
  initModels(sequelize);
  return sequelize;
}

/** An open transaction, passed from services to repositories (services never touch Sequelize). */
export type Tx = Transaction;

/** MariaDB's "deadlock found" (ER_LOCK_DEADLOCK): the server rolled the transaction back. */
const deadlockErrno = 1213;
/** Attempts in all when MariaDB picks the transaction as a deadlock's victim. */
const deadlockAttempts = 3;

export function isDeadlock(error: unknown): boolean {
  const parent = (error as { parent?: { errno?: number } } | null)?.parent;
  return parent?.errno === deadlockErrno;
}

/**
 * Runs `work` in one transaction: all of it commits or none of it does. A transaction that
 * MariaDB rolls back to break a deadlock is run again from the start (its work touched only the
 * database, which the rollback undid), so two requests racing for the same rows never see a
 * 500 for it. `work` must not have effects outside the database before it returns.
 */
export async function inTransaction<T>(
  sequelize: Sequelize,
  work: (tx: Tx) => Promise<T>,
): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await sequelize.transaction((tx) => work(tx));
    } catch (error) {
      if (!isDeadlock(error) || attempt >= deadlockAttempts) throw error;
    }
  }
}
