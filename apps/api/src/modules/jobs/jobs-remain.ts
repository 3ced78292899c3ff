import { ForeignKeyConstraintError } from 'sequelize';
import { AppError } from '../../errors.js';

/**
 * Customers and sites with jobs cannot be deleted (the jobs foreign keys RESTRICT, migration
 * 0007): the database's refusal becomes 409 with `detail`, and the transaction has rolled back.
 */
export async function refuseWhenJobsRemain<T>(detail: string, work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (error) {
    if (error instanceof ForeignKeyConstraintError) throw new AppError('CONFLICT', detail);
    throw error;
  }
}
