// Estimates of a job, one row per version. An estimate points at its job through (company_id,
// job_id) → jobs (company_id, id), like job_areas (0009), so it can never hang under another
// company's job. Tiers and their lines are one JSON document (they are always read and written
// whole); the totals of the first tier are kept in columns for lists and reports. The rates
// (markup, tax, deposit rule) are copied from the settings when the estimate is made, so a
// later settings change never changes an estimate.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

export const estimates: Migration = {
  name: '0010-estimates',
  async up({ context: qi }) {
    await qi.createTable('estimates', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: {
        type: DataTypes.UUID,
        allowNull: false,
        references: { model: 'companies', key: 'id' },
        onDelete: 'CASCADE',
      },
      job_id: { type: DataTypes.UUID, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false },
      status: { type: DataTypes.STRING(20), allowNull: false },
      tiers: { type: DataTypes.JSON, allowNull: false },
      chosen_tier_id: { type: DataTypes.STRING(36), allowNull: true },
      warnings: { type: DataTypes.JSON, allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: true },
      valid_until: { type: DataTypes.DATEONLY, allowNull: true },
      markup_basis_points: { type: DataTypes.INTEGER, allowNull: false },
      tax_rate_basis_points: { type: DataTypes.INTEGER, allowNull: false },
      deposit_rule: { type: DataTypes.JSON, allowNull: false },
      subtotal_cents: { type: DataTypes.BIGINT, allowNull: false },
      tax_cents: { type: DataTypes.BIGINT, allowNull: false },
      total_cents: { type: DataTypes.BIGINT, allowNull: false },
      deposit_cents: { type: DataTypes.BIGINT, allowNull: false },
      sent_at: { type: DataTypes.DATE(3), allowNull: true },
      created_by: {
        type: DataTypes.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
    await executeSql(
      qi.sequelize,
      `ALTER TABLE estimates
         ADD CONSTRAINT estimates_job_same_company
           FOREIGN KEY (company_id, job_id) REFERENCES jobs (company_id, id)`,
    );
    // Leading company_id: every read is scoped by it; also one number per version of a job.
    await qi.addIndex('estimates', ['company_id', 'job_id', 'version'], {
      unique: true,
      name: 'estimates_company_job_version',
    });
  },
  async down({ context: qi }) {
    await qi.dropTable('estimates');
  },
};
